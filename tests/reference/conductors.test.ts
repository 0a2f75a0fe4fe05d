import { describe, expect, it } from 'vitest';
import { BUILTIN_CATALOGUE } from '../../src/catalogue/builtinConductors.ts';
import { findConductor, mvPerAm } from '../../src/catalogue/conductorLookup.ts';
import type { Construction, Insulation, Material } from '../../src/model/types.ts';
import { agreesWithTable } from '../fixtures/tableTolerance.ts';

function row(material: Material, insulation: Insulation, construction: Construction, size: number) {
  const r = findConductor(BUILTIN_CATALOGUE, material, insulation, construction, size);
  if (!r) throw new Error(`no row ${material} ${insulation} ${construction} ${size}`);
  return r;
}

type Cell = [size: number, r: string, x?: string, z?: string];

function check(
  construction: Construction,
  insulation: Insulation,
  form: 'singlePhase' | 'threePhase',
  cells: Cell[],
  zTolAt25 = 0.02,
) {
  for (const [size, r, x, z] of cells) {
    const mv = mvPerAm(row('Cu', insulation, construction, size))[form];
    expect(agreesWithTable(mv.r, r, size), `${size} mm² r ${mv.r.toFixed(4)} vs ${r}`).toBe(true);
    if (x !== undefined)
      expect(agreesWithTable(mv.x, x, size), `${size} mm² x ${mv.x.toFixed(4)} vs ${x}`).toBe(true);
    const zTol = size === 25 ? zTolAt25 : 0.02;
    if (z !== undefined)
      expect(agreesWithTable(mv.z, z, size, zTol), `${size} mm² z ${mv.z.toFixed(4)} vs ${z}`).toBe(true);
  }
}

describe('resistance at operating temperature from IEC 60228', () => {
  // IEC 60228:2004 Table 2 with the Annex B coefficient; multipliers 1.19650 (70 °C) and 1.27510
  // (90 °C) for Cu, 1.2015 and 1.2821 for Al, as derived in check-values §1.4 (D).
  it.each([
    [1.5, 14.48, 15.43],
    [2.5, 8.866, 9.448],
    [16, 1.376, 1.466],
    [50, 0.463, 0.4935],
    [70, 0.3207, 0.3417],
  ])('Cu %s mm²: %s Ω/km at 70 °C, %s at 90 °C', (size, at70, at90) => {
    expect(row('Cu', 'thermoplastic70', 'multicore', size).rOhmPerM * 1000).toBeCloseTo(at70, 2);
    expect(row('Cu', 'thermosetting90', 'multicore', size).rOhmPerM * 1000).toBeCloseTo(at90, 2);
  });

  it('aluminium uses 0.00403/K (IEC 60228 Annex B)', () => {
    // 1.20 Ω/km (IEC 60228 Table 2, Al 25 mm²) × 1.2015 = 1.4418
    expect(row('Al', 'thermoplastic70', 'multicore', 25).rOhmPerM * 1000).toBeCloseTo(1.4418, 3);
    // 0.1 Ω/km (Al 300 mm²) × 1.2821 × a.c. factor 1.05 for armoured
    expect(row('Al', 'thermosetting90', 'armouredMulticore', 300).rOhmPerM * 1000).toBeCloseTo(
      0.1 * 1.2821 * 1.05,
      4,
    );
  });

  it('covers Cu 1-300 mm² and Al 16-300 mm² for every round construction, twin-and-earth to 16 mm²', () => {
    for (const c of ['multicore', 'armouredMulticore', 'singleCore'] as const) {
      expect(findConductor(BUILTIN_CATALOGUE, 'Cu', 'thermoplastic70', c, 1)).toBeDefined();
      expect(findConductor(BUILTIN_CATALOGUE, 'Cu', 'thermosetting90', c, 300)).toBeDefined();
      expect(findConductor(BUILTIN_CATALOGUE, 'Al', 'thermoplastic70', c, 16)).toBeDefined();
      expect(findConductor(BUILTIN_CATALOGUE, 'Al', 'thermosetting90', c, 300)).toBeDefined();
      expect(findConductor(BUILTIN_CATALOGUE, 'Al', 'thermosetting90', c, 10)).toBeUndefined();
    }
    expect(findConductor(BUILTIN_CATALOGUE, 'Cu', 'thermoplastic70', 'flatTwinEarth', 16)).toBeDefined();
    expect(findConductor(BUILTIN_CATALOGUE, 'Cu', 'thermoplastic70', 'flatTwinEarth', 25)).toBeUndefined();
  });
});

describe('mV/A/m against published tables (check-values §2)', () => {
  it('70 °C two-core and twin-and-earth, 1-16 mm² (BS 7671 Table 4D5 / two-core column, S17)', () => {
    const cells: Cell[] = [
      [1, '44'],
      [1.5, '29'],
      [2.5, '18'],
      [4, '11'],
      [6, '7.3'],
      [10, '4.4'],
      [16, '2.8'],
    ];
    check('flatTwinEarth', 'thermoplastic70', 'singlePhase', cells);
    check('multicore', 'thermoplastic70', 'singlePhase', cells);
  });

  it('70 °C three/four-core, 1-16 mm² (from memory, check-values §2.1 M column)', () => {
    check('multicore', 'thermoplastic70', 'threePhase', [
      [1, '38'],
      [1.5, '25'],
      [2.5, '15'],
      [4, '9.5'],
      [6, '6.4'],
      [10, '3.8'],
      [16, '2.4'],
    ]);
  });

  it('90 °C two-core and three/four-core, 1.5-16 mm² (BS 7671 Table 4E4B, S12)', () => {
    const two: Cell[] = [
      [1.5, '31'],
      [2.5, '19'],
      [4, '12'],
      [6, '7.9'],
      [10, '4.7'],
      [16, '2.9'],
    ];
    const three: Cell[] = [
      [1.5, '27'],
      [2.5, '16'],
      [4, '10'],
      [6, '6.8'],
      [10, '4.0'],
      [16, '2.5'],
    ];
    check('armouredMulticore', 'thermosetting90', 'singlePhase', two);
    check('armouredMulticore', 'thermosetting90', 'threePhase', three);
  });

  it('90 °C armoured multicore 25-300 mm², r / x / z (BS 7671 Table 4E4B, S12; 25 mm² z printed high, ±3 %)', () => {
    check(
      'armouredMulticore',
      'thermosetting90',
      'singlePhase',
      [
        [25, '1.85', '0.160', '1.90'],
        [35, '1.35', '0.155', '1.35'],
        [50, '0.99', '0.155', '1.00'],
        [70, '0.67', '0.150', '0.69'],
        [95, '0.50', '0.150', '0.52'],
        [120, '0.40', '0.145', '0.42'],
        [150, '0.32', '0.145', '0.35'],
        [185, '0.26', '0.145', '0.29'],
        [240, '0.20', '0.140', '0.24'],
        [300, '0.16', '0.140', '0.21'],
      ],
      0.03,
    );
    check(
      'armouredMulticore',
      'thermosetting90',
      'threePhase',
      [
        [25, '1.60', '0.140', '1.65'],
        [35, '1.15', '0.135', '1.15'],
        [50, '0.86', '0.135', '0.87'],
        [70, '0.59', '0.130', '0.60'],
        [95, '0.43', '0.130', '0.45'],
        [120, '0.34', '0.130', '0.37'],
        [150, '0.28', '0.125', '0.30'],
        [185, '0.22', '0.125', '0.26'],
        [240, '0.175', '0.125', '0.21'],
        [300, '0.140', '0.120', '0.185'],
      ],
      0.03,
    );
  });

  it('70 °C multicore 25-70 mm² (BS 7671 Tables 4D2B/4D4B, from memory, check-values §2.2)', () => {
    for (const c of ['multicore', 'armouredMulticore'] as const) {
      check(c, 'thermoplastic70', 'singlePhase', [
        [25, '1.75', '0.170', '1.75'],
        [35, '1.25', '0.165', '1.25'],
        [50, '0.93', '0.165', '0.94'],
        [70, '0.63', '0.160', '0.65'],
      ]);
      check(c, 'thermoplastic70', 'threePhase', [
        [25, '1.50', '0.145', '1.50'],
        [35, '1.10', '0.145', '1.10'],
        [50, '0.80', '0.140', '0.81'],
        [70, '0.55', '0.140', '0.57'],
      ]);
    }
  });

  it('90 °C single-core touching / trefoil 25-240 mm² (BS 7671 Table 4E1B, S13)', () => {
    // Single-phase "methods C & F touching" column and three-phase "trefoil" column.
    check('singleCore', 'thermosetting90', 'singlePhase', [
      [25, '1.85', '0.190', '1.85'],
      [35, '1.35', '0.180', '1.35'],
      [50, '0.99', '0.180', '1.00'],
      [70, '0.68', '0.175', '0.71'],
      [95, '0.49', '0.170', '0.52'],
      [120, '0.39', '0.165', '0.43'],
      [150, '0.32', '0.165', '0.36'],
      [185, '0.26', '0.165', '0.30'],
      [240, '0.20', '0.160', '0.25'],
    ]);
    check('singleCore', 'thermosetting90', 'threePhase', [
      [25, '1.60', '0.165', '1.60'],
      [35, '1.15', '0.155', '1.15'],
      [50, '0.86', '0.155', '0.87'],
      [70, '0.59', '0.150', '0.61'],
      [95, '0.43', '0.145', '0.45'],
      [120, '0.34', '0.140', '0.37'],
      [150, '0.28', '0.140', '0.31'],
      [185, '0.22', '0.140', '0.26'],
    ]);
  });

  it('a confirmed single value: 35 mm² PVC/SWA three-phase 1.1 mV/A/m (BS 7671 Table 4D4B via S15)', () => {
    const mv = mvPerAm(row('Cu', 'thermoplastic70', 'armouredMulticore', 35)).threePhase;
    expect(agreesWithTable(mv.z, '1.1', 35)).toBe(true);
  });

  it('the comparison itself rejects a value one step off', () => {
    expect(agreesWithTable(17.73, '18', 2.5)).toBe(true);
    expect(agreesWithTable(16.4, '18', 2.5)).toBe(false);
    expect(agreesWithTable(0.6835, '0.67', 70)).toBe(true);
    expect(agreesWithTable(0.7, '0.67', 70)).toBe(false);
  });
});
