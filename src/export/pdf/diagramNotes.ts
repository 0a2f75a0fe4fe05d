/**
 * Continuation notes on a window sheet of a large single-line diagram: where a cable leaves the
 * window, a short note beside it at the edge names the sheet it continues on ("→ B1", "↓ A2").
 */
import type { jsPDF } from 'jspdf';
import { overlaps, type Box, type Plan, type Pt } from './diagramLayout.ts';
import { INK, segWidths, type TextRun } from './diagramDraw.ts';
import { routeRuns, within } from './diagramGeometry.ts';
import type { SheetWindow } from './diagramWindow.ts';

const ARROWS = { left: '←', right: '→', top: '↑', bottom: '↓' } as const;
type Edge = keyof typeof ARROWS;

/**
 * The continuation notes for `window` drawn with `view` (its cables, its page transform and its
 * clip as the area): in bold at the label size, inside the clip beside the edge where each cable
 * leaves, clear of the `taken` text and of each other. Cables leaving side by side for the same
 * sheet share one note; a note with no clear place nearby is left out and counted (the key plan
 * still shows where the sheets meet).
 */
export function continuationNotes(
  pdf: jsPDF,
  font: string,
  view: Plan,
  window: SheetWindow,
  windows: readonly SheetWindow[],
  taken: readonly Box[],
): { runs: TextRun[]; leftOut: number } {
  return placeNotes(pdf, font, view.textMm, view.area, taken, crossings(view, window, windows));
}

/** Where a cable crosses the window's edge: the edge, the point on the page (mm) and the sheet beyond. */
interface Crossing {
  edge: Edge;
  page: Pt;
  sheet: string;
}

/** Each place a drawn cable leaves `window`, with the sheet of `windows` that holds it just beyond. */
function crossings(view: Plan, window: SheetWindow, windows: readonly SheetWindow[]): Crossing[] {
  const out: Crossing[] = [];
  const [x0, y0, x1, y1] = [window.x, window.y, window.x + window.w, window.y + window.h];
  const add = (edge: Edge, at: Pt): void => {
    const sheet = beyond(edge, at, window, windows);
    if (sheet) out.push({ edge, page: view.at(at[0], at[1]), sheet });
  };
  for (const { route } of view.cables) {
    for (const r of routeRuns(route)) {
      if (r.h === 0 && r.y > y0 && r.y < y1 && r.x < x1 && r.x + r.w > x0) {
        if (r.x < x0) add('left', [x0, r.y]);
        if (r.x + r.w > x1) add('right', [x1, r.y]);
      }
      if (r.w === 0 && r.x > x0 && r.x < x1 && r.y < y1 && r.y + r.h > y0) {
        if (r.y < y0) add('top', [r.x, y0]);
        if (r.y + r.h > y1) add('bottom', [r.x, y1]);
      }
    }
  }
  return out;
}

/** The sheet holding the point just past `at` across `edge`: of several, the one most nearly in line. */
function beyond(edge: Edge, [x, y]: Pt, window: SheetWindow, windows: readonly SheetWindow[]): string | null {
  const step = 1;
  const p: Pt = [
    x + (edge === 'right' ? step : edge === 'left' ? -step : 0),
    y + (edge === 'bottom' ? step : edge === 'top' ? -step : 0),
  ];
  const holds = (w: Box): boolean => p[0] > w.x && p[0] < w.x + w.w && p[1] > w.y && p[1] < w.y + w.h;
  const sideways = (w: Box): number =>
    edge === 'left' || edge === 'right'
      ? Math.abs(w.y + w.h / 2 - (window.y + window.h / 2))
      : Math.abs(w.x + w.w / 2 - (window.x + window.w / 2));
  const options = windows.filter((w) => w.name !== window.name && holds(w));
  options.sort((a, b) => sideways(a) - sideways(b));
  return options[0]?.name ?? null;
}

/** The notes for `list`, `mm` high, inside `clip`: see continuationNotes. */
function placeNotes(
  pdf: jsPDF,
  font: string,
  mm: number,
  clip: Box,
  taken: readonly Box[],
  list: readonly Crossing[],
): { runs: TextRun[]; leftOut: number } {
  const runs: TextRun[] = [];
  let leftOut = 0;
  const placed = [...taken];
  // Where each edge already names each sheet, so cables side by side share one note.
  const named = new Map<string, number[]>();
  for (const c of list) {
    const text = `${ARROWS[c.edge]} ${c.sheet}`;
    const along = c.edge === 'left' || c.edge === 'right' ? c.page[1] : c.page[0];
    const same = named.get(`${c.edge} ${text}`) ?? [];
    if (same.some((a) => Math.abs(a - along) < mm * 3)) continue;
    const w = segWidths(pdf, font, [{ text, bold: true }], mm)[0]!;
    const spot = noteSpots(c, w, mm, clip).find(
      (r) => within(r, clip) && !placed.some((t) => overlaps(t, r)),
    );
    if (!spot) {
      leftOut++;
      continue;
    }
    named.set(`${c.edge} ${text}`, [...same, along]);
    placed.push(spot);
    runs.push({ text, x: spot.x, y: spot.y, w, bold: true, colour: INK });
  }
  return { runs, leftOut };
}

/** Places for a note `w` × `mm`, nearest first: beside the cable at the edge, then further along the edge. */
function noteSpots(c: Crossing, w: number, mm: number, clip: Box): Box[] {
  const gap = mm * 0.25;
  const out: Box[] = [];
  const [px, py] = c.page;
  for (let k = 0; k < 5; k++) {
    const d = k * mm * 1.2;
    if (c.edge === 'left' || c.edge === 'right') {
      const x = c.edge === 'right' ? clip.x + clip.w - w - gap : clip.x + gap;
      out.push({ x, y: py - gap - mm - d, w, h: mm }, { x, y: py + gap + d, w, h: mm });
    } else {
      const y = c.edge === 'bottom' ? clip.y + clip.h - mm - gap : clip.y + gap;
      out.push({ x: px + gap + d, y, w, h: mm }, { x: px - gap - w - d, y, w, h: mm });
    }
  }
  return out;
}
