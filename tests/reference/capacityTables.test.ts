/** Capacity cells and correction factors against published values (check-values §7). */
import { describe, expect, it } from 'vitest';
import { lookupCapacity, type CapacityQuery } from '../../src/catalogue/capacityTables.ts';
import { groupingFactor, temperatureFactor } from '../../src/catalogue/capacityFactors.ts';
import { cableCapacity } from '../../src/solver/protection/capacity.ts';
import { BUILT_IN_CAPACITY_TABLES } from '../../src/catalogue/capacityTables.ts';
import { newCable } from '../../src/model/defaults.ts';

const it_ = (q: Omit<CapacityQuery, 'material'>) => lookupCapacity({ material: 'Cu', ...q })?.itA;

describe('tabulated capacities', () => {
  it('flat T&E 2.5 mm² clipped direct 27 A and 4 mm² method 100 27 A (BS 7671 4D5, confirmed [S36d])', () => {
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'flatTwinEarth',
        method: 'clippedDirect',
        loaded: 2,
        sizeMm2: 2.5,
      }),
    ).toBe(27);
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'flatTwinEarth',
        method: 'aboveInsulation',
        loaded: 2,
        sizeMm2: 4,
      }),
    ).toBe(27);
  });
  it('flat T&E 1.0 mm² clipped direct 16 A (BS 7671 4D5 column 6, confirmed [S36b])', () => {
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'flatTwinEarth',
        method: 'clippedDirect',
        loaded: 2,
        sizeMm2: 1,
      }),
    ).toBe(16);
  });
  it('PVC multicore 3 loaded: B2 1.5 mm² 15 A, B2 120 mm² 206 A, C 35 mm² 119 A (IEC B.52.4, confirmed [S25])', () => {
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'conduitOnWall',
        loaded: 3,
        sizeMm2: 1.5,
      }),
    ).toBe(15);
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'conduitOnWall',
        loaded: 3,
        sizeMm2: 120,
      }),
    ).toBe(206);
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'clippedDirect',
        loaded: 3,
        sizeMm2: 35,
      }),
    ).toBe(119);
  });
  it('PVC multicore 2 loaded: C 2.5 mm² 27 A, A2 2.5 mm² 18.5 A (IEC B.52.2, from memory)', () => {
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'clippedDirect',
        loaded: 2,
        sizeMm2: 2.5,
      }),
    ).toBe(27);
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'conduitInInsulatedWall',
        loaded: 2,
        sizeMm2: 2.5,
      }),
    ).toBe(18.5);
  });
  it('single-core PVC clipped 50 mm² 182 A (2 cables) differs from multicore 168 A (BS 4D1A confirmed [S18]; §7.4 note)', () => {
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'singleCore',
        method: 'clippedDirect',
        loaded: 2,
        sizeMm2: 50,
      }),
    ).toBe(182);
    expect(
      it_({
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'clippedDirect',
        loaded: 2,
        sizeMm2: 50,
      }),
    ).toBe(168);
  });
  it('XLPE single-core method C 3/4 cables 150 mm² 436 A (BS 4E1A, confirmed [S14]; "4036" typo read as 436)', () => {
    expect(
      it_({
        insulation: 'thermosetting90',
        construction: 'singleCore',
        method: 'clippedDirect',
        loaded: 3,
        sizeMm2: 150,
      }),
    ).toBe(436);
  });
  it('XLPE/SWA 3/4-core: C 16 mm² 94 A, D 25 mm² 96 A, E 400 mm² 728 A (BS 4E4A, confirmed [S16])', () => {
    expect(
      it_({
        insulation: 'thermosetting90',
        construction: 'armouredMulticore',
        method: 'clippedDirect',
        loaded: 3,
        sizeMm2: 16,
      }),
    ).toBe(94);
    expect(
      it_({
        insulation: 'thermosetting90',
        construction: 'armouredMulticore',
        method: 'buriedDirect',
        loaded: 3,
        sizeMm2: 25,
      }),
    ).toBe(96);
    expect(
      it_({
        insulation: 'thermosetting90',
        construction: 'armouredMulticore',
        method: 'trayOrFreeAir',
        loaded: 3,
        sizeMm2: 400,
      }),
    ).toBe(728);
  });
  it('no table covers aluminium or non-armoured XLPE multicore: undefined, not a guess', () => {
    expect(
      lookupCapacity({
        material: 'Al',
        insulation: 'thermoplastic70',
        construction: 'multicore',
        method: 'clippedDirect',
        loaded: 3,
        sizeMm2: 25,
      }),
    ).toBeUndefined();
    expect(
      it_({
        insulation: 'thermosetting90',
        construction: 'multicore',
        method: 'clippedDirect',
        loaded: 3,
        sizeMm2: 25,
      }),
    ).toBeUndefined();
  });
});

describe('correction factors', () => {
  it('ambient PVC 40/45/50/55 °C: 0.87/0.79/0.71/0.61 (IEC B.52.14, from memory; implicitly confirmed [S25])', () => {
    expect([40, 45, 50, 55].map((t) => temperatureFactor('thermoplastic70', t, 30)?.factor)).toEqual([
      0.87, 0.79, 0.71, 0.61,
    ]);
  });
  it('every air factor matches sqrt((θmax − θa)/(θmax − 30)) to ±0.01 (check-values §7.7, derived)', () => {
    for (const [ins, tmax] of [
      ['thermoplastic70', 70],
      ['thermosetting90', 90],
    ] as const) {
      for (let t = 10; t < tmax; t += 5) {
        const f = temperatureFactor(ins, t, 30);
        if (!f) continue;
        expect(Math.abs(f.factor - Math.sqrt((tmax - t) / (tmax - 30)))).toBeLessThanOrEqual(0.01);
      }
    }
  });
  it('an ambient between steps rounds to the hotter one (never overstates capacity); PVC at 65 °C is not rated', () => {
    expect(temperatureFactor('thermoplastic70', 37, 30)?.factor).toBe(0.87);
    expect(temperatureFactor('thermoplastic70', 65, 30)).toBeUndefined();
  });
  it('ground 25 °C PVC 0.95 / XLPE 0.96 (IEC B.52.15, from memory)', () => {
    expect(temperatureFactor('thermoplastic70', 25, 20)?.factor).toBe(0.95);
    expect(temperatureFactor('thermosetting90', 25, 20)?.factor).toBe(0.96);
  });
  it('grouping: 20 bunched 0.38 (confirmed [S26]); 3 bunched 0.70, 4 on perforated tray 0.77 (IEC B.52.17, from memory)', () => {
    expect(groupingFactor('bunched', 20)?.factor).toBe(0.38);
    expect(groupingFactor('bunched', 3)?.factor).toBe(0.7);
    expect(groupingFactor('tray', 4)?.factor).toBe(0.77);
    expect(groupingFactor('bunched', 10)?.factor).toBe(0.45);
    expect(groupingFactor('bunched', 21)).toBeUndefined();
  });
});

describe('Iz = It x Ca x Cg x Ci', () => {
  it('2.5 mm² T&E clipped, 40 °C, 3 bunched, Ci 0.5: 27 x 0.87 x 0.70 x 0.5 = 8.2215 A', () => {
    const cable = newCable('C', 'A', 'B', undefined, {
      lengthM: 10,
      installation: {
        method: 'clippedDirect',
        ambientC: 40,
        groupedCircuits: 3,
        groupArrangement: 'bunched',
        insulationFactor: 0.5,
      },
    });
    const cap = cableCapacity(cable, BUILT_IN_CAPACITY_TABLES);
    if ('error' in cap) throw new Error(cap.error);
    expect(cap.izA).toBeCloseTo(8.2215, 6);
  });
  it('a missing cell is a clear message naming the construction and the fix', () => {
    const cable = newCable('C', 'A', 'B', undefined, {
      lengthM: 10,
      material: 'Al',
      sizeMm2: 16,
      construction: 'multicore',
    });
    const cap = cableCapacity(cable, BUILT_IN_CAPACITY_TABLES);
    expect('error' in cap && cap.error).toMatch(/no capacity data for Al .* load a capacity data set/);
  });
});
