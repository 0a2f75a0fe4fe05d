import type { Cable, Id, ProjectDocument } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';
import { MAX_PARALLEL } from '../bounds.ts';
import { MAX_ALLOWANCE_M, MAX_PLAN_M, MAX_ROUTE_BENDS } from '../schema.ts';
import { describeCable, describeNode } from './describe.ts';
import { nextIdFor, documentIds } from '../ids.ts';
import { newCable } from '../defaults.ts';
import { withMeasuredLengths } from '../planLengths.ts';

export type CablePatch = Partial<Omit<Cable, 'id'>>;

const CABLE_FIELDS: readonly string[] = [
  'name',
  'from',
  'to',
  'lengthM',
  'material',
  'insulation',
  'construction',
  'sizeMm2',
  'cpc',
  'phases',
  'parallel',
  'device',
  'installation',
  'route',
];

/** Why a cable from `from` to `to` cannot exist, or null when it can. */
export function connectionProblem(doc: ProjectDocument, from: Id, to: Id, ignoreCable?: Id): string | null {
  const up = doc.nodes.find((n) => n.id === from);
  const down = doc.nodes.find((n) => n.id === to);
  if (!up) return `Cannot connect: no element ${from} to feed from.`;
  if (!down) return `Cannot connect: no element ${to} to feed.`;
  if (from === to) return `Cannot connect ${describeNode(up)} to itself.`;
  if (up.kind === 'load')
    return `${describeNode(up)} is a load and feeds nothing; start the cable at a supply, board or junction.`;
  if (down.kind === 'supply')
    return `${describeNode(down)} is a supply and cannot be fed; connect from the supply downwards.`;
  const dup = doc.cables.find(
    (c) => c.id !== ignoreCable && ((c.from === from && c.to === to) || (c.from === to && c.to === from)),
  );
  if (dup) return `${describeCable(dup)} already joins ${from} and ${to}.`;
  return null;
}

export function connectCable(
  doc: ProjectDocument,
  from: Id,
  to: Id,
  id?: Id,
  patch?: CablePatch,
): CommandResult {
  const problem = connectionProblem(doc, from, to);
  if (problem) return fail(problem);
  if (id !== undefined && documentIds(doc).includes(id)) {
    return fail(`Id ${id} is already used; pick another for the new cable.`);
  }
  const cableId = id ?? nextIdFor(doc, 'cable');
  const cable: Cable = {
    ...newCable(cableId, from, to, doc.settings.cableDefaults),
    ...fitToEnds(doc, from, to),
    ...patch,
    id: cableId,
    from,
    to,
  };
  return ok({ ...doc, cables: [...doc.cables, cable] }, [cableId]);
}

/** How many phases reach `id`: a supply's own, or those of the cable that feeds it; null if unfed. */
function phasesAvailableAt(doc: ProjectDocument, id: Id): 1 | 3 | null {
  const node = doc.nodes.find((n) => n.id === id);
  if (!node) return null;
  if (node.kind === 'supply') return node.phases;
  const feed = doc.cables.find((c) => c.to === id);
  return feed ? feed.phases : null;
}

/**
 * What a new cable takes from the elements it joins rather than from the project's defaults: a
 * three-phase load, or a board or junction fed from a three-phase origin, gets a three-phase cable,
 * and a three-phase cable is never flat twin-and-earth (which has only two cores); a single-phase
 * load on a three-phase board keeps the single-phase default.
 */
function fitToEnds(doc: ProjectDocument, from: Id, to: Id): CablePatch {
  const defaults = doc.settings.cableDefaults;
  const down = doc.nodes.find((n) => n.id === to);
  const available = phasesAvailableAt(doc, from);
  let phases = defaults.phases;
  if (down?.kind === 'load') phases = down.phases === 3 && available !== 1 ? 3 : 1;
  else if (available !== null) phases = available;
  if (phases === defaults.phases) return {};
  if (phases === 1) return { phases };
  const construction = defaults.construction === 'flatTwinEarth' ? 'multicore' : defaults.construction;
  return {
    phases,
    construction,
    cpc:
      construction === defaults.construction
        ? defaults.cpc
        : { kind: 'core', sizeMm2: defaults.sizeMm2, material: defaults.material },
  };
}

/** Merges a patch into one cable; `undefined` for an optional field (device, installation) removes it. */
export function updateCable(doc: ProjectDocument, id: Id, patch: CablePatch): CommandResult {
  const index = doc.cables.findIndex((c) => c.id === id);
  const cable = doc.cables[index];
  if (!cable) return fail(`No cable with id ${id}; it may have been deleted.`);
  for (const key of Object.keys(patch)) {
    if (key === 'id') return fail(`${describeCable(cable)}: the id of a cable cannot be changed.`);
    if (!CABLE_FIELDS.includes(key)) return fail(`${describeCable(cable)}: a cable has no field "${key}".`);
  }
  if (patch.lengthM !== undefined && !(Number.isFinite(patch.lengthM) && patch.lengthM > 0)) {
    return fail(`${describeCable(cable)}: length must be a positive number of metres, got ${patch.lengthM}.`);
  }
  if (patch.sizeMm2 !== undefined && !(Number.isFinite(patch.sizeMm2) && patch.sizeMm2 > 0)) {
    return fail(
      `${describeCable(cable)}: size must be a positive cross-section in mm², got ${patch.sizeMm2}.`,
    );
  }
  if (
    patch.parallel !== undefined &&
    !(Number.isInteger(patch.parallel) && patch.parallel >= 1 && patch.parallel <= MAX_PARALLEL)
  ) {
    return fail(
      `${describeCable(cable)}: parallel must be a whole number of cables from 1 to ${MAX_PARALLEL}; got ${patch.parallel}.`,
    );
  }
  const from = patch.from ?? cable.from;
  const to = patch.to ?? cable.to;
  if (from !== cable.from || to !== cable.to) {
    const problem = connectionProblem(doc, from, to, cable.id);
    if (problem) return fail(`${describeCable(cable)}: ${problem}`);
  }
  if (
    patch.route !== undefined &&
    !(
      Number.isFinite(patch.route.allowanceM) &&
      patch.route.allowanceM >= 0 &&
      patch.route.allowanceM <= MAX_ALLOWANCE_M
    )
  ) {
    return fail(
      `${describeCable(cable)}: the allowance on the plan length must be 0 to ${MAX_ALLOWANCE_M} metres; got ${patch.route.allowanceM}.`,
    );
  }
  const via = patch.route?.via;
  if (via !== undefined) {
    if (via.length > MAX_ROUTE_BENDS)
      return fail(
        `${describeCable(cable)}: a route may have at most ${MAX_ROUTE_BENDS} bends; got ${via.length}. Remove some.`,
      );
    const bad = via.findIndex(
      (p) =>
        !(
          Number.isFinite(p.xM) &&
          Number.isFinite(p.yM) &&
          Math.abs(p.xM) <= MAX_PLAN_M &&
          Math.abs(p.yM) <= MAX_PLAN_M
        ),
    );
    if (bad >= 0)
      return fail(
        `${describeCable(cable)}: bend ${bad + 1} of the route must be two numbers of metres within ±${MAX_PLAN_M}; got ${via[bad]!.xM}, ${via[bad]!.yM}.`,
      );
  }
  const merged: Record<string, unknown> = { ...cable };
  for (const [key, value] of Object.entries(patch)) {
    if (value === undefined) delete merged[key];
    else merged[key] = value;
  }
  // A length typed over a measured one means the user measures it themselves from now on.
  if (patch.lengthM !== undefined && !('route' in patch)) delete merged.route;
  const cables = doc.cables.slice();
  cables[index] = merged as unknown as Cable;
  return ok(withMeasuredLengths({ ...doc, cables }, new Set([cable.id])));
}
