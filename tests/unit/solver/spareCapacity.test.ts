/**
 * A board's spare capacity allowance (loads still to come): the cables feeding the board carry
 * its demand × (1 + allowance), after its diversity; the circuits below it are unchanged. By hand,
 * for an invented board: three single-phase 10 A loads at unity power factor, one per phase, and
 * diversity 0.8 → 8 A per phase into the board; with a 25 % allowance 8 × 1.25 = 10 A.
 */
import { describe, expect, test } from 'vitest';
import { solve } from '../../../src/solver/solve.ts';
import { network } from '../../fixtures/build.ts';
import type { Board } from '../../../src/model/types.ts';

function site(board: Partial<Board>) {
  const b = network()
    .supply('S')
    .board('DB', { diversity: 0.8, ...board })
    .cable('SM', 'S', 'DB', {
      lengthM: 30,
      sizeMm2: 10,
      phases: 3,
      cpc: { kind: 'core', sizeMm2: 10, material: 'Cu' },
    });
  for (const [k, phase] of (['L1', 'L2', 'L3'] as const).entries())
    b.load(`L${k + 1}`, { amps: 10, phase }).cable(`C${k + 1}`, 'DB', `L${k + 1}`, { lengthM: 10 });
  return b.doc();
}

describe('spare capacity allowance', () => {
  test('the sub-main carries the demand after diversity × (1 + allowance); the finals are unchanged', () => {
    const plain = solve(site({}));
    const spare = solve(site({ spareCapacityPct: 25 }));
    expect(plain.cables.SM!.ibA).toBeCloseTo(8, 9);
    expect(spare.cables.SM!.ibA).toBeCloseTo(10, 9);
    expect(spare.cables.C1!.ibA).toBeCloseTo(10, 9);
    // The sub-main's own drop grows in proportion; the finals' drops do not change.
    expect(spare.cables.SM!.dropV / plain.cables.SM!.dropV).toBeCloseTo(1.25, 9);
    expect(spare.cables.C1!.dropV).toBe(plain.cables.C1!.dropV);
    const ib = spare.cables.SM!.working.find((w) => w.key === 'ib')!;
    expect(ib.inputs.find((i) => i.name === 'diversity')!.value).toBeCloseTo(0.8, 12);
    expect(ib.inputs.find((i) => i.name === 'spare')).toMatchObject({ value: 25, unit: '%' });
  });

  test('a bad allowance is a finding naming the field; the diversity alone is used meanwhile', () => {
    const r = solve(site({ spareCapacityPct: -5 }));
    const f = r.findings.find((x) => x.code === 'badSpareCapacity')!;
    expect(f.elementId).toBe('DB');
    expect(f.message).toMatch(/spareCapacityPct must be a percentage from 0 to 200, got -5/);
    expect(r.cables.SM!.ibA).toBeCloseTo(8, 9);
  });
});
