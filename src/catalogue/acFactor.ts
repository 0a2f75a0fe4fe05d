/**
 * Ratio of a.c. to d.c. resistance at 50 Hz for the large sizes, by construction.
 *
 * Below 95 mm² skin and proximity effect change r by well under 1 %, below the tables' rounding.
 * Above it they do not: the published a.c. r of armoured multicore (BS 7671 Table 4E4B, which
 * prints a d.c. and an a.c. column side by side, check-values §2.4) runs 2-5 % over the d.c. value
 * at 95-300 mm², because the steel armour adds eddy and hysteresis losses on top of skin and
 * proximity effect. The factors here are that simple model: for unarmoured constructions the skin
 * effect of IEC 60287-1-1 (ys = xs⁴ / (192 + 0.8 xs⁴), ks = 1, from memory) evaluated at 50 Hz and
 * 70 °C and rounded; for armoured multicore the ratio read from Table 4E4B's a.c./d.c. columns.
 * The working prints the factor used.
 */
import type { Construction } from '../model/types.ts';

const UNARMOURED: Readonly<Record<number, number>> = {
  95: 1.001,
  120: 1.002,
  150: 1.004,
  185: 1.006,
  240: 1.01,
  300: 1.016,
};

const ARMOURED: Readonly<Record<number, number>> = {
  95: 1.01,
  120: 1.02,
  150: 1.02,
  185: 1.03,
  240: 1.04,
  300: 1.05,
};

/**
 * a.c./d.c. resistance ratio (1 where the effect is below table rounding).
 * @example acFactor('armouredMulticore', 300) // 1.05
 */
export function acFactor(construction: Construction, sizeMm2: number): number {
  const table = construction === 'armouredMulticore' ? ARMOURED : UNARMOURED;
  return table[sizeMm2] ?? 1;
}

export const AC_FACTOR_SOURCE: Readonly<Record<'armoured' | 'unarmoured', string>> = {
  armoured: 'a.c./d.c. ratio read from BS 7671 Table 4E4B a.c. and d.c. columns',
  unarmoured: 'skin effect by IEC 60287-1-1 at 50 Hz (from memory)',
};
