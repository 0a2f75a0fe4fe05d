/** Maximum Zs, disconnection times, RCD limits, R1 + R2 and fuse data against published values. */
import { describe, expect, it } from 'vitest';
import { BUILT_IN_GG_FUSES, INSTANTANEOUS_MULTIPLE, TEST_ZS_FACTOR } from '../../src/catalogue/devices.ts';
import {
  maxZsOhm,
  operatingCurrent,
  operatingTimeS,
  requiredDisconnectionS,
} from '../../src/solver/protection/disconnection.ts';
import { segmentLoop } from '../../src/solver/protection/impedance.ts';
import { newCable } from '../../src/model/defaults.ts';
import type { BreakerCurve } from '../../src/model/types.ts';

// BS 7671:2018 Table 41.3 printed values (check-values §4.1: B32 confirmed [S9], others from memory);
// compared to ±0.005 ohm as check-values advises.
const TABLE_41_3: Record<BreakerCurve, Record<number, number>> = {
  B: {
    6: 7.28,
    10: 4.37,
    16: 2.73,
    20: 2.19,
    25: 1.75,
    32: 1.37,
    40: 1.09,
    50: 0.87,
    63: 0.69,
    80: 0.55,
    100: 0.44,
    125: 0.35,
  },
  C: {
    6: 3.64,
    10: 2.19,
    16: 1.37,
    20: 1.09,
    25: 0.87,
    32: 0.68,
    40: 0.55,
    50: 0.44,
    63: 0.35,
    80: 0.27,
    100: 0.22,
    125: 0.17,
  },
  D: {
    6: 1.82,
    10: 1.09,
    16: 0.68,
    20: 0.55,
    25: 0.44,
    32: 0.34,
    40: 0.27,
    50: 0.22,
    63: 0.17,
    80: 0.14,
    100: 0.11,
    125: 0.09,
  },
};

describe('maximum Zs for breakers (Cmin x U0 / Ia)', () => {
  for (const curve of ['B', 'C', 'D'] as const) {
    for (const [inA, printed] of Object.entries(TABLE_41_3[curve])) {
      it(`type ${curve} ${inA} A: ${printed} ohm (BS 7671 Table 41.3)`, () => {
        const ia = operatingCurrent(
          { type: 'mcb', curve, ratingA: Number(inA), breakingKa: 6 },
          0.4,
          BUILT_IN_GG_FUSES,
        );
        if ('error' in ia) throw new Error(ia.error);
        expect(Math.abs(maxZsOhm(ia.iaA, 230) - printed)).toBeLessThanOrEqual(0.005);
      });
    }
  }
  it('formula coefficients: B 43.7/In, C 21.85/In, D 10.925/In (check-values §4, derived from the confirmed rule)', () => {
    expect(maxZsOhm(INSTANTANEOUS_MULTIPLE.B * 32, 230)).toBeCloseTo(43.7 / 32, 10);
    expect(maxZsOhm(INSTANTANEOUS_MULTIPLE.C * 32, 230)).toBeCloseTo(21.85 / 32, 10);
    expect(maxZsOhm(INSTANTANEOUS_MULTIPLE.D * 32, 230)).toBeCloseTo(10.925 / 32, 10);
  });
  it('80 % measured limit: B16 2.19, C32 0.55 ohm (check-values §4.1 80 % table, ±0.01)', () => {
    expect(Math.abs(TEST_ZS_FACTOR * maxZsOhm(80, 230) - 2.19)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(TEST_ZS_FACTOR * maxZsOhm(320, 230) - 0.55)).toBeLessThanOrEqual(0.01);
  });
  it('RCD: Zs x IΔn <= 50 V gives 1667 ohm at 30 mA and 500 ohm at 100 mA (BS 7671 Table 41.5, confirmed [S9])', () => {
    expect(50 / 0.03).toBeCloseTo(1666.7, 1);
    expect(Math.round(50 / 0.1)).toBe(500);
  });
});

describe('disconnection times (BS 7671 / IEC 60364-4-41 Table 41.1, check-values §4, confirmed [S11])', () => {
  it('TN final 0.4 s, TT final 0.2 s, TN distribution 5 s, TT distribution 1 s at 230 V', () => {
    expect(requiredDisconnectionS('TN-C-S', 'final', 32, 230)).toBe(0.4);
    expect(requiredDisconnectionS('TT', 'final', 32, 230)).toBe(0.2);
    expect(requiredDisconnectionS('TN-S', 'distribution', 100, 230)).toBe(5);
    expect(requiredDisconnectionS('TT', 'distribution', 100, 230)).toBe(1);
  });
  it('a final circuit over 63 A takes the 5 s time (BS 7671 411.3.2.3 scope, confirmed [S9])', () => {
    expect(requiredDisconnectionS('TN-C-S', 'final', 80, 230)).toBe(5);
  });
});

describe('gG fuse data set', () => {
  it('reproduces the printed BS 88-2 Zs it was built from: 32 A 1.04 / 2.10 ohm (BS 7671 Tables 41.2, 41.4; from memory)', () => {
    const f = { type: 'fuseGG' as const, ratingA: 32, breakingKa: 80 };
    const a04 = operatingCurrent(f, 0.4, BUILT_IN_GG_FUSES);
    const a5 = operatingCurrent(f, 5, BUILT_IN_GG_FUSES);
    if ('error' in a04 || 'error' in a5) throw new Error('no row');
    expect(maxZsOhm(a04.iaA, 230)).toBeCloseTo(1.04, 9);
    expect(maxZsOhm(a5.iaA, 230)).toBeCloseTo(2.1, 9);
  });
  // IEC 60269-1 gG gates (from memory): Imin(10 s) and Imax(5 s) per rating. A 5 s operating current
  // must lie between them; the 0.4 s current must lie above the 5 s one and below Imax(0.1 s).
  const GATES: Record<number, [imin10: number, imax5: number, imax01: number]> = {
    16: [33, 65, 150],
    20: [42, 85, 200],
    25: [52, 110, 260],
    32: [75, 150, 350],
    40: [95, 190, 450],
    50: [125, 250, 610],
    63: [160, 320, 820],
    80: [215, 425, 1100],
    100: [290, 580, 1450],
    125: [355, 715, 1910],
    160: [460, 950, 2590],
    200: [610, 1250, 3420],
  };
  for (const row of BUILT_IN_GG_FUSES.rows) {
    it(`${row.ratingA} A lies inside the IEC 60269-1 gates (from memory)`, () => {
      const [imin10, imax5, imax01] = GATES[row.ratingA]!;
      expect(row.ia5sA).toBeGreaterThanOrEqual(imin10);
      expect(row.ia5sA).toBeLessThanOrEqual(imax5);
      expect(row.ia04sA).toBeGreaterThan(row.ia5sA);
      expect(row.ia04sA).toBeLessThanOrEqual(imax01);
    });
  }
  it('operating time passes through its own 5 s and 0.4 s points and is null below the 5 s current', () => {
    const f = { type: 'fuseGG' as const, ratingA: 63, breakingKa: 80 };
    const row = BUILT_IN_GG_FUSES.rows.find((r) => r.ratingA === 63)!;
    expect(operatingTimeS(f, row.ia5sA, BUILT_IN_GG_FUSES)).toBeCloseTo(5, 9);
    expect(operatingTimeS(f, row.ia04sA, BUILT_IN_GG_FUSES)).toBeCloseTo(0.4, 9);
    expect(operatingTimeS(f, row.ia5sA * 0.99, BUILT_IN_GG_FUSES)).toBeNull();
  });
});

describe('R1 + R2 (check-values §9.5)', () => {
  // Guide to the Wiring Regulations App. 4 [S19] and On-Site Guide [S37], mohm/m at 20 °C.
  const PUBLISHED: [line: number, cpc: number, mOhmPerM: number][] = [
    [1.5, 1, 30.2],
    [2.5, 1.5, 19.51],
    [4, 1.5, 16.71],
    [6, 2.5, 10.49],
    [10, 4, 6.44],
    [16, 6, 4.23],
    [2.5, 2.5, 14.82],
    [1.5, 1.5, 24.2],
  ];
  for (const [line, cpc, m] of PUBLISHED) {
    it(`${line}/${cpc} mm²: ${m} mohm/m`, () => {
      const seg = segmentLoop(
        newCable('C', 'A', 'B', undefined, {
          lengthM: 1000,
          sizeMm2: line,
          cpc: { kind: 'core', sizeMm2: cpc, material: 'Cu' },
        }),
      )!;
      expect(Math.abs(seg.r1r2ColdOhm - m)).toBeLessThanOrEqual(0.011);
    });
  }
  it('forum worked example [S32]: Ze 0.6 + 10 m of 1.5/1.0 x 1.20 = 0.96 ohm; ours at 70 °C (x 1.1965) within 0.5 %', () => {
    const seg = segmentLoop(
      newCable('C', 'A', 'B', undefined, {
        lengthM: 10,
        sizeMm2: 1.5,
        cpc: { kind: 'core', sizeMm2: 1, material: 'Cu' },
      }),
    )!;
    expect(0.6 + seg.r1r2HotOhm).toBeCloseTo(0.96, 2);
    expect(Math.abs(seg.r1r2HotOhm - 0.3624) / 0.3624).toBeLessThan(0.005);
  });
  it('ZS-1 (check-values §9.6, derived): 30 m 2.5/1.5, Ze 0.35: cold 0.9353 ohm; hot near 1.0524 ohm (x1.20)', () => {
    const seg = segmentLoop(newCable('C', 'A', 'B', undefined, { lengthM: 30 }))!;
    expect(0.35 + seg.r1r2ColdOhm).toBeCloseTo(0.9353, 4);
    expect(Math.abs(0.35 + seg.r1r2HotOhm - 1.0524)).toBeLessThan(0.005);
  });
});
