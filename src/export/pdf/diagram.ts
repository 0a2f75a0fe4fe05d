/**
 * The single-line diagram on a PDF page, drawn from the document with jsPDF primitives: cables on
 * the editor's step route, plain symbols (diagramSymbols.ts) and labels sized from the drawing's
 * scale (diagramLayout.ts), plus a status key in a free corner.
 *
 * Status shows as colour, dash pattern and line width together, and as a glyph in the labels, so
 * it still reads in greyscale print.
 */
import type { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results, Status } from '../../solver/results.ts';
import { STATUS_LOOK, statusLook } from '../statusLook.ts';
import {
  LINE,
  PT_MM,
  overlaps,
  planDiagram,
  type Block,
  type Box,
  type Plan,
  type Pt,
  type Seg,
} from './diagramLayout.ts';
import { drawNodeSymbol, polyline } from './diagramSymbols.ts';

export type { Box } from './diagramLayout.ts';

type Rgb = [number, number, number];

const INK = '#262c34';
const STATUS_RANK: Record<Status, number> = { within: 1, close: 2, over: 3 };
const KEY_FRAME = '#b4bac2';
/** Symbol outline width, in canvas units (px at zoom 1), as the cables' widths are. */
const SYMBOL_STROKE = 1.5;
/** Line widths and dashes follow the scale, but never grow past this many mm per canvas unit. */
const MAX_STROKE_SCALE = 0.25;

/**
 * Draws the single-line diagram of `doc`, scaled to fit `box` (aspect kept, centred). `font` is a
 * jsPDF font family already registered with styles 'normal' and 'bold' (a Unicode TTF, so Ω, Σ,
 * ², Δ print). Returns the scale used (mm per canvas unit) and whether labels were drawn: false
 * when they would print under 4 pt (then only ids, or no text, go with the lines and symbols).
 * Draws nothing and returns scale 0 when no node has a position; cables to a missing node are left
 * out. The caller's font, colours and line width are put back afterwards, and lines left solid.
 *
 * @example
 *   const { scale, labels } = drawDiagram(pdf, doc, solve(doc), { x: 14, y: 22, w: 392, h: 225 }, 'DejaVu');
 *   // scale ≈ 0.1 mm per canvas unit; labels true for a 35-element project on A3
 */
export function drawDiagram(
  pdf: jsPDF,
  doc: ProjectDocument,
  results: Results,
  box: Box,
  font: string,
): { scale: number; labels: boolean } {
  const measure = (segs: Seg[], mm: number): number =>
    segWidths(pdf, font, segs, mm).reduce((a, b) => a + b, 0);
  const restore = keepState(pdf);
  let plan = planDiagram(doc, results, box, measure);
  if (!plan) {
    restore();
    return { scale: 0, labels: false };
  }
  const keyPt = Math.max(5, Math.min(7, plan.textMm / PT_MM));
  const key = keySize(pdf, font, keyPt);
  let keyAt: Pt | null = null;
  if (plan.mode !== 'none' && key.w <= box.w / 2 && key.h <= box.h / 3) {
    keyAt = freeCorner(plan, box, key);
    if (!keyAt) {
      // No corner is free: the key gets a band along the bottom and the drawing fits above it.
      plan = planDiagram(doc, results, { ...box, h: box.h - key.h - 2 }, measure) ?? plan;
      keyAt = [box.x, box.y + box.h - key.h];
    }
  }
  drawPlan(pdf, font, plan);
  if (keyAt && plan.mode !== 'none') drawKey(pdf, font, keyPt, keyAt, key, strokeScale(plan.scale));
  restore();
  return { scale: plan.scale, labels: plan.mode === 'full' };
}

/** Notes the caller's font, colours and line style; the returned function puts them back. */
function keepState(pdf: jsPDF): () => void {
  const font = pdf.getFont();
  const size = pdf.getFontSize();
  const text = pdf.getTextColor();
  const draw = pdf.getDrawColor();
  const fill = pdf.getFillColor();
  const width = pdf.getLineWidth();
  return () => {
    pdf.setFont(font.fontName, font.fontStyle);
    pdf.setFontSize(size);
    pdf.setTextColor(text);
    pdf.setDrawColor(draw);
    pdf.setFillColor(fill);
    pdf.setLineWidth(width);
    pdf.setLineDashPattern([], 0);
  };
}

function rgb(hex: string): Rgb {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function strokeScale(scale: number): number {
  return Math.min(scale, MAX_STROKE_SCALE);
}

function segWidths(pdf: jsPDF, font: string, segs: Seg[], mm: number): number[] {
  pdf.setFontSize(mm / PT_MM);
  return segs.map((s) => {
    pdf.setFont(font, s.bold ? 'bold' : 'normal');
    return pdf.getTextWidth(s.text);
  });
}

/** Colour, width and dash of a status (`k` mm per px), so a cable's status never rests on colour alone. */
function applyStatus(pdf: jsPDF, status: Status | null, k: number): void {
  const look = statusLook(status);
  pdf.setDrawColor(...rgb(look.colour));
  pdf.setLineWidth(look.strokeWidth * k);
  pdf.setLineDashPattern(
    look.dash
      ? look.dash
          .trim()
          .split(/\s+/)
          .map((d) => Number(d) * k)
      : [],
    0,
  );
}

/** The line with its `cut` part shortened (ending in …) until it fits `maxMm`; ids and figures are never cut. */
function fitLine(pdf: jsPDF, font: string, line: Seg[], mm: number, maxMm: number): Seg[] {
  const widths = segWidths(pdf, font, line, mm);
  const total = widths.reduce((a, b) => a + b, 0);
  const k = line.findIndex((s) => s.cut);
  if (total <= maxMm || k < 0) return line;
  const room = maxMm - (total - widths[k]!);
  const cut = line[k]!;
  let text = cut.text;
  const shortened = (): string => (text.trim() ? `${text.trimEnd()}…` : '');
  while (text.trim() && segWidths(pdf, font, [{ ...cut, text: shortened() }], mm)[0]! > room)
    text = text.slice(0, -1);
  return line.map((s, i) => (i === k ? { ...s, text: shortened() } : s));
}

function drawBlock(pdf: jsPDF, font: string, plan: Plan, b: Block): void {
  const mm = plan.textMm;
  const maxMm = b.maxW * plan.scale;
  const [left, top] = plan.at(b.x, b.top);
  b.lines.forEach((raw, i) => {
    const line = fitLine(pdf, font, raw, mm, maxMm);
    const widths = segWidths(pdf, font, line, mm);
    const lineW = widths.reduce((a, c) => a + c, 0);
    // An id or a figure wider than its place would run off the drawing: it moves back inside.
    const { area } = plan;
    let x = Math.max(
      area.x,
      Math.min(b.centred ? left + (maxMm - lineW) / 2 : left, area.x + area.w - lineW),
    );
    const y = Math.max(area.y, Math.min(top + i * mm * LINE, area.y + area.h - mm));
    line.forEach((s, j) => {
      if (s.text) {
        pdf.setFont(font, s.bold ? 'bold' : 'normal');
        pdf.setTextColor(...rgb(s.colour ?? INK));
        pdf.text(s.text, x, y, { baseline: 'top' });
      }
      x += widths[j]!;
    });
  });
}

function drawPlan(pdf: jsPDF, font: string, plan: Plan): void {
  const k = strokeScale(plan.scale);
  // Cables leaving a node share their first runs. The worse status goes on top (its line is also
  // the wider), so a shared run shows the worst it carries, as a cable shows the worst load it feeds.
  const rank = (s: Status | null): number => (s === null ? 0 : STATUS_RANK[s]);
  const across = (p: Pt[]): number => Math.abs(p[2]![0] - p[1]![0]);
  const order = [...plan.cables].sort(
    (a, b) => rank(a.status) - rank(b.status) || across(b.route) - across(a.route),
  );
  for (const { status, route } of order) {
    const pts = route.map(([x, y]) => plan.at(x, y));
    // A white line first clears what lies beneath, so the dashes read as this cable's alone.
    pdf.setLineDashPattern([], 0);
    pdf.setDrawColor(255, 255, 255);
    pdf.setLineWidth(statusLook(status).strokeWidth * k);
    polyline(pdf, pts);
    applyStatus(pdf, status, k);
    polyline(pdf, pts);
  }
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...rgb(INK));
  pdf.setFillColor(...rgb(INK));
  pdf.setLineWidth(SYMBOL_STROKE * k);
  for (const { node, r } of plan.nodes)
    drawNodeSymbol(pdf, node, plan.at(r.x, r.y), r.w * plan.scale, r.h * plan.scale);
  for (const b of plan.blocks) drawBlock(pdf, font, plan, b);
}

interface KeySize {
  w: number;
  h: number;
  row: number;
  sample: number;
}

function keySize(pdf: jsPDF, font: string, pt: number): KeySize {
  const mm = pt * PT_MM;
  pdf.setFont(font, 'normal');
  pdf.setFontSize(pt);
  const words = Object.values(STATUS_LOOK).map((l) => pdf.getTextWidth(`${l.glyph} ${l.word}`));
  const row = mm * 1.6;
  const sample = mm * 5;
  return { w: sample + mm * 2.5 + Math.max(...words), h: row * 4 + mm, row, sample };
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

/** The status key: each status's line style, glyph and word, then "no result". */
function drawKey(pdf: jsPDF, font: string, pt: number, [x, y]: Pt, key: KeySize, k: number): void {
  const mm = pt * PT_MM;
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...rgb(KEY_FRAME));
  pdf.setFillColor(255, 255, 255);
  pdf.setLineWidth(0.2);
  pdf.rect(x, y, key.w, key.h, 'FD');
  pdf.setFont(font, 'normal');
  pdf.setFontSize(pt);
  (['within', 'close', 'over', null] as const).forEach((status, i) => {
    const look = statusLook(status);
    const cy = y + mm / 2 + key.row * (i + 0.5);
    applyStatus(pdf, status, k);
    pdf.line(x + mm, cy, x + mm + key.sample, cy);
    pdf.setTextColor(...rgb(look.colour));
    pdf.text(`${look.glyph} ${look.word}`, x + mm * 1.5 + key.sample, cy, { baseline: 'middle' });
  });
}
