/**
 * What the single-line diagram's drawing code (diagram.ts, diagramDraw.ts, diagramSymbols.ts)
 * asks of the surface it draws on: the few jsPDF calls it makes, in millimetres. A jsPDF document
 * is a Pen as it is; the SVG export (export/svg/svgPen.ts) is another, so the PDF and the SVG are
 * drawn by the same code and cannot drift apart.
 */
import type { TextOptionsLight } from 'jspdf';

/** How a run of text is anchored at its point: the jsPDF options the drawing uses. */
export type PenTextOptions = Pick<TextOptionsLight, 'baseline' | 'align'>;

/**
 * A drawing surface with jsPDF's calls and meanings: colours as "#rrggbb" or 0–255 channels, font
 * size in points, everything else in millimetres; `style` 'S' strokes, 'F' fills, 'FD'/'DF' both.
 */
export interface Pen {
  getFont(): { fontName: string; fontStyle: string };
  getFontSize(): number;
  getTextColor(): string;
  getDrawColor(): string;
  getFillColor(): string;
  getLineWidth(): number;
  setFont(fontName: string, fontStyle?: string): unknown;
  setFontSize(size: number): unknown;
  setTextColor(colour: string): unknown;
  setTextColor(r: number, g: number, b: number): unknown;
  setDrawColor(colour: string): unknown;
  setDrawColor(r: number, g: number, b: number): unknown;
  setFillColor(colour: string): unknown;
  setFillColor(r: number, g: number, b: number): unknown;
  setLineWidth(width: number): unknown;
  setLineDashPattern(dashArray: number[], dashPhase: number): unknown;
  /** The width of `text` in the current font and size, millimetres. */
  getTextWidth(text: string): number;
  text(text: string, x: number, y: number, options?: PenTextOptions): unknown;
  line(x1: number, y1: number, x2: number, y2: number): unknown;
  rect(x: number, y: number, w: number, h: number, style?: string | null): unknown;
  circle(x: number, y: number, r: number, style?: string | null): unknown;
}
