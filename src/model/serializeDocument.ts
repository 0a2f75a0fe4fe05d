/**
 * Writing a project file: stable, pretty JSON with keys in a fixed order, so a saved file diffs
 * cleanly and save-then-load gives the same document.
 */
import type { ProjectDocument } from './types.ts';

/**
 * Field order in the file: identity first, then what the element is, then figures, then
 * optional parts. Keys not listed (none in a valid document) follow in alphabetical order.
 */
const KEY_ORDER: readonly string[] = [
  'format',
  'version',
  'details',
  'settings',
  'nodes',
  'cables',
  'alternatives',
  // details
  'title',
  'client',
  'site',
  'reference',
  'revision',
  'author',
  'date',
  'notes',
  // settings
  'frequencyHz',
  'limitProfile',
  'customLimits',
  'lightingPct',
  'otherPct',
  'longRunAllowance',
  'closeThreshold',
  'designCurrentBasis',
  'dataSet',
  'cableDefaults',
  // elements
  'kind',
  'id',
  'name',
  'from',
  'to',
  'position',
  'x',
  'y',
  'plan',
  'xM',
  'yM',
  'widthM',
  'image',
  'phases',
  'phase',
  'u0V',
  'uLlV',
  'earthing',
  'zeOhm',
  'zeSource',
  'pfcKa',
  'ownership',
  'transformer',
  'kva',
  'impedancePct',
  'xOverR',
  'raOhm',
  'diversity',
  'spareCapacityPct',
  'loadKind',
  'category',
  'demand',
  'value',
  'unit',
  'powerFactor',
  'demandFactor',
  'distributed',
  'motor',
  'startMultiple',
  'startPowerFactor',
  'dipLimitPct',
  'lengthM',
  'material',
  'insulation',
  'construction',
  'sizeMm2',
  'cpc',
  'parallel',
  'device',
  'type',
  'curve',
  'ratingA',
  'breakingKa',
  'irMultiple',
  'imMultiple',
  'rcd',
  'idnMa',
  'installation',
  'route',
  'allowanceM',
  'method',
  'ambientC',
  'groupedCircuits',
  'groupArrangement',
  'insulationFactor',
  'run',
];
const RANK = new Map(KEY_ORDER.map((k, i) => [k, i]));
/** An alternative reads name first, then what it holds. */
const ALTERNATIVE_RANK = new Map(
  ['name', 'note', 'keptAt', 'settings', 'nodes', 'cables'].map((k, i) => [k, i - 100]),
);

function orderKeys(a: string, b: string, top?: ReadonlyMap<string, number>): number {
  const ra = top?.get(a) ?? RANK.get(a) ?? Infinity;
  const rb = top?.get(b) ?? RANK.get(b) ?? Infinity;
  if (ra !== rb) return ra - rb;
  return a < b ? -1 : a > b ? 1 : 0;
}

function ordered(value: unknown, top?: ReadonlyMap<string, number>): unknown {
  if (Array.isArray(value)) return value.map((v) => ordered(v, top));
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value).sort((a, b) => orderKeys(a, b, top))) {
      const v = (value as Record<string, unknown>)[key];
      // defineProperty: a key such as __proto__ (never in a valid document) stays a plain key.
      if (v !== undefined)
        Object.defineProperty(out, key, {
          value: key === 'alternatives' && Array.isArray(v) ? ordered(v, ALTERNATIVE_RANK) : ordered(v),
          enumerable: true,
          writable: true,
          configurable: true,
        });
    }
    return out;
  }
  // -0 would be written as 0 anyway; normalise so a round trip is exact.
  return Object.is(value, -0) ? 0 : value;
}

/**
 * The document as file text (two-space indent, trailing newline).
 *
 * @example
 *   const text = serializeDocument(doc); // parseDocument(text).doc deep-equals doc
 */
export function serializeDocument(doc: ProjectDocument): string {
  return `${JSON.stringify(ordered(doc), null, 2)}\n`;
}
