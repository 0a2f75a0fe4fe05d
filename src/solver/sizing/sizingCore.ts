/**
 * Shared pieces of cable sizing: candidate sizes, resizing a cable (with its cpc), volume, and the
 * verdict of a full solve on the checks sizing claims to pass.
 */
import type { Cable, Id, ProjectDocument } from '../../model/types.ts';
import { FLAT_TWIN_EARTH_CPC_MM2 } from '../../model/defaults.ts';
import { sizesWithCapacity } from '../../catalogue/capacityTables.ts';
import { resistance20OhmPerM } from '../../catalogue/iec60228.ts';
import { BUILT_IN_CAPACITY_TABLES } from '../../catalogue/capacityTables.ts';
import type { Results } from '../results.ts';

/** A proposed change, plain data for the editor to apply as an undoable command. */
export interface SizeChange {
  cableId: Id;
  field: 'sizeMm2' | 'cpc.sizeMm2';
  from: number;
  to: number;
  reason: string;
}

/** The checks a sizing claims to pass: capacity, overload, cpc withstand, Zs, drop and motor starting dip. */
export const SIZING_CHECKS = ['inIz', 'i2', 'cpc', 'zs', 'drop', 'motorDip'] as const;

export interface SizingOptions {
  /** Share of each load's drop limit given to distribution circuits on its path (fixed split). */
  distributionShare: number;
  /**
   * Largest line conductor sizing may give a final circuit, mm² (what the device and the equipment
   * terminals take); null for no limit. Distribution circuits are not limited.
   */
  maxFinalMm2: number | null;
}

export const DEFAULT_SIZING: SizingOptions = { distributionShare: 0.4, maxFinalMm2: null };

/**
 * The largest size sizing may give each cable: `maxFinalMm2` for a final circuit (as the solve in
 * `results` classes it), no limit otherwise.
 */
export function sizeCeilings(results: Results, options: SizingOptions): (cable: Cable) => number {
  const cap = options.maxFinalMm2;
  return (c) =>
    cap !== null && results.cables[c.id]?.protection?.circuit === 'final' ? cap : Number.POSITIVE_INFINITY;
}

/**
 * Sizes a cable may take: the capacity tables cover them, IEC 60228 lists their resistance, and
 * they are no larger than `ceilingMm2`.
 */
export function candidateSizes(cable: Cable, ceilingMm2 = Number.POSITIVE_INFINITY): number[] {
  const loaded = cable.phases === 3 ? 3 : 2;
  const method = cable.installation?.method ?? 'clippedDirect';
  return sizesWithCapacity(
    {
      material: cable.material,
      insulation: cable.insulation,
      construction: cable.construction,
      method,
      loaded,
    },
    BUILT_IN_CAPACITY_TABLES,
  ).filter((s) => s <= ceilingMm2 && resistance20OhmPerM(cable.material, s) !== undefined);
}

/** Each resized cable remembers the cable as drawn, so repeated resizing never compounds. */
const AS_DRAWN = new WeakMap<Cable, Cable>();

/**
 * The cable at another size. A full-size core cpc and the flat twin-and-earth pairing follow the
 * line size. Armour used as the cpc is not in the built-in data, so it is judged on the safe side:
 * a smaller cable is taken to have armour smaller in proportion to its line conductor (real armour
 * shrinks less than that, so R2 is overstated), and a larger cable keeps the armour as drawn (real
 * armour is larger). The proposal tells the user to enter the chosen cable's armour.
 */
export function resized(cable: Cable, sizeMm2: number): Cable {
  const drawn = AS_DRAWN.get(cable) ?? cable;
  let cpcMm2 = drawn.cpc.sizeMm2;
  if (drawn.construction === 'flatTwinEarth' && FLAT_TWIN_EARTH_CPC_MM2[sizeMm2] !== undefined) {
    cpcMm2 = FLAT_TWIN_EARTH_CPC_MM2[sizeMm2]!;
  } else if (drawn.cpc.kind === 'core' && drawn.cpc.sizeMm2 === drawn.sizeMm2) {
    cpcMm2 = sizeMm2;
  } else if (drawn.cpc.kind === 'armour' && sizeMm2 < drawn.sizeMm2) {
    cpcMm2 = Math.floor((10 * drawn.cpc.sizeMm2 * sizeMm2) / drawn.sizeMm2) / 10;
  }
  const out: Cable = { ...cable, sizeMm2, cpc: { ...cable.cpc, sizeMm2: cpcMm2 } };
  AS_DRAWN.set(out, drawn);
  return out;
}

export function withSizes(doc: ProjectDocument, sizes: ReadonlyMap<Id, number>): ProjectDocument {
  return {
    ...doc,
    cables: doc.cables.map((c) => {
      const s = sizes.get(c.id);
      return s === undefined || s === c.sizeMm2 ? c : resized(c, s);
    }),
  };
}

/** Conductor volume of a cable: line cross-section x route length x parallel cables, mm² m. */
export function volumeMm2M(cable: Cable, sizeMm2 = cable.sizeMm2): number {
  return sizeMm2 * cable.lengthM * Math.max(1, cable.parallel);
}

export function totalVolume(doc: ProjectDocument): number {
  let v = 0;
  for (const c of doc.cables) v += volumeMm2M(c);
  return v;
}

/** Element ids failing a claimed check in a solve: cables (capacity, cpc) and nodes (Zs, drop, motor dip). */
export function failingSizingChecks(results: Results): { id: Id; key: string }[] {
  const out: { id: Id; key: string }[] = [];
  for (const cr of Object.values(results.cables)) {
    for (const c of cr.protection?.checks ?? []) {
      if (c.pass === false && (c.key === 'inIz' || c.key === 'i2' || c.key === 'cpc'))
        out.push({ id: cr.id, key: c.key });
    }
  }
  for (const nr of Object.values(results.nodes)) {
    for (const c of nr.protection?.checks ?? [])
      if (c.pass === false && (c.key === 'zs' || c.key === 'motorDip')) out.push({ id: nr.id, key: c.key });
  }
  for (const lr of Object.values(results.loads))
    if (lr.status === 'over') out.push({ id: lr.id, key: 'drop' });
  return out;
}

/**
 * Breaking-capacity checks failing in a solve. Sizing cannot fix them (a larger cable raises the
 * fault level), so it does not claim them; it reports any its proposal would add.
 */
export function failingBreaking(results: Results): Id[] {
  const out: Id[] = [];
  for (const cr of Object.values(results.cables))
    if (cr.protection?.checks.some((c) => c.key === 'breaking' && c.pass === false)) out.push(cr.id);
  return out;
}

/** Changes that turn one document's sizes into another's. */
export function diffSizes(
  before: ProjectDocument,
  after: ProjectDocument,
  reason: (c: Cable) => string,
): SizeChange[] {
  const byId = new Map(before.cables.map((c) => [c.id, c]));
  const out: SizeChange[] = [];
  for (const c of after.cables) {
    const b = byId.get(c.id);
    if (!b) continue;
    if (b.sizeMm2 !== c.sizeMm2) {
      const armourKept = c.cpc.kind === 'armour' && b.cpc.sizeMm2 === c.cpc.sizeMm2;
      const note = armourKept
        ? `; armour kept at ${c.cpc.sizeMm2} mm² as drawn (a larger cable's armour is larger): enter the chosen cable's armour`
        : '';
      out.push({ cableId: c.id, field: 'sizeMm2', from: b.sizeMm2, to: c.sizeMm2, reason: reason(c) + note });
    }
    if (b.cpc.sizeMm2 !== c.cpc.sizeMm2) {
      out.push({
        cableId: c.id,
        field: 'cpc.sizeMm2',
        from: b.cpc.sizeMm2,
        to: c.cpc.sizeMm2,
        reason:
          c.cpc.kind === 'armour'
            ? "armour taken smaller in proportion to the line size (on the safe side): enter the chosen cable's armour from its data sheet"
            : 'follows the line conductor size',
      });
    }
  }
  return out;
}
