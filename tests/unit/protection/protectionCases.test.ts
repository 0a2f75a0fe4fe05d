/** Protection behaviours beyond the worked example: junctions, TT, missing data, balance, motor dip. */
import { describe, expect, it } from 'vitest';
import { newCable, newJunction, newLoad, newProject } from '../../../src/model/defaults.ts';
import { attachProtection } from '../../../src/solver/protection/attachProtection.ts';
import { imbalancePct, neutralCurrentA } from '../../../src/solver/balancePhases.ts';
import { dipPct } from '../../../src/solver/motorStart.ts';
import { handResults } from './handResults.ts';
import { clipped } from './workedDoc.ts';

function chain() {
  const doc = newProject();
  doc.nodes.push(newJunction('J1', { x: 0, y: 0 }), newLoad('L1', { x: 0, y: 0 }, 'sockets'));
  doc.cables.push(
    newCable('C1', 'S1', 'J1', undefined, {
      lengthM: 10,
      device: { type: 'mcb', curve: 'B', ratingA: 20, breakingKa: 10 },
      installation: clipped,
    }),
    newCable('C2', 'J1', 'L1', undefined, { lengthM: 10, installation: clipped }),
  );
  return doc;
}

describe('protection cases', () => {
  it('a segment beyond a junction is protected by the upstream device and judged as a final circuit', () => {
    const doc = chain();
    const res = attachProtection(doc, handResults(doc, { C1: 16, C2: 16 }));
    expect(res.cables.C2!.protection!.deviceCableId).toBe('C1');
    expect(res.cables.C2!.protection!.requiredTimeS).toBe(0.4);
    // Zs adds both segments: 0.35 + 2 x 10 m x 19.51 mohm/m x 1.1965
    expect(res.nodes.L1!.protection!.zsOhm).toBeCloseTo(0.35 + 2 * 10 * 0.01951 * 1.1965, 5);
  });
  it('TT: an RCD is needed, and RA x IΔn is checked against 50 V (IEC 60364-4-41 411.5.3)', () => {
    const doc = chain();
    const s = doc.nodes[0]!;
    if (s.kind === 'supply') Object.assign(s, { earthing: 'TT', zeOhm: 21, raOhm: 200 });
    let res = attachProtection(doc, handResults(doc, { C1: 16, C2: 16 }));
    expect(res.nodes.L1!.protection!.checks.find((c) => c.key === 'rcdTouch')!.pass).toBeNull();
    doc.cables[0]!.device!.rcd = { type: 'A', idnMa: 30 };
    res = attachProtection(doc, handResults(doc, { C1: 16, C2: 16 }));
    const touch = res.nodes.L1!.protection!.checks.find((c) => c.key === 'rcdTouch')!;
    expect(touch.value).toBeCloseTo(6, 9);
    expect(touch.pass).toBe(true);
    // Zs 21.5 ohm is far above B20's 2.185 ohm, but the 30 mA RCD clears it (Zs <= 1667 ohm).
    expect(res.nodes.L1!.protection!.checks.find((c) => c.key === 'zs')!.pass).toBe(true);
  });
  it('no device: checks that need one are reported unassessed with the fix, not passed', () => {
    const doc = chain();
    delete doc.cables[0]!.device;
    const res = attachProtection(doc, handResults(doc, { C1: 16, C2: 16 }));
    const zs = res.nodes.L1!.protection!.checks.find((c) => c.key === 'zs')!;
    expect(zs.pass).toBeNull();
    expect(zs.message).toMatch(/add one/);
    expect(res.protection!.unassessedChecks).toBeGreaterThan(0);
  });
  it('overloaded cable fails In <= Iz and becomes an error finding', () => {
    const doc = chain();
    doc.cables[0]!.device!.ratingA = 32;
    const res = attachProtection(doc, handResults(doc, { C1: 16, C2: 16 }));
    expect(res.findings.some((f) => f.code === 'overCapacity' && f.elementId === 'C1')).toBe(true);
  });
  it('neutral current 60/45/30 A resistive = 25.98 A (practice note Appendix A worked value)', () => {
    expect(neutralCurrentA(60, 45, 30)).toBeCloseTo(25.98, 2);
    expect(imbalancePct({ L1: 60, L2: 45, L3: 30 })).toBeCloseTo(33.33, 2);
    expect(imbalancePct({ L1: 10, L2: 10, L3: 10 })).toBe(0);
  });
  it('starting dip ΔU = I (R cos φ + X sin φ): 300 A through 0.1 + j0.02 ohm at 0.3 = 6.40 % of 230 V', () => {
    // 300 x (0.1 x 0.3 + 0.02 x 0.9539) / 230 x 100 = 14.72 V / 230 V
    expect(dipPct(300, { rOhm: 0.1, xOhm: 0.02 }, 0.3, 230)).toBeCloseTo(6.4016, 3);
  });
});
