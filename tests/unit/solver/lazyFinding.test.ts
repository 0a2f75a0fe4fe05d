/**
 * Findings whose message is made when first read (LazyFinding): the text is the same as an eager
 * one, made once, and carried by JSON like a plain property. The figures in the solved example are
 * Ohm's law and the solver's own; the check here is on how the message is held, not on the figures
 * (the reference and oracle tests cover those).
 */
import { describe, expect, it } from 'vitest';
import { LazyFinding } from '../../../src/solver/findings.ts';
import { solve } from '../../../src/solver/solve.ts';
import { network } from '../../fixtures/build.ts';

describe('LazyFinding', () => {
  it('makes its message on the first read only, from the arguments given', () => {
    let made = 0;
    const f = new LazyFinding(
      'ibOverIn',
      'error',
      'C2',
      (id: string, ibA: number) => {
        made++;
        return `cable ${id}: Ib ${ibA.toFixed(1)} A`;
      },
      ['C2', 40],
    );
    expect(made).toBe(0);
    expect(f.message).toBe('cable C2: Ib 40.0 A');
    expect(f.message).toBe('cable C2: Ib 40.0 A');
    expect(made).toBe(1);
  });

  it('is written to JSON with its message, like a plain finding', () => {
    const f = new LazyFinding('checkNotAssessed', 'warning', 'L1', () => 'L1: no device', []);
    expect(JSON.parse(JSON.stringify([f]))).toEqual([
      { code: 'checkNotAssessed', severity: 'warning', elementId: 'L1', message: 'L1: no device' },
    ]);
  });

  it('holds the failed checks and limit findings of a solve, with their full text when read', () => {
    // A 40 A load on 50 m of 2.5 mm² behind a 16 A breaker: Ib > In and far over the drop limit.
    const doc = network()
      .supply('S')
      .board('DB1')
      .load('L1', { amps: 40 })
      .cable('C1', 'S', 'DB1', { sizeMm2: 25, phases: 3, cpc: { kind: 'core', sizeMm2: 16, material: 'Cu' } })
      .cable('C2', 'DB1', 'L1', {
        lengthM: 50,
        device: { type: 'mcb', curve: 'B', ratingA: 16, breakingKa: 6 },
      })
      .doc();
    const findings = solve(doc).findings;
    const ibIn = findings.find((f) => f.code === 'ibOverIn' && f.elementId === 'C2');
    const over = findings.find((f) => f.code === 'overLimit' && f.elementId === 'L1');
    expect(ibIn).toBeInstanceOf(LazyFinding);
    expect(over).toBeInstanceOf(LazyFinding);
    expect(ibIn?.message).toMatch(/^cable C2.*40(\.0)? A.*16(\.0)? A/);
    expect(over?.message).toMatch(/^load L1.*over its other limit of 5\.00 %/);
    const json = JSON.parse(JSON.stringify(findings)) as { message: string }[];
    expect(json.map((f) => f.message)).toEqual(findings.map((f) => f.message));
    expect(json.every((f) => typeof f.message === 'string' && f.message.length > 10)).toBe(true);
  });
});
