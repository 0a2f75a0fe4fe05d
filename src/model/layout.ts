/**
 * Tidy layout: a layered drawing from the supply down (supply on top, loads at the bottom), as a
 * single-line diagram is read. Uses dagre's layered (Sugiyama) layout; node sizes are the ones the
 * canvas draws, so the drawing does not overlap.
 *
 * @example
 *   const positions = tidyPositions(doc); // { S1: {x: 310, y: 0}, B1: {x: 290, y: 150}, ... }
 */
import dagre from '@dagrejs/dagre';
import type { Id, NodeKind, Position, ProjectDocument } from './types.ts';

/** Drawn size of each node kind on the canvas, in canvas units (px at zoom 1). */
export const NODE_SIZE: Record<NodeKind, { width: number; height: number }> = {
  supply: { width: 72, height: 72 },
  board: { width: 176, height: 64 },
  junction: { width: 16, height: 16 },
  load: { width: 96, height: 84 },
};

/** Canvas grid, in canvas units; positions snap to it. */
export const GRID = 16;

export function tidyPositions(doc: ProjectDocument): Record<Id, Position> {
  const g = new dagre.graphlib.Graph();
  g.setGraph({ rankdir: 'TB', nodesep: 32, ranksep: 96, marginx: 0, marginy: 0 });
  g.setDefaultEdgeLabel(() => ({}));
  for (const n of doc.nodes) g.setNode(n.id, { ...NODE_SIZE[n.kind] });
  for (const c of doc.cables) {
    if (g.hasNode(c.from) && g.hasNode(c.to)) g.setEdge(c.from, c.to);
  }
  dagre.layout(g);
  const out: Record<Id, Position> = {};
  for (const n of doc.nodes) {
    const laid = g.node(n.id);
    const size = NODE_SIZE[n.kind];
    out[n.id] = {
      x: Math.round((laid.x - size.width / 2) / GRID) * GRID,
      y: Math.round((laid.y - size.height / 2) / GRID) * GRID,
    };
  }
  return out;
}
