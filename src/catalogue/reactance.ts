/**
 * Reactance of one conductor per metre, by construction, insulation and size.
 *
 * Published mV/A/m tables print x only from 25 mm² up; below that it is lost in their rounding.
 * Each value here was chosen so that both derived columns, single-phase 2 × x and three-phase
 * √3 × x, fall within ±2 % of the printed x columns of the tables named beside each family (the
 * printed single- and three-phase columns are not in an exact 2 : √3 ratio, so one per-conductor
 * value has to sit between them). Sizes below 25 mm² continue the trend of the printed values
 * (common practice: a few per cent of r there, so it barely moves z).
 */
import type { Construction, Insulation } from '../model/types.ts';

type SizeTable = Readonly<Record<number, number>>;

/** Ohm per km, one conductor. */
const SMALL_SIZES: SizeTable = { 1: 0.1, 1.5: 0.097, 2.5: 0.094, 4: 0.091, 6: 0.089, 10: 0.087, 16: 0.086 };

/**
 * Multicore, 70 °C thermoplastic (armoured and not): fitted to BS 7671 Tables 4D2B/4D4B
 * x columns (from memory, check-values §2.2).
 */
const MULTICORE_70: SizeTable = {
  ...SMALL_SIZES,
  25: 0.0845,
  35: 0.083,
  50: 0.082,
  70: 0.08,
  95: 0.077,
  120: 0.077,
  150: 0.0762,
  185: 0.075,
  240: 0.075,
  300: 0.0737,
};

/** Multicore, 90 °C thermosetting: fitted to BS 7671 Table 4E4B x columns (check-values §2.4). */
const MULTICORE_90: SizeTable = {
  1: 0.095,
  1.5: 0.092,
  2.5: 0.089,
  4: 0.087,
  6: 0.085,
  10: 0.083,
  16: 0.082,
  25: 0.08,
  35: 0.077,
  50: 0.077,
  70: 0.075,
  95: 0.075,
  120: 0.0737,
  150: 0.0725,
  185: 0.0725,
  240: 0.0711,
  300: 0.07,
};

/**
 * Single-core cables touching (single-phase, or three-phase in trefoil): fitted to BS 7671
 * Table 4E1B "touching" and "trefoil" x columns (check-values §2.5); 300 mm² continues the trend.
 * No confirmed 70 °C single-core x is at hand, so thermoplastic single-core uses the same values
 * (its slightly thicker insulation would add about 1-2 %, common practice).
 */
const SINGLE_CORE: SizeTable = {
  1: 0.11,
  1.5: 0.107,
  2.5: 0.104,
  4: 0.101,
  6: 0.099,
  10: 0.097,
  16: 0.096,
  25: 0.095,
  35: 0.0897,
  50: 0.0897,
  70: 0.087,
  95: 0.0843,
  120: 0.0815,
  150: 0.0815,
  185: 0.0815,
  240: 0.08,
  300: 0.079,
};

/**
 * Flat twin-and-earth is made from 1 to 16 mm² only; its conductors lie side by side, slightly
 * further apart than in a round multicore (common practice), so it takes the 70 °C multicore x.
 */
const FLAT_TWIN_EARTH: SizeTable = SMALL_SIZES;

/** Where each family's reactance comes from, for the working. */
export const REACTANCE_SOURCE: Readonly<Record<string, string>> = {
  multicore70: 'x fitted to BS 7671 Tables 4D2B/4D4B x columns (from memory)',
  multicore90: 'x fitted to BS 7671 Table 4E4B x columns',
  singleCore: 'x fitted to BS 7671 Table 4E1B touching/trefoil x columns',
  flatTwinEarth: 'x continuing the multicore trend below 25 mm² (tables print no x there)',
};

function family(construction: Construction, insulation: Insulation): string {
  if (construction === 'singleCore') return 'singleCore';
  if (construction === 'flatTwinEarth') return 'flatTwinEarth';
  return insulation === 'thermosetting90' ? 'multicore90' : 'multicore70';
}

const TABLES: Readonly<Record<string, SizeTable>> = {
  multicore70: MULTICORE_70,
  multicore90: MULTICORE_90,
  singleCore: SINGLE_CORE,
  flatTwinEarth: FLAT_TWIN_EARTH,
};

/**
 * Reactance of one conductor in ohm per metre, or undefined where no value is held.
 * @example reactanceOhmPerM('armouredMulticore', 'thermosetting90', 300) // 0.00007
 */
export function reactanceOhmPerM(
  construction: Construction,
  insulation: Insulation,
  sizeMm2: number,
): { xOhmPerM: number; source: string } | undefined {
  const fam = family(construction, insulation);
  const perKm = TABLES[fam]?.[sizeMm2];
  if (perKm === undefined) return undefined;
  return { xOhmPerM: perKm / 1000, source: REACTANCE_SOURCE[fam] ?? fam };
}
