/**
 * The words and cells the comparison tables (comparison.ts) are made of: the table shape, the
 * labels of the designs, signed changes, field changes in plain words, and the conductor-metal
 * working printed once for a set of designs. Shared by the CLI's `compare` report and the pack.
 */
import { LIMIT_PROFILES } from '../catalogue/limits.ts';
import type { Alternative, LimitProfileId } from '../model/types.ts';
import type { DesignSummary, FieldChange } from '../solver/compare/compareDesigns.ts';
import { ALUMINIUM_DENSITY, COPPER_DENSITY, DENSITY_SOURCE } from '../solver/compare/conductorMetal.ts';
import { fmt } from './format.ts';
import { valueText } from './working.ts';

export type Align = 'left' | 'right';

/** Whether a row reads as B worse or better than A (the pack colours it; the words say it too). */
export type RowTone = 'worse' | 'better' | null;

export interface TextTable {
  title: string;
  /** One line under the title: what the figures are. */
  note: string;
  headers: string[];
  align: Align[];
  rows: string[][];
  tones: RowTone[];
  /** What to print instead of an empty table. */
  empty: string;
}

/** How designs are compared and the metal estimated; the pack's methods and the CLI report print it. */
export const COMPARISON_METHOD =
  'Designs (the current one and each alternative kept in the project, or two files) are compared element by element, matched by id: each load’s cumulative drop, limit and status in both, the inputs that differ, and the totals. ' +
  'Conductor metal is estimated as density × nominal cross-section × route length × conductors × cables in parallel, counting the line conductors, a neutral of the same size and a cpc core or separate copper or aluminium cpc; steel armour, drum waste and terminations are excluded, so it is for comparing designs, not a purchase quantity. ' +
  `Densities at 20 °C: copper ${COPPER_DENSITY / 1000} g/cm³ (${DENSITY_SOURCE.Cu.split(' (')[0]}), aluminium ${ALUMINIUM_DENSITY / 1000} g/cm³ (${DENSITY_SOURCE.Al.split(' (')[0]}).`;

/** The label of a project's current design when it is set against its alternatives. */
export const CURRENT_DESIGN_LABEL = 'Current design';

/** The label of an alternative: its name, unless that would read as the current design. */
export function alternativeLabel(alt: Pick<Alternative, 'name'>): string {
  return alt.name.toLowerCase() === CURRENT_DESIGN_LABEL.toLowerCase()
    ? `Alternative "${alt.name}"`
    : alt.name;
}

/** A drop moving by less than this, in percentage points, reads as no change (it shows as 0.00). */
export const DROP_MOVED_POINTS = 0.005;

const HEADER_CHARS = 28;

/** A design's label short enough for a column header. */
export function headerLabel(label: string): string {
  return label.length <= HEADER_CHARS ? label : `${label.slice(0, HEADER_CHARS - 1).trimEnd()}…`;
}

/** B − A with its sign, or "no change" when it would print as nothing. */
export function signed(v: number | null | undefined, digits?: number, unit = ''): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '–';
  const shown = digits === 0 ? Math.round(v) : v;
  if (Math.abs(shown) < DROP_MOVED_POINTS) return 'no change';
  return `${shown > 0 ? '+' : ''}${fmt(shown, digits)}${unit ? ` ${unit}` : ''}`;
}

/** "size 6 → 16 mm²" where both sides share the unit, else "cpc core → separate". */
export function changeText(f: FieldChange): string {
  const unit = /^\S+ (.+)$/.exec(f.a)?.[1];
  if (unit && f.b.endsWith(` ${unit}`) && !/\s/.test(f.b.slice(0, -unit.length - 1)))
    return `${f.label} ${f.a.slice(0, -unit.length - 1)} → ${f.b}`;
  return `${f.label} ${f.a} → ${f.b}`;
}

/** Settings values as a person reads them, rather than the file's words. */
export function settingValue(field: string, v: string): string {
  if (field === 'limitProfile')
    return v === 'custom'
      ? 'custom limits'
      : (LIMIT_PROFILES[v as Exclude<LimitProfileId, 'custom'>]?.title ?? v);
  if (field === 'closeThreshold' && Number.isFinite(Number(v)))
    return `${fmt(Number(v) * 100, 0)} % of the drop budget`;
  if (field === 'longRunAllowance') return v === 'yes' ? 'applied' : 'not applied';
  if (field === 'designCurrentBasis')
    return v === 'In' ? 'device rating In' : v === 'Ib' ? 'design current Ib' : v;
  return v;
}

/**
 * The conductor-metal working, once for a set of designs: the formula, the densities with their
 * sources and the note in `lines`, then one row per design (its cable runs, total route length and
 * result) in `table`.
 */
export function metalWorking(designs: readonly DesignSummary[]): { lines: string[]; table: TextTable } {
  const first = designs[0]?.metal.working;
  const density = (i: { name: string }) => i.name.startsWith('ρ');
  const inputText = (i: { name: string; value: number | string; unit: string; source: string }) =>
    `${i.name} = ${valueText(i.value, i.unit)} (${i.source})`;
  const rows = designs.map((d) => [
    d.label,
    d.metal.working.inputs
      .filter((i) => !density(i))
      .map(inputText)
      .join('; '),
    fmt(d.metal.copperKg),
    fmt(d.metal.aluminiumKg),
  ]);
  const lines = first
    ? [
        `Formula: ${first.formula}`,
        ...first.inputs.filter(density).map(inputText),
        ...(first.note ? [first.note] : []),
      ]
    : [];
  return {
    lines,
    table: {
      title: 'Conductor metal: working',
      note: 'S nominal cross-section, L route length (one way), n conductors of that size in each cable.',
      headers: ['Design', 'Inputs (with their source)', 'Copper, kg', 'Aluminium, kg'],
      align: ['left', 'left', 'right', 'right'],
      rows,
      tones: rows.map(() => null),
      empty: 'No design to work out.',
    },
  };
}
