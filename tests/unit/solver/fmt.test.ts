/**
 * Message figures: fmt(n) is n to three significant digits as Number#toString writes it, the text
 * String(Number(n.toPrecision(3))) gives (ECMA-262 Number.prototype.toPrecision and
 * Number::toString); its quick path must give exactly that text, near rounding ties included.
 */
import { describe, expect, it } from 'vitest';
import { fmt } from '../../../src/solver/protection/working.ts';
import { rng } from '../../../bench/randomNetwork.ts';

const reference = (n: number, digits = 3) =>
  Number.isFinite(n) ? String(Number(n.toPrecision(digits))) : String(n);

describe('fmt', () => {
  it('writes three significant digits the way Number#toString does', () => {
    expect(fmt(0.0123456)).toBe('0.0123');
    expect(fmt(27)).toBe('27');
    expect(fmt(1234.5)).toBe('1230');
    expect(fmt(-1.005)).toBe('-1');
    expect(fmt(0.9996)).toBe('1');
    expect(fmt(2.5e-7)).toBe('2.5e-7');
    expect(fmt(1.23e21)).toBe('1.23e+21');
    expect(fmt(NaN)).toBe('NaN');
    expect(fmt(-Infinity)).toBe('-Infinity');
    expect(fmt(-0)).toBe('0');
    expect(fmt(0.123456, 4)).toBe('0.1235');
  });

  it('gives the toPrecision round trip for any number, ties and powers of ten included', () => {
    const r = rng(20261203);
    const values: number[] = [0.125, 2.675, 99.95, 9.995, 0.9995, 999.5, 1e-6, 9.99e-7, 1e15, 5e-324];
    const bits = new Float64Array(1);
    const words = new Uint32Array(bits.buffer);
    for (let i = 0; i < 100000; i++) {
      values.push((r() - 0.5) * 10 ** (Math.floor(r() * 30) - 10));
      // d.d5 x 10^k, exactly and one ulp either side.
      const tie = (Math.floor(r() * 900) + 100.5) * 10 ** (Math.floor(r() * 20) - 10);
      values.push(tie, tie * (1 + 2 ** -52), tie * (1 - 2 ** -52), 10 ** (Math.floor(r() * 30) - 10));
      words[0] = (r() * 2 ** 32) >>> 0;
      words[1] = (r() * 2 ** 32) >>> 0;
      values.push(bits[0]!);
    }
    const differ = values.filter((x) => fmt(x) !== reference(x));
    expect(differ).toEqual([]);
  });
});
