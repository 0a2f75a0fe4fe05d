/**
 * Drawing steps shared by the single-line diagram sheets (diagram.ts, diagramSheets.ts): cables in
 * their status style, node symbols, label text placed on the page, and the status key.
 *
 * Status shows as colour, dash pattern and line width together, and as a glyph in the labels, so
 * it still reads in greyscale print.
 */
import type { Status } from '../../solver/results.ts';
import { STATUS_LOOK, statusLook } from '../statusLook.ts';
import { LINE, PT_MM, type Block, type Measure, type Plan, type Pt, type Seg } from './diagramLayout.ts';
import { drawNodeSymbol, polyline } from './diagramSymbols.ts';
import type { Pen } from './pen.ts';

type Rgb = [number, number, number];

/** The drawing's ink, for symbols and label text. */
export const INK = '#262c34';
const STATUS_RANK: Record<Status, number> = { within: 1, close: 2, over: 3 };
const KEY_FRAME = '#b4bac2';
/** Symbol outline width, in canvas units (px at zoom 1), as the cables' widths are. */
const SYMBOL_STROKE = 1.5;
/** Line widths and dashes follow the scale, but never grow past this many mm per canvas unit. */
const MAX_STROKE_SCALE = 0.25;
const KEY_ROWS = ['within', 'close', 'over', null] as const;

/** Notes the caller's font, colours and line style; the returned function puts them back. */
export function keepState(pdf: Pen): () => void {
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

/** "#rrggbb" as jsPDF colour channels. */
export function rgb(hex: string): Rgb {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/** Millimetres per canvas unit for line widths and dashes at drawing scale `scale`. */
export function strokeScale(scale: number): number {
  return Math.min(scale, MAX_STROKE_SCALE);
}

/** The width of each run of text at a text height of `mm` millimetres. */
export function segWidths(pdf: Pen, font: string, segs: Seg[], mm: number): number[] {
  pdf.setFontSize(mm / PT_MM);
  return segs.map((s) => {
    pdf.setFont(font, s.bold ? 'bold' : 'normal');
    return pdf.getTextWidth(s.text);
  });
}

/** The text measure the layout takes (diagramLayout.ts), from jsPDF's font metrics. */
export function measurer(pdf: Pen, font: string): Measure {
  return (segs, mm) => segWidths(pdf, font, segs, mm).reduce((a, b) => a + b, 0);
}

/** Colour, width and dash of a status (`k` mm per px), so a cable's status never rests on colour alone. */
export function applyStatus(pdf: Pen, status: Status | null, k: number): void {
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
function fitLine(pdf: Pen, font: string, line: Seg[], mm: number, maxMm: number): Seg[] {
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

/** A run of label text placed on the page: top-left corner and width, millimetres. */
export interface TextRun {
  text: string;
  x: number;
  y: number;
  w: number;
  bold: boolean;
  colour: string;
}

/** Where each run of a label block prints, kept inside the plan's area. */
export function placeBlock(pdf: Pen, font: string, plan: Plan, b: Block): TextRun[] {
  const mm = plan.textMm;
  const maxMm = b.maxW * plan.scale;
  const [left, top] = plan.at(b.x, b.top);
  const runs: TextRun[] = [];
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
      if (s.text) runs.push({ text: s.text, x, y, w: widths[j]!, bold: !!s.bold, colour: s.colour ?? INK });
      x += widths[j]!;
    });
  });
  return runs;
}

/** Prints `runs` at a text height of `mm` millimetres, moved by (`dx`, `dy`). */
export function drawRuns(pdf: Pen, font: string, mm: number, runs: readonly TextRun[], dx = 0, dy = 0): void {
  pdf.setFontSize(mm / PT_MM);
  for (const r of runs) {
    pdf.setFont(font, r.bold ? 'bold' : 'normal');
    pdf.setTextColor(...rgb(r.colour));
    pdf.text(r.text, r.x + dx, r.y + dy, { baseline: 'top' });
  }
}

/** Draws `cables` along their routes, the worse status on top. */
export function drawCables(pdf: Pen, plan: Plan, cables: Plan['cables']): void {
  const k = strokeScale(plan.scale);
  // Cables leaving a node share their first runs. The worse status goes on top (its line is also
  // the wider), so a shared run shows the worst it carries, as a cable shows the worst load it feeds.
  const rank = (s: Status | null): number => (s === null ? 0 : STATUS_RANK[s]);
  const across = (p: Pt[]): number => Math.abs(p[2]![0] - p[1]![0]);
  const order = [...cables].sort(
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
}

/** Draws the symbols of `nodes` in ink. */
export function drawSymbols(pdf: Pen, plan: Plan, nodes: Plan['nodes']): void {
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...rgb(INK));
  pdf.setFillColor(...rgb(INK));
  pdf.setLineWidth(SYMBOL_STROKE * strokeScale(plan.scale));
  for (const { node, r } of nodes)
    drawNodeSymbol(pdf, node, plan.at(r.x, r.y), r.w * plan.scale, r.h * plan.scale);
}

/** Draws the whole plan: cables, symbols, then labels. */
export function drawPlan(pdf: Pen, font: string, plan: Plan): void {
  drawCables(pdf, plan, plan.cables);
  drawSymbols(pdf, plan, plan.nodes);
  for (const b of plan.blocks) drawRuns(pdf, font, plan.textMm, placeBlock(pdf, font, plan, b));
}

/** The status key's size at `pt` points, millimetres: frame, row pitch and line sample length. */
export interface KeySize {
  w: number;
  h: number;
  row: number;
  sample: number;
}

/** The size of the framed status key at `pt` points. */
export function keySize(pdf: Pen, font: string, pt: number): KeySize {
  const mm = pt * PT_MM;
  pdf.setFont(font, 'normal');
  pdf.setFontSize(pt);
  const words = Object.values(STATUS_LOOK).map((l) => pdf.getTextWidth(`${l.glyph} ${l.word}`));
  const row = mm * 1.6;
  const sample = mm * 5;
  return { w: sample + mm * 2.5 + Math.max(...words), h: row * 4 + mm, row, sample };
}

/** The status key: each status's line style, glyph and word, then "no result". */
export function drawKey(pdf: Pen, font: string, pt: number, [x, y]: Pt, key: KeySize, k: number): void {
  const mm = pt * PT_MM;
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...rgb(KEY_FRAME));
  pdf.setFillColor(255, 255, 255);
  pdf.setLineWidth(0.2);
  pdf.rect(x, y, key.w, key.h, 'FD');
  pdf.setFont(font, 'normal');
  pdf.setFontSize(pt);
  KEY_ROWS.forEach((status, i) => {
    const look = statusLook(status);
    const cy = y + mm / 2 + key.row * (i + 0.5);
    applyStatus(pdf, status, k);
    pdf.line(x + mm, cy, x + mm + key.sample, cy);
    pdf.setTextColor(...rgb(look.colour));
    pdf.text(`${look.glyph} ${look.word}`, x + mm * 1.5 + key.sample, cy, { baseline: 'middle' });
  });
}

/**
 * The status key in one row from `x` along the middle line `cy` (millimetres): each status's line
 * style, glyph and word. Returns the width it took.
 */
export function drawKeyRow(pdf: Pen, font: string, pt: number, x: number, cy: number, k: number): number {
  const mm = pt * PT_MM;
  const sample = mm * 5;
  let at = x;
  for (const status of KEY_ROWS) {
    const look = statusLook(status);
    const word = `${look.glyph} ${look.word}`;
    applyStatus(pdf, status, k);
    pdf.line(at, cy, at + sample, cy);
    pdf.setFont(font, 'normal');
    pdf.setFontSize(pt);
    pdf.setTextColor(...rgb(look.colour));
    pdf.text(word, at + sample + mm * 0.5, cy, { baseline: 'middle' });
    at += sample + mm * 0.5 + pdf.getTextWidth(word) + mm * 2;
  }
  pdf.setLineDashPattern([], 0);
  return at - mm * 2 - x;
}
