/**
 * The site plan as React Flow nodes and edges, derived from the document and the results: the
 * plan picture at the back, a marker for each element placed on the plan, and each cable whose
 * two ends are placed as a path along x then y (the route its length is measured on).
 */
import { Position as Side, type Edge, type Node } from '@xyflow/react';
import type { Cable, NodeElement, ProjectDocument } from '../../model/types.ts';
import type { Results, Status } from '../../solver/results.ts';
import { planDistanceM } from '../../model/planLengths.ts';

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
export type MarkerNode = Node<MarkerData, 'marker'>;
export type PictureNode = Node<PictureData, 'picture'>;
export type PlanNode = MarkerNode | PictureNode;

export interface PlanCableData extends Record<string, unknown> {
  cable: Cable;
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
        status: r?.status ?? null,
        distanceM: planDistanceM(a, b),
        cumulativePct: r && r.solved !== false ? r.cumulativePct.value : null,
        labelled: byId.get(c.to)?.kind !== 'load' || picked.has(c.id) || picked.has(c.to),
      },
    });
  }
  return out;
}
