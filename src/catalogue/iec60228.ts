/**
 * IEC 60228:2004 maximum d.c. resistance of Class 2 (stranded) conductors at 20 °C, ohm/km,
 * and the temperature coefficients of resistance at 20 °C.
 *
 * Source: IEC 60228:2004 Table 2 (plain copper; aluminium and aluminium alloy), as reproduced in
 * shared reference check-values §1.1 (confirmed across four independent reproductions).
 */
import type { Material } from '../model/types.ts';

/** Sizes in mm² with their maximum resistance at 20 °C in ohm/km. */
export const CLASS2_OHM_PER_KM_20C: Readonly<Record<Material, Readonly<Record<number, number>>>> = {
  Cu: {
    0.5: 36.0,
    0.75: 24.5,
    1: 18.1,
    1.5: 12.1,
    2.5: 7.41,
    4: 4.61,
    6: 3.08,
    10: 1.83,
    16: 1.15,
    25: 0.727,
    35: 0.524,
    50: 0.387,
    70: 0.268,
    95: 0.193,
    120: 0.153,
    150: 0.124,
    185: 0.0991,
    240: 0.0754,
    300: 0.0601,
    400: 0.047,
    500: 0.0366,
    630: 0.0283,
  },
  Al: {
    10: 3.08,
    16: 1.91,
    25: 1.2,
    35: 0.868,
    50: 0.641,
    70: 0.443,
    95: 0.32,
    120: 0.253,
    150: 0.206,
    185: 0.164,
    240: 0.125,
    300: 0.1,
    400: 0.0778,
    500: 0.0605,
    630: 0.0469,
  },
};

/** Temperature coefficient of resistance at 20 °C, per kelvin (IEC 60228 Annex B). */
export const ALPHA20_PER_K: Readonly<Record<Material, number>> = { Cu: 0.00393, Al: 0.00403 };

/** Standard sizes available for a material, ascending. */
export function standardSizes(material: Material): number[] {
  return Object.keys(CLASS2_OHM_PER_KM_20C[material])
    .map(Number)
    .sort((a, b) => a - b);
}

/**
 * Maximum resistance at 20 °C in ohm per metre, or undefined when IEC 60228 lists no such size.
 * @example resistance20OhmPerM('Cu', 2.5) // 0.00741
 */
export function resistance20OhmPerM(material: Material, sizeMm2: number): number | undefined {
  const perKm = CLASS2_OHM_PER_KM_20C[material][sizeMm2];
  return perKm === undefined ? undefined : perKm / 1000;
}

/**
 * Resistance at temperature t from the 20 °C value: R_t = R_20 × (1 + α20 × (t − 20)).
 * @example atTemperature(0.00741, 'Cu', 70) // 0.008866...
 */
export function atTemperature(r20: number, material: Material, tempC: number): number {
  return r20 * (1 + ALPHA20_PER_K[material] * (tempC - 20));
}
