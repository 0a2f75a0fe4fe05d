/**
 * A single-line diagram too large for legible labels on one sheet, split over several: the planner
 * chooses a grid of windows on the drawing at a scale where labels print at 4 pt or more, and the
 * key plan shows the whole drawing with the windows framed and named (A1, B1, ... by column letter
 * and row number), so a reader finds which sheet holds what.
 *
 * Neighbouring windows overlap by at least the largest label with its symbol, so every node with
 * its label, and every cable label, lies whole on at least one sheet.
 */
import type { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { fitDiagram } from './diagram.ts';
import { LABEL_MIN_PT, PT_MM, planDiagram, scaleForLabelPt, type Box } from './diagramLayout.ts';
import { INK, drawPlan, keepState, measurer, rgb, strokeScale } from './diagramDraw.ts';
import { routeRuns, touches, within } from './diagramGeometry.ts';
import {
  drawBand,
  drawingArea,
  labelBox,
  layOutDiagram,
  type SheetLayout,
  type SheetWindow,
} from './diagramWindow.ts';

export type { SheetWindow } from './diagramWindow.ts';

/** How the diagram goes on sheets. */
export interface DiagramSheets {
  /**
   * The windows, one sheet each, row by row (A1, B1, ..., A2, ...). Empty when the drawing fits one
   * sheet with legible labels (or has nothing to draw): then drawDiagram draws it as one sheet.
   */
  windows: SheetWindow[];
  /** Millimetres per canvas unit on the window sheets (on the one sheet when `windows` is empty; 0 when nothing is drawn). */
  scale: number;
  /** The drawing laid out for the window sheets (null when `windows` is empty). */
  layout: SheetLayout | null;
  /** Elements whose label (with its symbol) lies whole in no window, so prints on no sheet: normally none. */
  unplaced: string[];
}

const KEY_PLAN_FRAME = '#1d4f7a';
const NAME_MAX_PT = 16;

/**
 * Decides how the diagram of `doc` goes on sheets whose content box is `box` (millimetres): one
 * sheet exactly as drawDiagram draws it when its labels print at 4 pt or more there, otherwise a
 * grid of overlapping windows at the largest scale that keeps that grid's count of sheets (so
 * labels print at 4 pt or more), windows holding nothing left out.
 *
 * @example
 *   const { windows } = planDiagramSheets(pdf, doc, results, { x: 14, y: 25, w: 392, h: 222 }, 'DejaVu');
 *   windows.map((w) => w.name); // [] for a small project; ['A1', 'B1', ...] for a large one
 */
export function planDiagramSheets(
  pdf: jsPDF,
  doc: ProjectDocument,
  results: Results,
  box: Box,
  font: string,
): DiagramSheets {
  const fitted = fitDiagram(pdf, doc, results, box, font);
  const one = { windows: [], layout: null, unplaced: [] };
  if (!fitted) return { ...one, scale: 0 };
  if (fitted.plan.mode === 'full') return { ...one, scale: fitted.plan.scale };
  const area = drawingArea(box);
  // A hair above the 4 pt scale, so rounding never takes the labels under it.
  const least = layOutDiagram(pdf, doc, results, font, scaleForLabelPt(LABEL_MIN_PT) * (1 + 1e-9));
  if (!least) return { ...one, scale: 0 };
  const { cols, rows, scale } = gridFor(least, area);
  const larger = layOutDiagram(pdf, doc, results, font, scale);
  const options = [larger, least].flatMap((layout) => {
    if (!layout || layout.plan.mode !== 'full') return [];
    const windows = windowsOf(layout, area, cols, rows);
    return [{ windows, scale: layout.plan.scale, layout, unplaced: unplacedIn(layout, windows) }];
  });
  // The larger scale unless, against expectation, it leaves a label off every sheet.
  return options.find((o) => o.unplaced.length === 0) ?? options[0] ?? { ...one, scale: fitted.plan.scale };
}

/** Each element's label box, with its symbol for a node, canvas units: what must show whole on a sheet. */
function items(layout: SheetLayout): { of: string; box: Box }[] {
  const nodes = new Map(layout.plan.nodes.map((n) => [n.node.id, n.r]));
  return layout.labels.map((l) => {
    const b = labelBox(layout, l);
    const r = nodes.get(l.of);
    return { of: l.of, box: r ? union(b, r) : b };
  });
}

function union(a: Box, b: Box): Box {
  const x = Math.min(a.x, b.x);
  const y = Math.min(a.y, b.y);
  return { x, y, w: Math.max(a.x + a.w, b.x + b.w) - x, h: Math.max(a.y + a.h, b.y + b.h) - y };
}

/**
 * The fewest columns and rows that cover the drawing at the layout's scale with neighbours
 * overlapping by the largest item (at most half a window), and the largest scale at which that
 * grid still covers it.
 */
function gridFor(layout: SheetLayout, area: Box): { cols: number; rows: number; scale: number } {
  const s = layout.plan.scale;
  const b = layout.plan.bounds;
  const all = items(layout);
  const axis = (size: number, room: number, item: number): { n: number; scale: number } => {
    const win = room / s;
    // One canvas unit more, so rounding never leaves an item a hair short of a window.
    const lap = Math.min(item + 1, win / 2);
    if (size <= win) return { n: 1, scale: room / size };
    const n = Math.ceil((size - lap) / (win - lap));
    return { n, scale: room / ((size - lap) / n + lap) };
  };
  const x = axis(
    b.w,
    area.w,
    all.reduce((m, i) => Math.max(m, i.box.w), 0),
  );
  const y = axis(
    b.h,
    area.h,
    all.reduce((m, i) => Math.max(m, i.box.h), 0),
  );
  return { cols: x.n, rows: y.n, scale: Math.max(s, Math.min(x.scale, y.scale)) };
}

/** "A", ..., "Z", "AA", "AB", ...: a column's letters. */
export function columnName(i: number): string {
  const letter = String.fromCharCode(65 + (i % 26));
  return i < 26 ? letter : `${columnName(Math.floor(i / 26) - 1)}${letter}`;
}

/** Positions of `n` windows of size `win` spread evenly over [start, start + size], first and last flush with its ends. */
function spread(start: number, size: number, win: number, n: number): number[] {
  if (n === 1) return [start + (size - win) / 2];
  return Array.from({ length: n }, (_, i) => start + (i * (size - win)) / (n - 1));
}

/** The grid's windows row by row, each named, those holding nothing left out. */
function windowsOf(layout: SheetLayout, area: Box, cols: number, rows: number): SheetWindow[] {
  const { bounds: b, scale: s } = layout.plan;
  const [w, h] = [area.w / s, area.h / s];
  const xs = spread(b.x, b.w, w, cols);
  const ys = spread(b.y, b.h, h, rows);
  const things: Box[] = [
    ...layout.plan.nodes.map((n) => n.r),
    ...layout.plan.cables.flatMap((c) => routeRuns(c.route)),
    ...layout.labels.map((l) => labelBox(layout, l)),
  ];
  const out: SheetWindow[] = [];
  ys.forEach((y, r) =>
    xs.forEach((x, c) => {
      const win = { x, y, w, h };
      if (things.some((t) => touches(t, win))) out.push({ name: `${columnName(c)}${r + 1}`, ...win });
    }),
  );
  return out;
}

/** Elements whose item (label with its symbol) lies whole in no window. */
function unplacedIn(layout: SheetLayout, windows: readonly SheetWindow[]): string[] {
  return items(layout)
    .filter((i) => !windows.some((w) => within(i.box, w)))
    .map((i) => i.of);
}

/**
 * The key plan: the whole drawing of `doc` fitted into `box` without labels, each of `windows`
 * framed and named over it, and the status key along the bottom. `unplaced` (ids whose labels
 * show on no sheet) are named in the key band. The caller's font, colours and line width are put
 * back afterwards.
 *
 * @example
 *   drawKeyPlan(pdf, doc, results, box, 'DejaVu', sheets.windows);
 */
export function drawKeyPlan(
  pdf: jsPDF,
  doc: ProjectDocument,
  results: Results,
  box: Box,
  font: string,
  windows: readonly SheetWindow[],
  unplaced: readonly string[] = [],
): void {
  const restore = keepState(pdf);
  const fitted = planDiagram(doc, results, drawingArea(box), measurer(pdf, font));
  if (!fitted) {
    restore();
    return;
  }
  const plan = { ...fitted, mode: 'none' as const, blocks: [] };
  drawPlan(pdf, font, plan);
  const frames = windows.map((w) => {
    const [x, y] = plan.at(w.x, w.y);
    return { name: w.name, x, y, w: w.w * plan.scale, h: w.h * plan.scale };
  });
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...rgb(KEY_PLAN_FRAME));
  pdf.setLineWidth(0.35);
  for (const f of frames) pdf.rect(f.x, f.y, f.w, f.h, 'S');
  for (const f of frames) drawName(pdf, font, f);
  const names = windows.length ? `${windows[0]!.name}–${windows[windows.length - 1]!.name}` : '';
  const note = unplaced.length
    ? `Labels on no sheet (wider than a sheet allows): ${unplaced.join(', ')}.`
    : `Framed: sheets ${names}, which follow, each a part of the drawing with its labels.`;
  drawBand(pdf, font, box, strokeScale(plan.scale), note);
  restore();
}

/** A window's name at its frame's centre, on white, as large as the frame allows (4 to 16 pt). */
function drawName(pdf: jsPDF, font: string, f: Box & { name: string }): void {
  pdf.setFont(font, 'bold');
  pdf.setFontSize(10);
  const perPt = pdf.getTextWidth(f.name) / 10;
  const pt = Math.max(LABEL_MIN_PT, Math.min(NAME_MAX_PT, (f.w * 0.5) / perPt, (f.h * 0.4) / PT_MM));
  pdf.setFontSize(pt);
  const w = pdf.getTextWidth(f.name);
  const h = pt * PT_MM;
  const [cx, cy] = [f.x + f.w / 2, f.y + f.h / 2];
  pdf.setFillColor(255, 255, 255);
  pdf.rect(cx - w / 2 - h * 0.3, cy - h * 0.65, w + h * 0.6, h * 1.3, 'F');
  pdf.setTextColor(...rgb(INK));
  pdf.text(f.name, cx, cy, { baseline: 'middle', align: 'center' });
}
