// Tree sizing claims the motor starting dip too: a long, small cable to a direct-on-line motor
// fails its dip limit as drawn, and the proposal must fix it with the least added conductor.
// The network is invented for the test; the dip itself is the solver's (docs/protection.md).
import { describe, expect, test } from 'vitest';
import { newBoard, newCable, newLoad, newProject } from '../../../src/model/defaults.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import { solve } from '../../../src/solver/solve.ts';
import { proposeTreeSizing } from '../../../src/solver/sizing/proposeTreeSizing.ts';
import { failingSizingChecks, SIZING_CHECKS } from '../../../src/solver/sizing/sizingCore.ts';
import { clipped } from '../protection/workedDoc.ts';

function motorOnALongRun(): ProjectDocument {
  const doc = newProject({ date: '2025-01-01' });
  doc.nodes.push(
    newBoard('DB1', { x: 0, y: 160 }),
    newLoad('M1', { x: 0, y: 320 }, 'motor', {
      demand: { value: 4, unit: 'kW' },
      motor: { startMultiple: 7, startPowerFactor: 0.3, dipLimitPct: 3 },
    }),
  );
  doc.cables.push(
    newCable('C1', 'S1', 'DB1', undefined, {
      lengthM: 10,
      construction: 'multicore',
      sizeMm2: 25,
      cpc: { kind: 'core', sizeMm2: 25, material: 'Cu' },
      phases: 3,
      device: { type: 'fuseGG', ratingA: 80, breakingKa: 80 },
      installation: clipped,
    }),
    newCable('C2', 'DB1', 'M1', undefined, {
      lengthM: 70,
      construction: 'multicore',
      sizeMm2: 2.5,
      cpc: { kind: 'core', sizeMm2: 2.5, material: 'Cu' },
      phases: 3,
      device: { type: 'fuseGG', ratingA: 20, breakingKa: 80 },
      installation: clipped,
    }),
  );
  return doc;
}

describe('tree sizing and motor starting', () => {
  test('motor dip is one of the checks sizing claims', () => {
    expect(SIZING_CHECKS).toContain('motorDip');
  });

  test('a motor that dips past its limit as drawn gets a larger cable, and the proposal passes', () => {
    const doc = motorOnALongRun();
    const before = failingSizingChecks(solve(doc));
    expect(before).toContainEqual({ id: 'M1', key: 'motorDip' });
    const r = proposeTreeSizing(doc);
    expect(r.passes).toBe(true);
    const applied = structuredClone(doc);
    for (const ch of r.changes) {
      const c = applied.cables.find((x) => x.id === ch.cableId)!;
      if (ch.field === 'sizeMm2') c.sizeMm2 = ch.to;
      else c.cpc.sizeMm2 = ch.to;
    }
    expect(failingSizingChecks(solve(applied))).toEqual([]);
    expect(applied.cables.find((c) => c.id === 'C2')!.sizeMm2).toBeGreaterThan(2.5);
    const dip = solve(applied).nodes['M1']!.protection!.checks.find((c) => c.key === 'motorDip')!;
    expect(dip.value!).toBeLessThanOrEqual(3);
  });
});
