/**
 * The single-line diagram on a PDF page, drawn from the document with jsPDF primitives: cables on
 * the editor's step route, plain symbols (diagramSymbols.ts) and labels sized from the drawing's
 * scale (diagramLayout.ts), plus a status key in a free corner. It draws through a Pen (pen.ts),
 * so the SVG export (export/svg) draws it with the same code. A drawing too large for legible
 * labels on one sheet is split over several (diagramSheets.ts).
 *
 * Status shows as colour, dash pattern and line width together, and as a glyph in the labels, so
 * it still reads in greyscale print.
 */
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { PT_MM, overlaps, planDiagram, type Box, type Plan, type Pt } from './diagramLayout.ts';
import { drawKey, drawPlan, keepState, keySize, measurer, strokeScale, type KeySize } from './diagramDraw.ts';
import type { Pen } from './pen.ts';

export type { Box } from './diagramLayout.ts';

/**
 * Draws the single-line diagram of `doc` with `pdf` (a jsPDF document or another Pen), scaled to
 * fit `box` (aspect kept, centred). `font` is a jsPDF font family already registered with styles
 * 'normal' and 'bold' (a Unicode TTF, so Ω, Σ, ², Δ print). Returns the scale used (mm per canvas
 * unit) and whether labels were drawn: false when they would print under 4 pt (then only ids, or
 * no text, go with the lines and symbols).
 * Draws nothing and returns scale 0 when no node has a position; cables to a missing node are left
 * out. The caller's font, colours and line width are put back afterwards, and lines left solid.
 *
 * @example
 *   const { scale, labels } = drawDiagram(pdf, doc, solve(doc), { x: 14, y: 22, w: 392, h: 225 }, 'DejaVu');
 *   // scale ≈ 0.1 mm per canvas unit; labels true for a 35-element project on A3
 */
export function drawDiagram(
  pdf: Pen,
  doc: ProjectDocument,
  results: Results,
  box: Box,
  font: string,
): { scale: number; labels: boolean } {
  const restore = keepState(pdf);
  const fitted = fitDiagram(pdf, doc, results, box, font);
  if (!fitted) {
    restore();
    return { scale: 0, labels: false };
  }
  const { plan, key } = fitted;
  drawPlan(pdf, font, plan);
  if (key && plan.mode !== 'none') drawKey(pdf, font, key.pt, key.at, key.size, strokeScale(plan.scale));
  restore();
  return { scale: plan.scale, labels: plan.mode === 'full' };
}

/** The drawing fitted to a box, with its key's size (points and millimetres) and place, or no key. */
export interface Fitted {
  plan: Plan;
  key: { pt: number; size: KeySize; at: Pt } | null;
}

/**
 * What drawDiagram draws in `box`, laid out but not drawn: null when no node has a position.
 * `plan.mode` is 'full' when the labels print at 4 pt or more.
 */
export function fitDiagram(
  pdf: Pen,
  doc: ProjectDocument,
  results: Results,
  box: Box,
  font: string,
): Fitted | null {
  const measure = measurer(pdf, font);
  let plan = planDiagram(doc, results, box, measure);
  if (!plan) return null;
  const pt = Math.max(5, Math.min(7, plan.textMm / PT_MM));
  const size = keySize(pdf, font, pt);
  if (plan.mode === 'none' || size.w > box.w / 2 || size.h > box.h / 3) return { plan, key: null };
  let at = freeCorner(plan, box, size);
  if (!at) {
    // No corner is free: the key gets a band along the bottom and the drawing fits above it.
    plan = planDiagram(doc, results, { ...box, h: box.h - size.h - 2 }, measure) ?? plan;
    at = [box.x, box.y + box.h - size.h];
  }
  return { plan, key: { pt, size, at } };
}

/** A corner of `box` where the key covers nothing drawn, or null. */
function freeCorner(plan: Plan, box: Box, key: KeySize): Pt | null {
  const taken = plan.taken.map((t) => {
    const [x, y] = plan.at(t.x, t.y);
    return { x, y, w: t.w * plan.scale, h: t.h * plan.scale };
  });
  const corners: Pt[] = [
    [box.x, box.y + box.h - key.h],
    [box.x + box.w - key.w, box.y + box.h - key.h],
    [box.x, box.y],
    [box.x + box.w - key.w, box.y],
  ];
  const clear = ([x, y]: Pt): boolean =>
    !taken.some((t) => overlaps(t, { x: x - 1, y: y - 1, w: key.w + 2, h: key.h + 2 }));
  return corners.find(clear) ?? null;
}
