/**
 * Two designs of one project side by side: the current one and a named alternative, two
 * alternatives, or two files. Elements are matched by id. The comparison says which loads changed
 * status and by how much their drop moved, what changed in each cable, the supply and the
 * settings, and how the totals (loads by status, findings, failed checks, conductor metal) differ.
 *
 * Pure: it reads two documents and their results and never throws on user data.
 *
 * @example
 *   const c = compareDesigns({ label: 'Current', doc, results: solve(doc) }, { label: 'Board moved', doc: alt, results: solve(alt) });
 *   c.loads.filter((l) => l.statusChanged); // the loads that changed status
 */
import type { Cable, NodeElement, ProjectDocument, Settings } from '../../model/types.ts';
import type { LoadResult, Results, Status } from '../results.ts';
import { cableMetal, metalTotals, type MetalTotals } from './conductorMetal.ts';

export interface DesignSide {
  label: string;
  doc: ProjectDocument;
  results: Results;
}

/** One field that differs: its plain name and both values as text with units. */
export interface FieldChange {
  field: string;
  label: string;
  a: string;
  b: string;
}

export type StatusOrUnsolved = Status | 'unsolved';

export interface DesignSummary {
  label: string;
  loads: Record<StatusOrUnsolved, number>;
  /** The load using most of its drop budget. */
  worst: { id: string; name: string; cumulativePct: number; limitPct: number; budgetUsed: number } | null;
  errors: number;
  warnings: number;
  failedChecks: number;
  metal: MetalTotals;
}

export interface LoadFacts {
  name: string;
  status: StatusOrUnsolved;
  /** Cumulative drop at the load, percent of U0 (worst phase). */
  cumulativePct: number;
  limitPct: number;
  budgetUsed: number;
  /** Design loop impedance at the load, ohms, where the protection pass found one. */
  zsOhm: number | null;
  failedChecks: number;
}

export interface LoadComparison {
  id: string;
  /** Null where the load is only in the other design. */
  a: LoadFacts | null;
  b: LoadFacts | null;
  statusChanged: boolean;
  /** 'better' or 'worse' by status (over > tight > clear), else 'same'. */
  direction: 'better' | 'worse' | 'same';
  /** b − a, percentage points of U0; null where either side has no figure. */
  dropChangePct: number | null;
  /** The load's own inputs that differ (demand, power factor, phase, …). */
  changes: FieldChange[];
}

export interface CableFacts {
  name: string;
  from: string;
  to: string;
  lengthM: number;
  sizeMm2: number;
  material: string;
  ibA: number | null;
  /** The cable's own drop, worst phase, % of `dropBasis` (as the cable schedule gives it). */
  dropPct: number | null;
  dropBasis: 'U0' | 'ULL' | null;
  cumulativePct: number | null;
  status: StatusOrUnsolved;
  failedChecks: number;
  copperKg: number;
  aluminiumKg: number;
}

export interface CableComparison {
  id: string;
  a: CableFacts | null;
  b: CableFacts | null;
  changes: FieldChange[];
  /** b − a, kilograms. */
  copperKgChange: number;
  aluminiumKgChange: number;
}

export interface NodeChange {
  id: string;
  kind: NodeElement['kind'];
  name: string;
  /** 'added' and 'removed' read from a to b. */
  presence: 'both' | 'added' | 'removed';
  changes: FieldChange[];
}

export interface DesignComparison {
  a: DesignSummary;
  b: DesignSummary;
  settings: FieldChange[];
  /** Every load in either design, in a's order then b's new ones. */
  loads: LoadComparison[];
  /** Every cable in either design that differs in its inputs or is only in one. */
  cables: CableComparison[];
  /** Supply, boards and junctions that differ (loads are in `loads`). */
  nodes: NodeChange[];
}

const RANK: Record<StatusOrUnsolved, number> = { within: 0, close: 1, over: 2, unsolved: 3 };

function num(v: unknown): string {
  return typeof v === 'number' && Number.isFinite(v) ? String(Number(v.toPrecision(6))) : String(v);
}

function isPlanPoint(v: unknown): v is { xM: number; yM: number } {
  return typeof v === 'object' && v !== null && 'xM' in v && 'yM' in v;
}

function text(v: unknown, unit = ''): string {
  if (v === undefined || v === null) return 'none';
  // A route's bends: how many, and where on the plan.
  if (Array.isArray(v) && v.every(isPlanPoint))
    return v.length === 0
      ? 'none'
      : `${v.length} at ${v.map((p) => `(${num(p.xM)}, ${num(p.yM)})`).join(' ')} m`;
  if (typeof v === 'number') return unit ? `${num(v)} ${unit}` : num(v);
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (typeof v === 'object') return JSON.stringify(v);
  return String(v);
}

/** Field name, the word shown, its unit: compared in this order. */
type FieldSpec = readonly [path: string, label: string, unit?: string];

const CABLE_FIELDS: readonly FieldSpec[] = [
  ['from', 'fed from'],
  ['to', 'feeds'],
  ['lengthM', 'length', 'm'],
  ['route.allowanceM', 'allowance on the plan length', 'm'],
  ['route.via', 'bends on the plan route'],
  ['sizeMm2', 'size', 'mm²'],
  ['material', 'material'],
  ['insulation', 'insulation'],
  ['construction', 'construction'],
  ['phases', 'phases'],
  ['parallel', 'in parallel'],
  ['cpc.kind', 'cpc'],
  ['cpc.sizeMm2', 'cpc size', 'mm²'],
  ['cpc.material', 'cpc material'],
  ['device.type', 'device'],
  ['device.curve', 'curve'],
  ['device.ratingA', 'rating In', 'A'],
  ['device.breakingKa', 'breaking capacity', 'kA'],
  ['device.rcd.idnMa', 'RCD IΔn', 'mA'],
  ['installation.method', 'installation'],
  ['installation.ambientC', 'ambient', '°C'],
  ['installation.groupedCircuits', 'grouped circuits'],
  ['installation.run', 'shared run'],
];

const LOAD_FIELDS: readonly FieldSpec[] = [
  ['demand.value', 'demand'],
  ['demand.unit', 'demand unit'],
  ['powerFactor', 'power factor'],
  ['phases', 'phases'],
  ['phase', 'phase'],
  ['category', 'limit category'],
  ['loadKind', 'kind'],
  ['demandFactor', 'demand factor'],
  ['distributed', 'spread along its cable'],
  ['motor.startMultiple', 'starting multiple'],
];

const NODE_FIELDS: Readonly<Record<string, readonly FieldSpec[]>> = {
  supply: [
    ['phases', 'phases'],
    ['u0V', 'U0', 'V'],
    ['earthing', 'earthing'],
    ['zeOhm', 'Ze', 'Ω'],
    ['pfcKa', 'fault current at the origin', 'kA'],
    ['ownership', 'supply'],
    ['transformer.kva', 'transformer', 'kVA'],
    ['raOhm', 'RA', 'Ω'],
  ],
  board: [
    ['diversity', 'diversity'],
    ['spareCapacityPct', 'spare capacity allowance', '%'],
  ],
  junction: [],
};

const SETTINGS_FIELDS: readonly FieldSpec[] = [
  ['limitProfile', 'limit profile'],
  ['customLimits.lightingPct', 'custom lighting limit', '%'],
  ['customLimits.otherPct', 'custom limit, other loads', '%'],
  ['longRunAllowance', 'long-run allowance'],
  ['closeThreshold', 'tight from'],
  ['designCurrentBasis', 'drop computed with'],
  ['u0V', 'U0', 'V'],
  ['uLlV', 'line voltage', 'V'],
  ['frequencyHz', 'frequency', 'Hz'],
  ['dataSet', 'conductor data set'],
];

function valueAt(obj: unknown, path: string): unknown {
  let v: unknown = obj;
  for (const key of path.split('.')) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v;
}

function fieldChanges(a: unknown, b: unknown, fields: readonly FieldSpec[]): FieldChange[] {
  const out: FieldChange[] = [];
  for (const [path, label, unit] of fields) {
    const va = valueAt(a, path);
    const vb = valueAt(b, path);
    if (va === vb || (Number.isNaN(va) && Number.isNaN(vb))) continue;
    // Lists (a route's bends) are compared by what they say, not by identity.
    const ta = text(va, unit);
    const tb = text(vb, unit);
    if (ta !== tb) out.push({ field: path, label, a: ta, b: tb });
  }
  return out;
}

function countFailed(checks: readonly { pass: boolean | null }[] | undefined): number {
  let n = 0;
  for (const c of checks ?? []) if (c.pass === false) n++;
  return n;
}

function loadFacts(load: NodeElement, r: LoadResult | undefined): LoadFacts {
  const solved = r !== undefined && r.solved !== false && r.status !== null;
  return {
    name: load.name,
    status: solved ? (r.status as Status) : 'unsolved',
    cumulativePct: r?.cumulativePct.value ?? NaN,
    limitPct: r?.limitPct.value ?? NaN,
    budgetUsed: r?.budgetUsed ?? NaN,
    zsOhm: r?.protection?.zsOhm ?? null,
    failedChecks: countFailed(r?.protection?.checks),
  };
}

function cableFacts(c: Cable, results: Results): CableFacts {
  const r = results.cables[c.id];
  const solved = r !== undefined && r.solved !== false;
  const metal = cableMetal(c);
  return {
    name: c.name,
    from: c.from,
    to: c.to,
    lengthM: c.lengthM,
    sizeMm2: c.sizeMm2,
    material: c.material,
    ibA: solved ? r.ibA : null,
    dropPct: solved ? r.dropPct.value : null,
    dropBasis: solved ? r.dropPct.basis : null,
    cumulativePct: solved ? r.cumulativePct.value : null,
    status: solved && r.status !== null ? r.status : 'unsolved',
    failedChecks: countFailed(r?.protection?.checks),
    copperKg: metal.copperKg,
    aluminiumKg: metal.aluminiumKg,
  };
}

/** One design's totals: loads by status, worst load, findings, failed checks, conductor metal. */
export function summariseDesign(side: DesignSide): DesignSummary {
  const loads: Record<StatusOrUnsolved, number> = { within: 0, close: 0, over: 0, unsolved: 0 };
  let worst: DesignSummary['worst'] = null;
  for (const n of side.doc.nodes) {
    if (n.kind !== 'load') continue;
    const f = loadFacts(n, side.results.loads[n.id]);
    loads[f.status]++;
    if (f.status !== 'unsolved' && (worst === null || f.budgetUsed > worst.budgetUsed))
      worst = {
        id: n.id,
        name: n.name,
        cumulativePct: f.cumulativePct,
        limitPct: f.limitPct,
        budgetUsed: f.budgetUsed,
      };
  }
  let errors = 0;
  let warnings = 0;
  for (const f of side.results.findings) {
    if (f.severity === 'error') errors++;
    else if (f.severity === 'warning') warnings++;
  }
  return {
    label: side.label,
    loads,
    worst,
    errors,
    warnings,
    failedChecks: side.results.protection?.failedChecks ?? 0,
    metal: metalTotals(side.doc.cables),
  };
}

function byId<T extends { id: string }>(list: readonly T[]): Map<string, T> {
  const m = new Map<string, T>();
  for (const x of list) if (!m.has(x.id)) m.set(x.id, x);
  return m;
}

/** Ids of `a` in order, then the ids only `b` has, in b's order. */
function unionIds<T extends { id: string }>(
  a: readonly T[],
  b: readonly T[],
  keep: (x: T) => boolean,
): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const x of [...a, ...b])
    if (keep(x) && !seen.has(x.id)) {
      seen.add(x.id);
      out.push(x.id);
    }
  return out;
}

function settingsChanges(a: Settings, b: Settings): FieldChange[] {
  return fieldChanges(a, b, SETTINGS_FIELDS);
}

export function compareDesigns(a: DesignSide, b: DesignSide): DesignComparison {
  const nodesA = byId(a.doc.nodes);
  const nodesB = byId(b.doc.nodes);
  const loads: LoadComparison[] = [];
  for (const id of unionIds(a.doc.nodes, b.doc.nodes, (n) => n.kind === 'load')) {
    const na = nodesA.get(id);
    const nb = nodesB.get(id);
    const fa = na?.kind === 'load' ? loadFacts(na, a.results.loads[id]) : null;
    const fb = nb?.kind === 'load' ? loadFacts(nb, b.results.loads[id]) : null;
    const statusChanged = fa !== null && fb !== null && fa.status !== fb.status;
    const direction =
      !statusChanged || fa === null || fb === null
        ? 'same'
        : RANK[fb.status] > RANK[fa.status]
          ? 'worse'
          : 'better';
    const change =
      fa && fb && Number.isFinite(fa.cumulativePct) && Number.isFinite(fb.cumulativePct)
        ? fb.cumulativePct - fa.cumulativePct
        : null;
    loads.push({
      id,
      a: fa,
      b: fb,
      statusChanged,
      direction,
      dropChangePct: change,
      changes: fa && fb ? fieldChanges(na, nb, LOAD_FIELDS) : [],
    });
  }

  const cablesA = byId(a.doc.cables);
  const cablesB = byId(b.doc.cables);
  const cables: CableComparison[] = [];
  for (const id of unionIds(a.doc.cables, b.doc.cables, () => true)) {
    const ca = cablesA.get(id);
    const cb = cablesB.get(id);
    const changes = ca && cb ? fieldChanges(ca, cb, CABLE_FIELDS) : [];
    if (ca && cb && changes.length === 0) continue;
    const fa = ca ? cableFacts(ca, a.results) : null;
    const fb = cb ? cableFacts(cb, b.results) : null;
    cables.push({
      id,
      a: fa,
      b: fb,
      changes,
      copperKgChange: (fb?.copperKg ?? 0) - (fa?.copperKg ?? 0),
      aluminiumKgChange: (fb?.aluminiumKg ?? 0) - (fa?.aluminiumKg ?? 0),
    });
  }

  const nodes: NodeChange[] = [];
  for (const id of unionIds(a.doc.nodes, b.doc.nodes, (n) => n.kind !== 'load')) {
    const na = nodesA.get(id);
    const nb = nodesB.get(id);
    const either = (nb ?? na) as NodeElement;
    if (na && nb) {
      const changes =
        na.kind === nb.kind
          ? fieldChanges(na, nb, NODE_FIELDS[na.kind] ?? [])
          : [{ field: 'kind', label: 'kind', a: na.kind, b: nb.kind }];
      const moved = na.position.x !== nb.position.x || na.position.y !== nb.position.y;
      if (moved)
        changes.push({
          field: 'position',
          label: 'place on the drawing',
          a: `(${num(na.position.x)}, ${num(na.position.y)})`,
          b: `(${num(nb.position.x)}, ${num(nb.position.y)})`,
        });
      const pa = na.plan;
      const pb = nb.plan;
      if (pa?.xM !== pb?.xM || pa?.yM !== pb?.yM)
        changes.push({
          field: 'plan',
          label: 'place on the site plan',
          a: pa ? `(${num(pa.xM)} m, ${num(pa.yM)} m)` : 'not placed',
          b: pb ? `(${num(pb.xM)} m, ${num(pb.yM)} m)` : 'not placed',
        });
      if (changes.length > 0)
        nodes.push({ id, kind: either.kind, name: either.name, presence: 'both', changes });
    } else
      nodes.push({
        id,
        kind: either.kind,
        name: either.name,
        presence: na ? 'removed' : 'added',
        changes: [],
      });
  }

  return {
    a: summariseDesign(a),
    b: summariseDesign(b),
    settings: settingsChanges(a.doc.settings, b.doc.settings),
    loads,
    cables,
    nodes,
  };
}
