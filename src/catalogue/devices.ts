/**
 * Protective devices: standard rating series, the instantaneous-trip multiples of circuit-breaker
 * curves, conventional operating currents (I2) and a replaceable gG fuse time-current data set.
 *
 * Sources are named per constant. The gG data set is documented data: a user may load their own
 * (for example from a manufacturer's curves or a licensed copy of the wiring rules) and the working
 * then names it.
 */
import type { BreakerCurve, Device, DeviceType } from '../model/types.ts';

/** Preferred rated currents of circuit-breakers (IEC 60898-1 §5.3.2, from memory; 13 A is UK usage). */
export const BREAKER_RATINGS_A: readonly number[] = [6, 10, 13, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125];

/** gG fuse ratings covered by the built-in fuse data set (IEC 60269-1 R10 series, from memory). */
export const FUSE_GG_RATINGS_A: readonly number[] = [16, 20, 25, 32, 40, 50, 63, 80, 100, 125, 160, 200];

/** Common moulded-case frame ratings (common practice). */
export const MCCB_RATINGS_A: readonly number[] = [
  100, 125, 160, 200, 250, 320, 400, 500, 630, 800, 1000, 1250,
];

/** Standard rated short-circuit capacities in kA (IEC 60898-1 Icn values up to 25 kA, from memory). */
export const BREAKING_CAPACITIES_KA: readonly number[] = [1.5, 3, 4.5, 6, 10, 15, 20, 25, 36, 50, 70];

/**
 * Multiple of In at which a breaker of each curve trips instantaneously (the upper limit of its
 * instantaneous band): IEC 60898-1 Table 7 bands B 3-5, C 5-10, D 10-20; BS 7671 Reg 411.4.5 uses
 * the upper limits (check-values §4, confirmed).
 */
export const INSTANTANEOUS_MULTIPLE: Readonly<Record<BreakerCurve, number>> = { B: 5, C: 10, D: 20 };

/** Minimum voltage factor applied to U0 for the disconnection check (BS 7671 Reg 411.4.4, Cmin). */
export const CMIN = 0.95;

/** Measured (cold) loop impedance should not exceed this share of the tabulated maximum (rule of thumb). */
export const TEST_ZS_FACTOR = 0.8;

/**
 * Conventional operating current I2 as a multiple of In (or of Ir for an mccb).
 * Breakers: IEC 60898-1 conventional tripping current 1.45 In (from memory).
 * Moulded-case: IEC 60947-2 conventional tripping current 1.30 Ir (from memory).
 * gG fuses: IEC 60269-1 conventional fusing current 1.6 In for In >= 16 A, 1.9 In for 4 < In < 16 A,
 * 2.1 In for In <= 4 A (from memory). BS 7671 Reg 433.1.201 deems BS 88-2 fuses compliant when
 * In <= Iz; this check uses the IEC figure, which is more demanding.
 */
export function conventionalOperatingMultiple(type: DeviceType, ratingA: number): number {
  switch (type) {
    case 'mcb':
    case 'rcbo':
      return 1.45;
    case 'mccb':
      return 1.3;
    case 'fuseGG':
      return ratingA >= 16 ? 1.6 : ratingA > 4 ? 1.9 : 2.1;
  }
}

/** The current a device is set to carry continuously: In, or Ir = irMultiple x In for an mccb. */
export function settingA(device: Device): number {
  return device.type === 'mccb' ? device.ratingA * (device.irMultiple ?? 1) : device.ratingA;
}

/** One row of a fuse time-current data set: the current that melts the fuse within 0.4 s and 5 s. */
export interface FuseCurveRow {
  ratingA: number;
  ia04sA: number;
  ia5sA: number;
}

export interface FuseDataSet {
  id: string;
  title: string;
  source: string;
  rows: readonly FuseCurveRow[];
}

/**
 * Printed maximum Zs for gG fuses to BS 88-2 at U0 = 230 V with Cmin = 0.95, ohms:
 * BS 7671:2018+A2:2022 Table 41.2 (0.4 s) and Table 41.4 (5 s), as reproduced in a public reference
 * table; not checked against the purchased standard (treat as from memory). The currents follow
 * from Ia = Cmin x U0 / Zs, the relation the tables were built with (BS 7671 Reg 411.4.4).
 */
const BS88_PRINTED_ZS: readonly (readonly [ratingA: number, zs04: number, zs5: number])[] = [
  [16, 2.42, 4.8],
  [20, 1.84, 3.7],
  [25, 1.61, 3.2],
  [32, 1.04, 2.1],
  [40, 0.87, 1.7],
  [50, 0.68, 1.4],
  [63, 0.54, 1.1],
  [80, 0.42, 0.84],
  [100, 0.34, 0.67],
  [125, 0.27, 0.54],
  [160, 0.21, 0.42],
  [200, 0.17, 0.34],
];

export const BUILT_IN_GG_FUSES: FuseDataSet = {
  id: 'gg-bs88-2-from-zs',
  title: 'gG fuses (BS 88-2), operating currents at 0.4 s and 5 s',
  source:
    'Derived as Ia = 0.95 x 230 / Zs from BS 7671:2018+A2 Tables 41.2 and 41.4 printed Zs (public reproduction; verify against the licensed edition)',
  rows: BS88_PRINTED_ZS.map(([ratingA, zs04, zs5]) => ({
    ratingA,
    ia04sA: (CMIN * 230) / zs04,
    ia5sA: (CMIN * 230) / zs5,
  })),
};

/** The smallest standard rating not below a current, or undefined when the series ends first. */
export function nextRating(series: readonly number[], currentA: number): number | undefined {
  for (const r of series) if (r >= currentA) return r;
  return undefined;
}

/** The rating series that applies to a device type. */
export function ratingSeries(type: DeviceType): readonly number[] {
  return type === 'fuseGG' ? FUSE_GG_RATINGS_A : type === 'mccb' ? MCCB_RATINGS_A : BREAKER_RATINGS_A;
}
