/**
 * Cable lengths measured on the site plan. A cable with a `route` takes its length from where its
 * two ends stand on the plan: the rectilinear distance (|Δx| + |Δy|: cables run along walls,
 * trays and trenches, not across rooms; common practice for a first estimate), leg by leg through
 * the route's bends where it has any, plus the route's allowance for rises, drops and
 * terminations, rounded up to the next 0.1 m. Every edit that
 * moves a plan point or changes a route keeps `lengthM` equal to that, so the solver and every
 * export read one length.
 */
import type { Cable, Id, NodeElement, PlanPoint, ProjectDocument } from './types.ts';

/** Rectilinear distance between two plan points, metres. */
export function planDistanceM(a: PlanPoint, b: PlanPoint): number {
  return Math.abs(a.xM - b.xM) + Math.abs(a.yM - b.yM);
}

/** Up to the next 0.1 m, so a measured length never reads shorter than the route. */
export function roundUpTenth(m: number): number {
  return Math.ceil(Math.round(m * 1e6) / 1e5) / 10;
}

/** The points a routed cable passes on the plan: its sending end, its bends, its receiving end. */
export function routePoints(cable: Cable, a: PlanPoint, b: PlanPoint): PlanPoint[] {
  return [a, ...(cable.route?.via ?? []), b];
}

/** Rectilinear length of a route through `points`, leg by leg, metres. */
export function routeDistanceM(points: readonly PlanPoint[]): number {
  let sum = 0;
  for (let k = 1; k < points.length; k++) sum += planDistanceM(points[k - 1]!, points[k]!);
  return sum;
}

export interface PlanMeasure {
  /** Rectilinear distance between the ends through the route's bends, metres. */
  distanceM: number;
  /** How many bends the route passes through. */
  bends: number;
  allowanceM: number;
  /** What `lengthM` becomes. */
  lengthM: number;
}

/** The measured length of a routed cable, or null when it has no route or an end is not on the plan. */
export function measureOnPlan(cable: Cable, nodesById: ReadonlyMap<Id, NodeElement>): PlanMeasure | null {
  if (!cable.route) return null;
  const a = nodesById.get(cable.from)?.plan;
  const b = nodesById.get(cable.to)?.plan;
  if (!a || !b) return null;
  const distanceM = routeDistanceM(routePoints(cable, a, b));
  return {
    distanceM,
    bends: cable.route.via?.length ?? 0,
    allowanceM: cable.route.allowanceM,
    lengthM: roundUpTenth(distanceM + cable.route.allowanceM),
  };
}

/**
 * The document with every routed cable's length measured again (only those touching `touched`,
 * when given). Returns the same document when no length changes.
 */
export function withMeasuredLengths(doc: ProjectDocument, touched?: ReadonlySet<Id>): ProjectDocument {
  let nodesById: Map<Id, NodeElement> | null = null;
  let cables: Cable[] | null = null;
  doc.cables.forEach((c, k) => {
    if (!c.route) return;
    if (touched && !touched.has(c.from) && !touched.has(c.to) && !touched.has(c.id)) return;
    nodesById ??= new Map(doc.nodes.map((n) => [n.id, n]));
    const m = measureOnPlan(c, nodesById);
    if (!m || m.lengthM === c.lengthM) return;
    cables ??= doc.cables.slice();
    cables[k] = { ...c, lengthM: m.lengthM };
  });
  return cables ? { ...doc, cables } : doc;
}
