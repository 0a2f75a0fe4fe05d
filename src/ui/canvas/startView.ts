/**
 * Where the canvas looks when a project opens. Fitting a large diagram shrinks it until every
 * label is hidden and the symbols are specks, which tells a designer nothing; so when the fitted
 * zoom is below the level where full labels show, the view instead opens at that level on the
 * supply end (the supply and the main board it feeds), and the overview map shows the rest.
 * Pure, so it is tested without a browser.
 *
 * @example
 *   const vp = startViewport(doc, { width: 860, height: 830 });
 *   flow.setViewport(vp); // { x, y, zoom } in React Flow's terms
 */
import type { NodeElement, ProjectDocument } from '../../model/types.ts';
import { NODE_SIZE } from '../../model/layout.ts';
import { FULL_DETAIL_ZOOM } from './flowTypes.ts';

export interface Viewport {
  x: number;
  y: number;
  zoom: number;
}

/** Zoom at which a project opens when fitting it whole would be smaller (full labels show). */
export const READABLE_ZOOM = Math.max(FULL_DETAIL_ZOOM, 0.9);
export const FIT_MAX_ZOOM = 1.1;
export const MIN_ZOOM = 0.1;
/** Screen pixels kept clear round the diagram: the label bar is at the top, the key at the bottom. */
const MARGIN = { top: 64, side: 32, bottom: 56 };

interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

function boxOf(n: NodeElement): Box {
  const s = NODE_SIZE[n.kind];
  return {
    minX: n.position.x,
    minY: n.position.y,
    maxX: n.position.x + s.width,
    maxY: n.position.y + s.height,
  };
}

function union(boxes: Box[]): Box {
  return boxes.reduce((a, b) => ({
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  }));
}

/** The supply end: the board the (first) supply feeds, else the supply, else the top-most node. */
export function supplyEnd(doc: ProjectDocument): NodeElement | undefined {
  const supply = doc.nodes.find((n) => n.kind === 'supply');
  if (supply) {
    const fed = doc.cables
      .filter((c) => c.from === supply.id)
      .map((c) => doc.nodes.find((n) => n.id === c.to))
      .find((n) => n?.kind === 'board');
    return fed ?? supply;
  }
  return doc.nodes.reduce<NodeElement | undefined>(
    (top, n) => (!top || n.position.y < top.position.y ? n : top),
    undefined,
  );
}

function clamp(v: number, lo: number, hi: number): number {
  return hi < lo ? (lo + hi) / 2 : Math.min(hi, Math.max(lo, v));
}

/** The whole diagram, centred, at the largest zoom up to `FIT_MAX_ZOOM` that shows all of it. */
export function fitViewport(doc: ProjectDocument, screen: { width: number; height: number }): Viewport {
  if (doc.nodes.length === 0) return { x: screen.width / 2, y: screen.height / 2, zoom: 1 };
  const b = union(doc.nodes.map(boxOf));
  const w = Math.max(1, screen.width - 2 * MARGIN.side);
  const h = Math.max(1, screen.height - MARGIN.top - MARGIN.bottom);
  const zoom = clamp(
    Math.min(w / (b.maxX - b.minX || 1), h / (b.maxY - b.minY || 1)),
    MIN_ZOOM,
    FIT_MAX_ZOOM,
  );
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  return {
    x: MARGIN.side + w / 2 - cx * zoom,
    y: MARGIN.top + h / 2 - cy * zoom,
    zoom,
  };
}

/**
 * The opening view: the fitted view when it is readable, else `READABLE_ZOOM` with the supply end
 * at the top centre, kept inside the diagram's extent so no half-screen of empty canvas shows.
 */
export function startViewport(doc: ProjectDocument, screen: { width: number; height: number }): Viewport {
  const fit = fitViewport(doc, screen);
  if (fit.zoom >= READABLE_ZOOM || doc.nodes.length === 0) return fit;
  const zoom = READABLE_ZOOM;
  const b = union(doc.nodes.map(boxOf));
  const anchor = boxOf(supplyEnd(doc)!);
  const supply = doc.nodes.find((n) => n.kind === 'supply');
  const top = supply ? boxOf(supply).minY : anchor.minY;
  // Visible extent in canvas units, inside the margins.
  const vw = (screen.width - 2 * MARGIN.side) / zoom;
  const vh = (screen.height - MARGIN.top - MARGIN.bottom) / zoom;
  const left = clamp((anchor.minX + anchor.maxX) / 2 - vw / 2, b.minX, b.maxX - vw);
  const upper = clamp(top, b.minY, b.maxY - vh);
  return { x: MARGIN.side - left * zoom, y: MARGIN.top - upper * zoom, zoom };
}
