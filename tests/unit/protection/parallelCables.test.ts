// Parallel cables: n identical cables in parallel carry 1/n of the impedance of one (Ohm's law for
// equal impedances in parallel). Regression for a double division that understated X in Zs, fault
// level and motor dip.
import { expect, test } from 'vitest';
import { solve } from '../../../src/solver/solve.ts';
import { network } from '../../fixtures/build.ts';

function build(parallel: number, subMainM = 60) {
  return network()
    .supply('S', { phases: 3 })
    .board('DB1')
    .cable('C1', 'S', 'DB1', {
      lengthM: subMainM,
      sizeMm2: 95,
      phases: 3,
      parallel,
      construction: 'armouredMulticore',
      insulation: 'thermosetting90',
      cpc: { kind: 'core', sizeMm2: 50, material: 'Cu' },
      device: { type: 'mccb', ratingA: 250, breakingKa: 36, irMultiple: 1, imMultiple: 10 },
    })
    .load('M1', {
      loadKind: 'motor',
      phases: 3,
      kw: 30,
      powerFactor: 0.85,
      motor: { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 15 },
    })
    .cable('C2', 'DB1', 'M1', { lengthM: 5, sizeMm2: 16, phases: 3 })
    .doc();
}

test('two cables in parallel halve the segment R and X in Zs and the fault loop', () => {
  const one = solve(build(1));
  const two = solve(build(2));
  const zsOf = (r: typeof one, id: string) => r.nodes[id]!.protection!.zs;
  const supplyZs1 = zsOf(one, 'S');
  const seg1 = { r: zsOf(one, 'DB1').rOhm - supplyZs1.rOhm, x: zsOf(one, 'DB1').xOhm - supplyZs1.xOhm };
  const seg2 = {
    r: zsOf(two, 'DB1').rOhm - zsOf(two, 'S').rOhm,
    x: zsOf(two, 'DB1').xOhm - zsOf(two, 'S').xOhm,
  };
  expect(seg1.x).toBeGreaterThan(0);
  expect(seg2.r).toBeCloseTo(seg1.r / 2, 12);
  expect(seg2.x).toBeCloseTo(seg1.x / 2, 12);
});

test('the motor starting dip sees a parallel pair as half the impedance of one cable', () => {
  // Two cables of 60 m in parallel have the impedance of one cable of 30 m.
  const pair = solve(build(2, 60)).loads['M1']!.motorStart!;
  const half = solve(build(1, 30)).loads['M1']!.motorStart!;
  const single = solve(build(1, 60)).loads['M1']!.motorStart!;
  expect(pair.dipAtMotorPct).toBeCloseTo(half.dipAtMotorPct, 10);
  expect(pair.dipAtBoardPct!).toBeCloseTo(half.dipAtBoardPct!, 10);
  expect(single.dipAtMotorPct).toBeGreaterThan(pair.dipAtMotorPct);
});
