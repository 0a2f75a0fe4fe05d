/**
 * The points of a load's voltage profile: each node on its path from the origin, at its distance
 * along the route, with the cumulative drop and voltage the solver gave it. Distances are the
 * route lengths laid end to end; every electrical figure is the solver's.
 */
import type { Id, ProjectDocument } from '../../model/types.ts';
import type { LoadResult, Percent, Results } from '../../solver/results.ts';

export interface ProfilePoint {
  nodeId: Id;
  name: string;
  distanceM: number;
  /** Cumulative drop from the origin at this node, as the solver reported it. */
  dropPct: number;
  /** Lowest phase voltage the solver reported at the node, when it reported one. */
  voltageV: number | undefined;
  /** The cable that ends at this node (none for the origin). */
  cableId?: Id;
  cableName?: string;
}

export interface Profile {
  points: ProfilePoint[];
  limit: Percent;
  basis: Percent['basis'];
}

function lowestVoltage(v: Partial<Record<string, number>> | undefined): number | undefined {
  const values = Object.values(v ?? {}).filter((x): x is number => typeof x === 'number');
  return values.length ? Math.min(...values) : undefined;
}

/** Returns null when the load is not fed (no path) or its results are missing. */
export function buildProfile(doc: ProjectDocument, results: Results, loadId: Id): Profile | null {
  const load: LoadResult | undefined = results.loads[loadId];
  if (!load || load.path.length === 0) return null;
  const cables = new Map(doc.cables.map((c) => [c.id, c]));
  const nodes = new Map(doc.nodes.map((n) => [n.id, n]));
  const first = cables.get(load.path[0]!);
  if (!first) return null;
  const origin = results.nodes[first.from];
  const points: ProfilePoint[] = [
    {
      nodeId: first.from,
      name: nodes.get(first.from)?.name ?? first.from,
      distanceM: 0,
      dropPct: origin?.cumulativePct.value ?? 0,
      voltageV: lowestVoltage(origin?.voltageV),
    },
  ];
  let distanceM = 0;
  for (const cableId of load.path) {
    const cable = cables.get(cableId);
    const cr = results.cables[cableId];
    if (!cable || !cr) return null;
    distanceM += cable.lengthM;
    const nr = results.nodes[cable.to];
    points.push({
      nodeId: cable.to,
      name: nodes.get(cable.to)?.name ?? cable.to,
      distanceM,
      dropPct: nr?.cumulativePct.value ?? cr.cumulativePct.value,
      voltageV: lowestVoltage(nr?.voltageV),
      cableId,
      cableName: cable.name,
    });
  }
  return { points, limit: load.limitPct, basis: load.cumulativePct.basis };
}
