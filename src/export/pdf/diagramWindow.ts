/**
 * One part of a large single-line diagram on a sheet of its own: the whole drawing is laid out once
 * at a fixed scale (layOutDiagram), then each window of it (a rectangle in canvas units) is drawn
 * into the sheet's box, clipped to it (drawDiagramWindow). Cables that cross the window's edge are
 * drawn up to the edge, with a note there naming the sheet they continue on ("→ B1").
 *
 * A label prints on a sheet only where it lies whole inside the window, so no text is cut; the
 * planner (diagramSheets.ts) makes neighbouring windows overlap so each label lies whole in one.
 */
import type { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { continuationNotes } from './diagramNotes.ts';
import { settleLabels } from './diagramSettle.ts';
import { routeRuns, within } from './diagramGeometry.ts';
import { overlaps, planDiagram, type Box, type Plan, type Pt } from './diagramLayout.ts';
import {
  INK,
  drawCables,
  drawKeyRow,
  drawRuns,
  drawSymbols,
  keepState,
  measurer,
  placeBlock,
  rgb,
  strokeScale,
  type TextRun,
} from './diagramDraw.ts';

/** A part of the drawing printed on a sheet of its own: its name (A1, B1, ...) and its rectangle in canvas units. */
export interface SheetWindow extends Box {
  name: string;
}

/** A label laid out on the whole drawing: its runs and their extent, in drawing millimetres. */
export interface PlacedLabel {
  of: string;
  runs: TextRun[];
  extent: Box;
}

/** The whole drawing laid out at one scale; drawing millimetres are (canvas − plan.bounds corner) × scale. */
export interface SheetLayout {
  plan: Plan;
  labels: PlacedLabel[];
  /** How many labels still cover other text: no clear place was found nearby (settleLabels). */
  covered: number;
}

/** Height of the band along the bottom of a sheet's box that holds the status key, millimetres. */
export const BAND_H = 6;
/** The key band's text size, points. */
const BAND_PT = 6;
const FRAME = '#9aa1aa';

/** The part of a sheet's box the drawing takes (the key band is below it). */
export function drawingArea(box: Box): Box {
  return { x: box.x, y: box.y, w: box.w, h: box.h - BAND_H };
}

/**
 * The whole drawing of `doc` laid out at `scale` millimetres per canvas unit, with every label
 * placed, and moved clear of other text where it covers some (diagramSettle.ts): null when no
 * node has a position. Labels are in full when they print at 4 pt or more.
 *
 * @example
 *   const layout = layOutDiagram(pdf, doc, results, 'DejaVu', 0.101);
 *   layout?.plan.mode; // 'full'
 */
export function layOutDiagram(
  pdf: jsPDF,
  doc: ProjectDocument,
  results: Results,
  font: string,
  scale: number,
): SheetLayout | null {
  const plan = planDiagram(doc, results, { x: 0, y: 0, w: 0, h: 0 }, measurer(pdf, font), scale);
  if (!plan) return null;
  const placed = plan.blocks.map((b): PlacedLabel => {
    const runs = placeBlock(pdf, font, plan, b);
    return { of: b.of, runs, extent: extentOf(runs, plan.textMm) };
  });
  return { plan, ...settleLabels(plan, placed) };
}

function extentOf(runs: readonly TextRun[], h: number): Box {
  if (runs.length === 0) return { x: 0, y: 0, w: 0, h: 0 };
  const x0 = Math.min(...runs.map((r) => r.x));
  const y0 = Math.min(...runs.map((r) => r.y));
  const x1 = Math.max(...runs.map((r) => r.x + r.w));
  const y1 = Math.max(...runs.map((r) => r.y + h));
  return { x: x0, y: y0, w: x1 - x0, h: y1 - y0 };
}

/** A label's extent in canvas units. */
export function labelBox(layout: SheetLayout, label: PlacedLabel): Box {
  const { bounds, scale } = layout.plan;
  const e = label.extent;
  return { x: bounds.x + e.x / scale, y: bounds.y + e.y / scale, w: e.w / scale, h: e.h / scale };
}

/**
 * Draws `window` (canvas units) of the laid-out drawing into `box` (millimetres) at the layout's
 * scale: the window's top-left at the box's top-left, everything clipped to the window, labels
 * only where they lie whole inside it, a note where a cable leaves naming the sheet of `windows`
 * it continues on (diagramNotes.ts), and the status key along the bottom. Returns how many labels
 * and notes it printed, and how many notes found no clear place. The caller's font, colours and
 * line width are put back afterwards.
 *
 * @example
 *   drawDiagramWindow(pdf, layout, { name: 'B1', x: 3600, y: 0, w: 3900, h: 2150 }, box, 'DejaVu', windows);
 */
export function drawDiagramWindow(
  pdf: jsPDF,
  layout: SheetLayout,
  window: SheetWindow,
  box: Box,
  font: string,
  windows: readonly SheetWindow[] = [],
): { labels: number; notes: number; notesLeftOut: number } {
  const restore = keepState(pdf);
  const { plan } = layout;
  const s = plan.scale;
  const area = drawingArea(box);
  const clip: Box = { ...area, w: Math.min(area.w, window.w * s), h: Math.min(area.h, window.h * s) };
  const at = (x: number, y: number): Pt => [area.x + (x - window.x) * s, area.y + (y - window.y) * s];
  // Everything a hair outside still draws (strokes have width); the clip cuts it at the edge.
  const near: Box = { x: window.x - 8, y: window.y - 8, w: window.w + 16, h: window.h + 16 };
  const view: Plan = {
    ...plan,
    at,
    area: clip,
    cables: plan.cables.filter((c) => routeRuns(c.route).some((r) => overlaps(grow(r), near))),
    nodes: plan.nodes.filter((n) => overlaps(n.r, near)),
  };
  pdf.saveGraphicsState();
  pdf.rect(clip.x, clip.y, clip.w, clip.h, null);
  pdf.clip();
  pdf.discardPath();
  drawCables(pdf, view, view.cables);
  drawSymbols(pdf, view, view.nodes);
  pdf.restoreGraphicsState();
  const dx = area.x - (window.x - plan.bounds.x) * s;
  const dy = area.y - (window.y - plan.bounds.y) * s;
  const shown = layout.labels.filter((l) => within(shift(l.extent, dx, dy), clip));
  for (const l of shown) drawRuns(pdf, font, plan.textMm, l.runs, dx, dy);
  const taken = shown.flatMap((l) =>
    l.runs.map((r) => ({ x: r.x + dx, y: r.y + dy, w: r.w, h: plan.textMm })),
  );
  const notes = continuationNotes(pdf, font, view, window, windows, taken);
  drawRuns(pdf, font, plan.textMm, notes.runs);
  drawFrame(pdf, clip);
  drawBand(
    pdf,
    font,
    box,
    strokeScale(s),
    'Neighbouring sheets overlap: every label shows whole on at least one.',
  );
  restore();
  return { labels: shown.length, notes: notes.runs.length, notesLeftOut: notes.leftOut };
}

function grow(b: Box): Box {
  return { x: b.x - 1, y: b.y - 1, w: b.w + 2, h: b.h + 2 };
}

function shift(b: Box, dx: number, dy: number): Box {
  return { ...b, x: b.x + dx, y: b.y + dy };
}

function drawFrame(pdf: jsPDF, r: Box): void {
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...rgb(FRAME));
  pdf.setLineWidth(0.2);
  pdf.rect(r.x, r.y, r.w, r.h, 'S');
}

/**
 * The key band along the bottom of `box`: the status key in one row at the left and `note` at the
 * right where it fits (left out where it would run into the key).
 */
export function drawBand(pdf: jsPDF, font: string, box: Box, k: number, note: string): void {
  const cy = box.y + box.h - BAND_H / 2;
  const keyW = drawKeyRow(pdf, font, BAND_PT, box.x + 1, cy, k);
  pdf.setFont(font, 'normal');
  pdf.setFontSize(BAND_PT);
  pdf.setTextColor(...rgb(INK));
  const w = pdf.getTextWidth(note);
  if (box.x + 1 + keyW + 6 + w <= box.x + box.w - 1)
    pdf.text(note, box.x + box.w - 1 - w, cy, { baseline: 'middle' });
}
