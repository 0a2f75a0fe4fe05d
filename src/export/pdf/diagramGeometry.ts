/**
 * Small geometry for the diagram sheets: boxes inside boxes, boxes meeting windows, and the
 * straight runs of a cable's route.
 */
import type { Box, Pt } from './diagramLayout.ts';

/** Whether `b` lies wholly inside `box` (a hair's tolerance). */
export function within(b: Box, box: Box): boolean {
  const e = 1e-6;
  return (
    b.x >= box.x - e && b.y >= box.y - e && b.x + b.w <= box.x + box.w + e && b.y + b.h <= box.y + box.h + e
  );
}

/** The axis-aligned runs of a cable's route, as boxes (one side zero), canvas units. */
export function routeRuns(route: readonly Pt[]): Box[] {
  const out: Box[] = [];
  for (let k = 1; k < route.length; k++) {
    const [[x0, y0], [x1, y1]] = [route[k - 1]!, route[k]!];
    if (x0 !== x1 || y0 !== y1)
      out.push({ x: Math.min(x0, x1), y: Math.min(y0, y1), w: Math.abs(x1 - x0), h: Math.abs(y1 - y0) });
  }
  return out;
}

/** Whether a box (perhaps of zero width or height) and a window share more than an edge. */
export function touches(b: Box, win: Box): boolean {
  const across = (a0: number, aw: number, w0: number, ww: number): boolean =>
    aw === 0 ? a0 > w0 && a0 < w0 + ww : a0 < w0 + ww && w0 < a0 + aw;
  return across(b.x, b.w, win.x, win.w) && across(b.y, b.h, win.y, win.h);
}
