/**
 * Correction factors for current-carrying capacity: ambient air (Ca), ground temperature for buried
 * methods, and grouping (Cg). Documented data a user can replace with a licensed set.
 */
import type { Installation, Insulation } from '../model/types.ts';

/** Ambient-air temperatures (°C) at which Table B.52.14 gives factors. */
const AIR_C = [10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80];

/**
 * IEC 60364-5-52 Table B.52.14, ambient air other than 30 °C (check-values §7.7, from memory; the
 * formula sqrt((θmax − θa)/(θmax − 30)) reproduces every cell). null: not permitted.
 */
const AIR_FACTORS: Readonly<Record<Insulation, readonly (number | null)[]>> = {
  thermoplastic70: [1.22, 1.17, 1.12, 1.06, 1.0, 0.94, 0.87, 0.79, 0.71, 0.61, 0.5, null, null, null, null],
  thermosetting90: [1.15, 1.12, 1.08, 1.04, 1.0, 0.96, 0.91, 0.87, 0.82, 0.76, 0.71, 0.65, 0.58, 0.5, 0.41],
};

/** Ground temperatures (°C) at which Table B.52.15 gives factors. */
const GROUND_C = [10, 15, 20, 25, 30, 35, 40, 45, 50];

/** IEC 60364-5-52 Table B.52.15, ground other than 20 °C (from memory; formula agrees to ±0.01). */
const GROUND_FACTORS: Readonly<Record<Insulation, readonly (number | null)[]>> = {
  thermoplastic70: [1.1, 1.05, 1.0, 0.95, 0.89, 0.84, 0.77, 0.71, 0.63],
  thermosetting90: [1.07, 1.04, 1.0, 0.96, 0.93, 0.89, 0.85, 0.8, 0.76],
};

export interface FactorLookup {
  factor: number;
  /** The tabulated temperature or count actually used (the next more onerous one). */
  usedAt: number;
  source: string;
}

/**
 * Temperature correction factor. The ambient is rounded up to the next tabulated temperature, which
 * never overstates capacity. Returns undefined beyond the table (the insulation is not rated for it).
 * @example temperatureFactor('thermoplastic70', 40, 30)?.factor // 0.87
 */
export function temperatureFactor(
  insulation: Insulation,
  ambientC: number,
  referenceC: number,
): FactorLookup | undefined {
  const buried = referenceC === 20;
  const temps = buried ? GROUND_C : AIR_C;
  const factors = (buried ? GROUND_FACTORS : AIR_FACTORS)[insulation];
  for (let i = 0; i < temps.length; i++) {
    const t = temps[i]!;
    if (t >= ambientC) {
      const f = factors[i];
      if (f == null) return undefined;
      return {
        factor: f,
        usedAt: t,
        source: buried ? 'IEC 60364-5-52 Table B.52.15 (ground)' : 'IEC 60364-5-52 Table B.52.14 (air)',
      };
    }
  }
  return undefined;
}

const GROUP_COUNTS = [1, 2, 3, 4, 5, 6, 7, 8, 9, 12, 16, 20];

/**
 * IEC 60364-5-52 Table B.52.17 (= BS 7671 Table 4C1), check-values §7.8: from memory except
 * 20 bunched = 0.38 (confirmed). Single-layer rows give no further reduction beyond nine circuits.
 */
const GROUP_FACTORS: Readonly<Record<Installation['groupArrangement'], readonly number[]>> = {
  bunched: [1.0, 0.8, 0.7, 0.65, 0.6, 0.57, 0.54, 0.52, 0.5, 0.45, 0.41, 0.38],
  singleLayer: [1.0, 0.85, 0.79, 0.75, 0.73, 0.72, 0.72, 0.71, 0.7, 0.7, 0.7, 0.7],
  tray: [1.0, 0.88, 0.82, 0.77, 0.75, 0.73, 0.73, 0.72, 0.72, 0.72, 0.72, 0.72],
};

/**
 * Circuits underground, in the column for no spacing (cables or ducts touching), the most onerous
 * one: the document does not record the spacing, and a wider one only raises the factor. From
 * memory; two cells of the direct-in-ground table's one-cable-diameter column (12 circuits 0.42,
 * 20 circuits 0.35) agree with a stored public discussion of it.
 */
const BURIED_GROUP_FACTORS: Readonly<
  Record<'buriedDirect' | 'buriedDuct', { row: readonly number[]; source: string }>
> = {
  // IEC 60364-5-52 Table B.52.18: single- or multicore cables laid directly in the ground (D2), touching.
  buriedDirect: {
    row: [1.0, 0.75, 0.65, 0.6, 0.55, 0.5, 0.45, 0.43, 0.41, 0.36, 0.32, 0.29],
    source: 'IEC 60364-5-52 Table B.52.18 (direct in ground, cables touching)',
  },
  // IEC 60364-5-52 Table B.52.19: multicore cables in single-way ducts in the ground (D1), ducts touching.
  buriedDuct: {
    row: [1.0, 0.85, 0.75, 0.7, 0.65, 0.6, 0.57, 0.54, 0.52, 0.47, 0.43, 0.4],
    source: 'IEC 60364-5-52 Table B.52.19 (in ducts in the ground, ducts touching)',
  },
};

/**
 * Grouping factor for a number of circuits (this one included); the count is rounded up to the next
 * tabulated one. Circuits in the ground use the buried tables whatever the arrangement says (it
 * describes groups in air). Returns undefined beyond 20 bunched or buried circuits, which the
 * tables do not cover.
 * @example groupingFactor('bunched', 3)?.factor // 0.7
 * @example groupingFactor('bunched', 3, 'buriedDirect')?.factor // 0.65
 */
export function groupingFactor(
  arrangement: Installation['groupArrangement'],
  circuits: number,
  method?: Installation['method'],
): FactorLookup | undefined {
  const n = Math.max(1, Math.ceil(circuits));
  if (method === 'buriedDirect' || method === 'buriedDuct') {
    const buried = BURIED_GROUP_FACTORS[method];
    for (let i = 0; i < GROUP_COUNTS.length; i++)
      if (GROUP_COUNTS[i]! >= n)
        return { factor: buried.row[i]!, usedAt: GROUP_COUNTS[i]!, source: buried.source };
    return undefined;
  }
  const row = GROUP_FACTORS[arrangement];
  for (let i = 0; i < GROUP_COUNTS.length; i++) {
    if (GROUP_COUNTS[i]! >= n) {
      return { factor: row[i]!, usedAt: GROUP_COUNTS[i]!, source: 'IEC 60364-5-52 Table B.52.17' };
    }
  }
  if (arrangement === 'bunched') return undefined;
  return {
    factor: row[row.length - 1]!,
    usedAt: n,
    source: 'IEC 60364-5-52 Table B.52.17 (no reduction beyond 9)',
  };
}
