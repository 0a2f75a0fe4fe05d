/**
 * The passes' |re + j im| against the engine's own Math.hypot: bit for bit on V8 (the engine the
 * tests and the CLI run on), so replacing Math.hypot changed no figure, and the IEEE special
 * cases as ECMAScript defines them for Math.hypot (ECMA-262 §21.3.2.18).
 */
import { describe, expect, it } from 'vitest';
import { hypot } from '../../../src/solver/hypot.ts';
import { rng } from '../../../bench/randomNetwork.ts';

describe('hypot', () => {
  it('follows ECMA-262 Math.hypot for infinities, NaN and zeros', () => {
    expect(hypot(3, 4)).toBe(5);
    expect(hypot(Infinity, NaN)).toBe(Infinity);
    expect(hypot(NaN, -Infinity)).toBe(Infinity);
    expect(hypot(NaN, 1)).toBeNaN();
    expect(Object.is(hypot(-0, -0), 0)).toBe(true);
    expect(hypot(1e300, 1e300)).toBe(Math.SQRT2 * 1e300);
    expect(hypot(5e-324, 0)).toBe(5e-324);
  });

  it('gives exactly what Math.hypot gives for two numbers', () => {
    const r = rng(20261202);
    const special = [
      0,
      -0,
      1,
      -1,
      NaN,
      Infinity,
      -Infinity,
      5e-324,
      2.2250738585072014e-308,
      1.7976931348623157e308,
    ];
    const pairs: [number, number][] = [];
    for (const a of special) for (const b of special) pairs.push([a, b]);
    const bits = new Float64Array(1);
    const words = new Uint32Array(bits.buffer);
    const anyDouble = () => {
      words[0] = (r() * 2 ** 32) >>> 0;
      words[1] = (r() * 2 ** 32) >>> 0;
      return bits[0]!;
    };
    for (let i = 0; i < 200000; i++) {
      const scale = 10 ** (Math.floor(r() * 40) - 20);
      pairs.push([(r() - 0.5) * scale, (r() - 0.5) * scale * (i % 2 ? 1 : 1e-3)]);
      pairs.push([anyDouble(), anyDouble()]);
    }
    let differ = 0;
    for (const [a, b] of pairs) if (!Object.is(hypot(a, b), Math.hypot(a, b))) differ++;
    expect(differ).toBe(0);
  });
});
