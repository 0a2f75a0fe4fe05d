/**
 * A Pen (export/pdf/pen.ts) that writes SVG elements instead of PDF operators, in millimetres, so
 * the single-line diagram's own drawing code makes the SVG drawing. Text is measured by a real
 * jsPDF document with the same font registered, so labels are laid out exactly as in the PDF, and
 * placed on the baseline jsPDF would use for the same call.
 */
import type { jsPDF } from 'jspdf';
import type { Pen, PenTextOptions } from '../pdf/pen.ts';

/** Millimetres per typographic point. */
const PT_MM = 25.4 / 72;

/** `v` rounded to a thousandth of a millimetre, as SVG number text. */
export function num(v: number): string {
  const r = Math.round(v * 1000) / 1000;
  return Object.is(r, -0) ? '0' : String(r);
}

/**
 * `text` safe in XML content and in attribute values: markup characters escaped, and characters
 * XML cannot hold at all (control characters, unpaired surrogates) left out.
 */
export function escapeXml(text: string): string {
  return text
    .replace(
      // eslint-disable-next-line no-control-regex
      /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g,
      '',
    )
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/** A colour call's arguments ("#rrggbb", or red, green and blue 0–255) as "#rrggbb". */
function colour(c: string | number, g?: number, b?: number): string {
  if (typeof c === 'string') return c.toLowerCase();
  const hex = (v: number | undefined): string =>
    Math.max(0, Math.min(255, Math.round(v ?? 0)))
      .toString(16)
      .padStart(2, '0');
  return `#${hex(c)}${hex(g)}${hex(b)}`;
}

/** Records drawing calls as SVG elements; `measure` is a jsPDF document with the drawing's font registered. */
export class SvgPen implements Pen {
  private readonly parts: string[] = [];
  private draw = '#000000';
  private fill = '#000000';
  private ink = '#000000';
  private width: number;
  private dash: number[] = [];
  private dashPhase = 0;
  /** The extent of everything drawn so far (text by its measured width and the font's height). */
  private box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };

  constructor(private readonly measure: jsPDF) {
    this.width = measure.getLineWidth();
  }

  /** What has been drawn spans this rectangle (mm), or null when nothing has been. */
  bounds(): { x: number; y: number; w: number; h: number } | null {
    const b = this.box;
    return b.x0 <= b.x1 ? { x: b.x0, y: b.y0, w: b.x1 - b.x0, h: b.y1 - b.y0 } : null;
  }

  private extend(x0: number, y0: number, x1: number, y1: number): void {
    const b = this.box;
    b.x0 = Math.min(b.x0, x0, x1);
    b.y0 = Math.min(b.y0, y0, y1);
    b.x1 = Math.max(b.x1, x0, x1);
    b.y1 = Math.max(b.y1, y0, y1);
  }

  /** The elements drawn so far, one a line. */
  elements(): string {
    return this.parts.join('\n');
  }

  getFont(): { fontName: string; fontStyle: string } {
    return this.measure.getFont();
  }
  getFontSize(): number {
    return this.measure.getFontSize();
  }
  getTextColor(): string {
    return this.ink;
  }
  getDrawColor(): string {
    return this.draw;
  }
  getFillColor(): string {
    return this.fill;
  }
  getLineWidth(): number {
    return this.width;
  }
  setFont(fontName: string, fontStyle?: string): this {
    this.measure.setFont(fontName, fontStyle);
    return this;
  }
  setFontSize(size: number): this {
    this.measure.setFontSize(size);
    return this;
  }
  setTextColor(c: string | number, g?: number, b?: number): this {
    this.ink = colour(c, g, b);
    return this;
  }
  setDrawColor(c: string | number, g?: number, b?: number): this {
    this.draw = colour(c, g, b);
    return this;
  }
  setFillColor(c: string | number, g?: number, b?: number): this {
    this.fill = colour(c, g, b);
    return this;
  }
  setLineWidth(width: number): this {
    this.width = width;
    return this;
  }
  setLineDashPattern(dashArray: number[], dashPhase: number): this {
    this.dash = [...dashArray];
    this.dashPhase = dashPhase;
    return this;
  }
  getTextWidth(text: string): number {
    return this.measure.getTextWidth(text);
  }

  text(text: string, x: number, y: number, options: PenTextOptions = {}): this {
    // jsPDF's own rule for where a baseline option puts the alphabetic baseline (its text()).
    const h = this.measure.getFontSize() * PT_MM;
    const descent = h * (this.measure.getLineHeightFactor() - 1);
    const shift = { top: h - descent, middle: h / 2 - descent, bottom: -descent, hanging: h - 2 * descent };
    const base = y + (shift[options.baseline as keyof typeof shift] ?? 0);
    const anchor = options.align === 'center' ? 'middle' : options.align === 'right' ? 'end' : null;
    const bold = this.measure.getFont().fontStyle === 'bold';
    const w = this.measure.getTextWidth(text);
    const left = anchor === 'middle' ? x - w / 2 : anchor === 'end' ? x - w : x;
    this.extend(left, base - h + descent, left + w, base + descent);
    this.parts.push(
      // Spaces kept as they are: a run that starts with one is placed where the space begins.
      `<text xml:space="preserve" x="${num(x)}" y="${num(base)}" font-size="${num(h)}"` +
        `${bold ? ' font-weight="bold"' : ''}` +
        `${anchor ? ` text-anchor="${anchor}"` : ''} fill="${escapeXml(this.ink)}"` +
        // The width the layout measured: a fallback font is fitted to it, so labels never collide.
        `${w > 0 ? ` textLength="${num(w)}" lengthAdjust="spacingAndGlyphs"` : ''}>${escapeXml(text)}</text>`,
    );
    return this;
  }

  line(x1: number, y1: number, x2: number, y2: number): this {
    const half = this.width / 2;
    this.extend(
      Math.min(x1, x2) - half,
      Math.min(y1, y2) - half,
      Math.max(x1, x2) + half,
      Math.max(y1, y2) + half,
    );
    this.parts.push(
      `<line x1="${num(x1)}" y1="${num(y1)}" x2="${num(x2)}" y2="${num(y2)}"${this.paint('S')}/>`,
    );
    return this;
  }

  rect(x: number, y: number, w: number, h: number, style?: string | null): this {
    if (style !== null) {
      this.extend(x, y, x + w, y + h);
      this.parts.push(
        `<rect x="${num(x)}" y="${num(y)}" width="${num(w)}" height="${num(h)}"${this.paint(style)}/>`,
      );
    }
    return this;
  }

  circle(x: number, y: number, r: number, style?: string | null): this {
    if (style !== null) {
      this.extend(x - r, y - r, x + r, y + r);
      this.parts.push(`<circle cx="${num(x)}" cy="${num(y)}" r="${num(r)}"${this.paint(style)}/>`);
    }
    return this;
  }

  /** Fill and stroke attributes for a jsPDF style: 'S' (the default) strokes, 'F' fills, 'FD' or 'DF' both. */
  private paint(style: string = 'S'): string {
    const s = style.toUpperCase();
    const fills = s.includes('F');
    const strokes = s.includes('D') || s === 'S';
    let out = ` fill="${fills ? escapeXml(this.fill) : 'none'}"`;
    if (!strokes) return out;
    out += ` stroke="${escapeXml(this.draw)}" stroke-width="${num(this.width)}"`;
    if (this.dash.length) {
      out += ` stroke-dasharray="${this.dash.map(num).join(' ')}"`;
      if (this.dashPhase) out += ` stroke-dashoffset="${num(this.dashPhase)}"`;
    }
    return out;
  }
}
