/**
 * The site plan as React Flow nodes and edges, derived from the document and the results: the
 * plan picture at the back, a marker for each element placed on the plan, a handle on each bend
 * of a measured route, and each cable whose two ends are placed as a path along x then y, leg by
 * leg through its bends (the route its length is measured on).
 */
import { Position as Side, type Edge, type Node } from '@xyflow/react';
import type { Cable, NodeElement, PlanPoint, ProjectDocument } from '../../model/types.ts';
import type { Results, Status } from '../../solver/results.ts';
import { routeDistanceM, routePoints } from '../../model/planLengths.ts';

/** Screen pixels per metre of site at zoom 1. */
export const PX_PER_M = 10;
/** Marker size, pixels. */
export const MARKER = 30;

export interface MarkerData extends Record<string, unknown> {
  element: NodeElement;
  status: Status | null;
  /** Σ % at a load, for its tag. */
  cumulativePct: number | null;
}
export interface PictureData extends Record<string, unknown> {
  image: string;
  widthPx: number;
}
export interface BendData extends Record<string, unknown> {
  cableId: string;
  /** Position in the route's `via`. */
  index: number;
}
export type MarkerNode = Node<MarkerData, 'marker'>;
export type PictureNode = Node<PictureData, 'picture'>;
export type BendNode = Node<BendData, 'bend'>;
export type PlanNode = MarkerNode | PictureNode | BendNode;

/** Bend handle size, pixels. */
export const BEND = 12;
const BEND_PREFIX = 'bend:';

/** The node id of bend `index` of cable `cableId`'s route. */
export function bendId(cableId: string, index: number): string {
  return `${BEND_PREFIX}${index}:${cableId}`;
}

/** The cable and bend a bend node's id names, or null for any other node. */
export function parseBendId(id: string): { cableId: string; index: number } | null {
  if (!id.startsWith(BEND_PREFIX)) return null;
  const rest = id.slice(BEND_PREFIX.length);
  const colon = rest.indexOf(':');
  const index = Number(rest.slice(0, colon));
  return colon > 0 && Number.isInteger(index) ? { cableId: rest.slice(colon + 1), index } : null;
}

/** Where bend point `p` sits, in the plan's pixels (its centre). */
export function pointPx(p: PlanPoint): { x: number; y: number } {
  return { x: p.xM * PX_PER_M, y: p.yM * PX_PER_M };
}

export interface PlanCableData extends Record<string, unknown> {
  cable: Cable;
  /** The route's bends, in the plan's pixels, from the sending end. */
  bends: { x: number; y: number }[];
  status: Status | null;
  /** Rectilinear distance between the ends on the plan, metres. */
  distanceM: number;
  cumulativePct: number | null;
  /** Whether its label shows: always for sub-mains, for a final circuit when it or its load is picked. */
  labelled: boolean;
}
export type PlanEdge = Edge<PlanCableData, 'planCable'>;

export function markerPosition(n: NodeElement): { x: number; y: number } {
  return { x: (n.plan?.xM ?? 0) * PX_PER_M - MARKER / 2, y: (n.plan?.yM ?? 0) * PX_PER_M - MARKER / 2 };
}

export const PICTURE_ID = '__plan-picture';

/** Both ends of a cable meet at the marker's centre, where its plan point is. */
const CENTRE_HANDLES: MarkerNode['handles'] = [
  { id: null, type: 'target', position: Side.Top, x: MARKER / 2, y: MARKER / 2, width: 0, height: 0 },
  { id: null, type: 'source', position: Side.Bottom, x: MARKER / 2, y: MARKER / 2, width: 0, height: 0 },
];

export function planNodes(
  doc: ProjectDocument,
  results: Results,
  selection: readonly string[],
  pictureHeightPx: number | null,
): PlanNode[] {
  const out: PlanNode[] = [];
  if (doc.plan) {
    const widthPx = doc.plan.widthM * PX_PER_M;
    out.push({
      id: PICTURE_ID,
      type: 'picture',
      position: { x: 0, y: 0 },
      data: { image: doc.plan.image, widthPx },
      draggable: false,
      selectable: false,
      focusable: false,
      zIndex: -1,
      ...(pictureHeightPx !== null ? { measured: { width: widthPx, height: pictureHeightPx } } : {}),
    });
  }
  const picked = new Set(selection);
  for (const n of doc.nodes) {
    if (!n.plan) continue;
    const r = results.nodes[n.id];
    out.push({
      id: n.id,
      type: 'marker',
      position: markerPosition(n),
      data: {
        element: n,
        status: r?.status ?? null,
        cumulativePct: n.kind === 'load' && r && r.solved !== false ? r.cumulativePct.value : null,
      },
      selected: picked.has(n.id),
      width: MARKER,
      height: MARKER,
      measured: { width: MARKER, height: MARKER },
      handles: CENTRE_HANDLES,
    });
  }
  // A handle on each bend of a measured route whose ends are both on the plan: drag it to move
  // the bend, double-click it to take it away.
  const placed = new Set(doc.nodes.filter((n) => n.plan).map((n) => n.id));
  for (const c of doc.cables) {
    const via = c.route?.via;
    if (!via || !placed.has(c.from) || !placed.has(c.to)) continue;
    via.forEach((p, index) => {
      const at = pointPx(p);
      out.push({
        id: bendId(c.id, index),
        type: 'bend',
        position: { x: at.x - BEND / 2, y: at.y - BEND / 2 },
        data: { cableId: c.id, index },
        selectable: false,
        width: BEND,
        height: BEND,
        measured: { width: BEND, height: BEND },
        zIndex: 1,
      });
    });
  }
  return out;
}

export function planEdges(doc: ProjectDocument, results: Results, selection: readonly string[]): PlanEdge[] {
  const byId = new Map(doc.nodes.map((n) => [n.id, n]));
  const picked = new Set(selection);
  const out: PlanEdge[] = [];
  for (const c of doc.cables) {
    const a = byId.get(c.from)?.plan;
    const b = byId.get(c.to)?.plan;
    if (!a || !b) continue;
    const r = results.cables[c.id];
    out.push({
      id: c.id,
      type: 'planCable',
      source: c.from,
      target: c.to,
      selected: picked.has(c.id),
      data: {
        cable: c,
        bends: (c.route?.via ?? []).map(pointPx),
        status: r?.status ?? null,
        distanceM: routeDistanceM(routePoints(c, a, b)),
        cumulativePct: r && r.solved !== false ? r.cumulativePct.value : null,
        labelled: byId.get(c.to)?.kind !== 'load' || picked.has(c.id) || picked.has(c.to),
      },
    });
  }
  return out;
}

/** Distance from `p` to the segment `a`–`b` (both along one axis or not), metres. */
function toSegmentM(p: PlanPoint, a: PlanPoint, b: PlanPoint): number {
  const dx = b.xM - a.xM;
  const dy = b.yM - a.yM;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.xM - a.xM) * dx + (p.yM - a.yM) * dy) / len2));
  return Math.hypot(p.xM - (a.xM + t * dx), p.yM - (a.yM + t * dy));
}

/**
 * Where a new bend at `p` goes in a route through `points` (its ends and bends): the position in
 * the route's `via` that puts it on the leg nearest to `p`, each leg drawn along x, then y.
 * @example bendIndex([{ xM: 0, yM: 0 }, { xM: 10, yM: 10 }], { xM: 4, yM: 0 }) // 0
 */
export function bendIndex(points: readonly PlanPoint[], p: PlanPoint): number {
  let best = 0;
  let bestM = Infinity;
  for (let k = 0; k + 1 < points.length; k++) {
    const a = points[k]!;
    const b = points[k + 1]!;
    const corner = { xM: b.xM, yM: a.yM };
    const d = Math.min(toSegmentM(p, a, corner), toSegmentM(p, corner, b));
    if (d < bestM) {
      bestM = d;
      best = k;
    }
  }
  return best;
}
