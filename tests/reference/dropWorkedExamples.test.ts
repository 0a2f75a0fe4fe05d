/**
 * Published and derived voltage-drop vectors (check-values §9). Where a vector is stated in a
 * published table's mV/A/m, that value is loaded as a user data set, so the solver's method is
 * tested on exactly the published inputs; the built-in derived data are compared separately
 * within the tables' rounding.
 */
import { describe, expect, it } from 'vitest';
import { solveDrop } from '../../src/solver/solveDrop.ts';
import { solve } from '../../src/solver/solve.ts';
import { parseCatalogueCsv } from '../../src/catalogue/loadCatalogue.ts';
import type { CatalogueSet } from '../../src/catalogue/catalogueSet.ts';
import { network } from '../fixtures/build.ts';

function dataSet(rows: string): CatalogueSet {
  const loaded = parseCatalogueCsv(
    `# id: vectors\n# title: Check vectors\n# source: check-values.md §9\nmaterial,insulation,construction,sizeMm2,mvPerAm1phR,mvPerAm1phX,mvPerAm3phR,mvPerAm3phX,rOhmPerKm,xOhmPerKm\n${rows}`,
  );
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  return loaded.catalogue;
}

describe('VD-1: single-phase final, 2.5 mm² at 18 mV/A/m (BS 7671 Table 4D5 value; vector D)', () => {
  const set = dataSet('Cu,thermoplastic70,flatTwinEarth,2.5,18,,,,,');
  const build = (category: 'lighting' | 'other') =>
    network({ dataSet: 'vectors' })
      .supply('S', { phases: 1 })
      .load('L', { amps: 20, category })
      .cable('C', 'S', 'L', { lengthM: 25, sizeMm2: 2.5, construction: 'flatTwinEarth' })
      .doc();

  it('drops 9.00 V = 3.913 % of 230 V', () => {
    const r = solveDrop(build('other'), set);
    expect(r.cables.C?.dropV).toBeCloseTo(9.0, 6);
    expect(r.loads.L?.cumulativePct.value).toBeCloseTo(3.913, 3);
    expect(r.loads.L?.cumulativePct.basis).toBe('U0');
  });

  it('fails the 3 % lighting limit and passes the 5 % other limit (IEC 60364-5-52 Table G.52.1 type A)', () => {
    expect(solveDrop(build('lighting'), set).loads.L?.status).toBe('over');
    // 3.913 / 5 = 78 % of the budget, below the 80 % close threshold
    expect(solveDrop(build('other'), set).loads.L?.status).toBe('within');
  });

  it('the built-in derived 2.5 mm² data agree within the table rounding (17.73 vs 18 mV/A/m)', () => {
    const r = solveDrop(build('other'));
    expect(r.cables.C?.dropV).toBeCloseTo((17.73 * 20 * 25) / 1000, 1);
  });
});

describe('VD-2: cumulative through a balanced sub-main (vector D; 16 mm² 2.4 mV/A/m from memory)', () => {
  const set = dataSet(
    'Cu,thermoplastic70,multicore,16,,,2.4,,,\nCu,thermoplastic70,flatTwinEarth,2.5,18,,,,,',
  );
  // Sub-main carries 40 A on every phase: a 24 A three-phase load plus one 16 A final per phase.
  const b = network({ dataSet: 'vectors' })
    .supply('S')
    .board('DB')
    .cable('SM', 'S', 'DB', { lengthM: 25, sizeMm2: 16, phases: 3 })
    .load('M', { amps: 24, phases: 3 })
    .cable('CM', 'DB', 'M', { lengthM: 1, sizeMm2: 16, phases: 3 });
  for (const p of ['L1', 'L2', 'L3'] as const)
    b.load(`F${p}`, { amps: 16, phase: p }).cable(`C${p}`, 'DB', `F${p}`, {
      lengthM: 20,
      sizeMm2: 2.5,
      construction: 'flatTwinEarth',
    });
  const r = solveDrop(b.doc(), set);

  it('sub-main 2.400 V line to line (√3 method) = 1.386 V per phase', () => {
    expect(r.cables.SM?.dropMethod).toBe('balancedThreePhase');
    expect(r.cables.SM?.dropV).toBeCloseTo(2.4, 6);
    expect(r.cables.SM?.dropPct.basis).toBe('ULL');
    expect(r.cables.SM?.phaseDropV.L2).toBeCloseTo(2.4 / Math.sqrt(3), 6);
  });

  it('final 5.760 V; cumulative 7.146 V = 3.107 % of 230 V', () => {
    expect(r.cables.CL1?.dropV).toBeCloseTo(5.76, 6);
    expect(r.loads.FL1?.cumulativePct.value).toBeCloseTo(3.107, 3);
    expect(r.loads.FL3?.cumulativePct.value).toBeCloseTo(3.107, 3);
    expect(r.loads.FL1?.voltageV.L1).toBeCloseTo(230 - 7.146, 2);
  });
});

describe('VD-3 and VD-4: the IEC 60364-5-52 Annex G formula (ρ1 = 0.0225 Ω·mm²/m, λ = 0.08 mΩ/m)', () => {
  it('VD-3: three-phase 50 mm², 100 m, 100 A, cos φ 0.8: u = 4.08 V per phase, 1.774 % of U0', () => {
    // r = ρ1 / S = 0.0225 / 50 Ω/m = 0.45 Ω/km; x = λ = 0.08 Ω/km (IEC 60364-5-52 G.52.2 formula)
    const set = dataSet('Cu,thermoplastic70,multicore,50,,,,,0.45,0.08');
    const doc = network({ dataSet: 'vectors' })
      .supply('S')
      .load('M', { amps: 100, phases: 3, powerFactor: 0.8 })
      .cable('C', 'S', 'M', { lengthM: 100, sizeMm2: 50, phases: 3 })
      .doc();
    const r = solveDrop(doc, set);
    expect(r.cables.C?.phaseDropV.L1).toBeCloseTo(4.08, 6);
    expect(r.loads.M?.cumulativePct.value).toBeCloseTo(1.774, 3);
  });

  it('VD-4: single-phase (b = 2) 2.5 mm², 30 m, 16 A, cos φ 1: u = 8.64 V = 3.757 %', () => {
    const set = dataSet('Cu,thermoplastic70,multicore,2.5,,,,,9,0.08');
    const doc = network({ dataSet: 'vectors' })
      .supply('S')
      .load('L', { amps: 16, powerFactor: 1 })
      .cable('C', 'S', 'L', { lengthM: 30, sizeMm2: 2.5 })
      .doc();
    const r = solveDrop(doc, set);
    expect(r.cables.C?.dropV).toBeCloseTo(8.64, 6);
    expect(r.loads.L?.cumulativePct.value).toBeCloseTo(3.757, 3);
  });
});

describe('Electrical Installation Guide 2018, chapter G, example 2 (Fig. G32)', () => {
  // The guide's K values (Fig. G30): 0.59 V/A/km three-phase for 70 mm² at cos φ 0.8, and
  // 19 V/A/km single-phase for 2.5 mm² lighting at cos φ 1. K already includes the power factor,
  // so it is loaded as the resistive value and the loads are given cos φ 1.
  const set = dataSet('Cu,thermoplastic70,multicore,70,,,0.59,,,\nCu,thermoplastic70,multicore,2.5,19,,,,,');
  const build = () => {
    const b = network({ dataSet: 'vectors', limitProfile: 'iecPrivate' })
      .supply('S')
      .board('DB')
      .cable('LINE', 'S', 'DB', { lengthM: 50, sizeMm2: 70, phases: 3 })
      // 150 A on the line: the three 20 A lighting circuits plus a 130 A balanced remainder.
      .load('REST', { amps: 130, phases: 3 })
      .cable('CR', 'DB', 'REST', { lengthM: 1, sizeMm2: 70, phases: 3 });
    for (const p of ['L1', 'L2', 'L3'] as const)
      b.load(`LT${p}`, { amps: 20, phase: p, category: 'lighting' }).cable(`C${p}`, 'DB', `LT${p}`, {
        lengthM: 20,
        sizeMm2: 2.5,
      });
    return b.doc();
  };

  it('line drop 4.4 V phase to phase (4.425 exact), 2.54 V phase to neutral, circuit 7.6 V, total 4.4 %', () => {
    const r = solveDrop(build(), set);
    expect(r.cables.LINE?.dropV).toBeCloseTo(4.425, 6);
    expect(r.cables.LINE?.phaseDropV.L1).toBeCloseTo(4.425 / Math.sqrt(3), 6);
    expect(r.cables.CL1?.dropV).toBeCloseTo(7.6, 6);
    // published 4.4 % (10.1 V); exact 10.155 V = 4.415 %
    expect(r.loads.LTL1?.cumulativePct.value).toBeCloseTo(4.415, 3);
    // the guide judges it satisfactory against its 6 % limit (private supply lighting)
    expect(r.loads.LTL1?.status).not.toBe('over');
  });

  it('the built-in derived data give a lower total, as IEC 60228 r at 70 °C sits below the guide’s K', () => {
    const doc = build();
    for (const c of doc.cables) if (c.sizeMm2 === 70) c.construction = 'multicore';
    for (const n of doc.nodes) if (n.kind === 'load' && n.id === 'REST') n.powerFactor = 0.8;
    const r = solveDrop(doc);
    const pct = r.loads.LTL1?.cumulativePct.value ?? NaN;
    // Derived: ≈ 4.1 %; the guide's K values (19 and 0.59) are 5-12 % above 2 × / √3 × r70.
    expect(pct).toBeGreaterThan(0.85 * 4.415);
    expect(pct).toBeLessThan(4.415);
  });
});

describe('distributor example: 35 mm² PVC/SWA, 3-phase 100 A over 150 m at 1.1 mV/A/m (S15)', () => {
  const build = () =>
    network({ dataSet: 'vectors' })
      .supply('S')
      .load('M', { amps: 100, phases: 3 })
      .cable('C', 'S', 'M', { lengthM: 150, sizeMm2: 35, phases: 3, construction: 'armouredMulticore' })
      .doc();

  it('Vd = 16.5 V, 4.125 % of 400 V, with the tabulated value', () => {
    const r = solveDrop(build(), dataSet('Cu,thermoplastic70,armouredMulticore,35,,,1.1,,,'));
    expect(r.cables.C?.dropV).toBeCloseTo(16.5, 6);
    expect(r.cables.C?.dropPct).toMatchObject({ basis: 'ULL', basisV: 400 });
    expect(r.cables.C?.dropPct.value).toBeCloseTo(4.125, 6);
  });

  it('the built-in data agree within the table’s 2 %', () => {
    const v = solveDrop(build()).cables.C?.dropV ?? NaN;
    expect(Math.abs(v - 16.5) / 16.5).toBeLessThan(0.02);
  });
});

describe('VD-3: a load spread evenly along its cable (uniformly distributed load)', () => {
  // The far-end drop of a load spread evenly along a run is that of the whole current over half
  // the length (common practice: ∫ I (1 − x/L) dx from 0 to L = I L / 2). With the 18 mV/A/m of
  // vector D: 20 A spread over 25 m drops 18 × 20 × 25 / 2 / 1000 = 4.50 V = 1.957 % of 230 V.
  const set = dataSet('Cu,thermoplastic70,flatTwinEarth,2.5,18,,,,,');
  const build = (distributed: boolean) =>
    network({ dataSet: 'vectors' })
      .supply('S', { phases: 1, pfcKa: 6 })
      .load('L', { amps: 20, category: 'lighting', loadKind: 'lighting', distributed })
      .cable('C', 'S', 'L', { lengthM: 25, sizeMm2: 2.5, construction: 'flatTwinEarth' })
      .doc();

  it('drops 4.50 V, half the lumped 9.00 V; the lighting load then meets its 3 % limit', () => {
    const r = solveDrop(build(true), set);
    expect(r.cables.C?.dropV).toBeCloseTo(4.5, 6);
    expect(r.loads.L?.cumulativePct.value).toBeCloseTo(1.957, 3);
    expect(solveDrop(build(false), set).loads.L?.status).toBe('over');
    expect(r.loads.L?.status).toBe('within');
    const w = r.cables.C!.working.find((x) => x.key === 'drop')!;
    expect(w.formula).toContain('× L × k ×');
    expect(w.inputs.find((i) => i.name === 'k')?.value).toBe(0.5);
  });

  it('leaves the loop impedance at the far end: the whole length still counts for Zs', () => {
    const spread = solve(build(true), set).loads.L!.protection!.zsOhm;
    const lumped = solve(build(false), set).loads.L!.protection!.zsOhm;
    expect(spread).toBe(lumped);
  });
});
