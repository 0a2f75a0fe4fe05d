/**
 * The tender pack's page: A3 landscape geometry, ink colours, the sheet titles by page and the frame
 * every sheet carries (border, title block, caution line).
 */
import type { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';

/** The family name the pack registers its font under. */
export const PACK_FONT = 'DejaVuSansCondensed';

/** The pack's font as base64 TrueType files (regular and bold). */
export interface PackFonts {
  regular: string;
  bold: string;
}

/** Registers the pack's font on a jsPDF document. */
export function registerPackFont(pdf: jsPDF, fonts: PackFonts): void {
  pdf.addFileToVFS(`${PACK_FONT}.ttf`, fonts.regular);
  pdf.addFont(`${PACK_FONT}.ttf`, PACK_FONT, 'normal');
  pdf.addFileToVFS(`${PACK_FONT}-Bold.ttf`, fonts.bold);
  pdf.addFont(`${PACK_FONT}-Bold.ttf`, PACK_FONT, 'bold');
}

/** A3 landscape, millimetres. */
export const PAGE = { w: 420, h: 297 };
export const MARGIN = 10;
export const TITLE_BLOCK = { w: 170, h: 36 };
/** The band along the bottom with the title block and the caution line. */
export const FOOT = TITLE_BLOCK.h + 4;
/** Where sheet content may go. */
export const CONTENT = {
  x: MARGIN + 4,
  y: MARGIN + 15,
  w: PAGE.w - 2 * MARGIN - 8,
  h: PAGE.h - 2 * MARGIN - 15 - FOOT,
};

export const INK: [number, number, number] = [30, 36, 44];
export const GREY: [number, number, number] = [110, 118, 128];
export const RULE: [number, number, number] = [170, 176, 184];
export const HEAD_FILL: [number, number, number] = [226, 232, 238];

export type Rgb = [number, number, number];

export function rgb(hex: string): Rgb {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/** Sheet titles by page, filled as pages are made and printed in each title block at the end. */
export class Sheets {
  readonly titles: string[] = [];
  constructor(readonly pdf: jsPDF) {}
  /** A new page for `title` (the first page is jsPDF's own). */
  start(title: string): void {
    if (this.titles.length > 0) this.pdf.addPage('a3', 'landscape');
    this.titles.push(title);
    this.heading(title);
  }
  /** Pages a table ran onto carry the title of the sheet it belongs to, marked as continued. */
  note(page: number, title: string): void {
    while (this.titles.length < page) {
      const continued = `${title} (continued)`;
      this.titles.push(continued);
      this.heading(continued);
    }
  }
  private heading(title: string): void {
    const pdf = this.pdf;
    pdf.setFont(PACK_FONT, 'bold');
    pdf.setFontSize(14);
    pdf.setTextColor(...INK);
    pdf.text(title, CONTENT.x, MARGIN + 8);
  }
}

export function frame(
  pdf: jsPDF,
  doc: ProjectDocument,
  results: Results,
  title: string,
  page: number,
  pages: number,
  madeAt: Date,
) {
  pdf.setLineDashPattern([], 0);
  pdf.setDrawColor(...INK);
  pdf.setLineWidth(0.5);
  pdf.rect(MARGIN, MARGIN, PAGE.w - 2 * MARGIN, PAGE.h - 2 * MARGIN);
  const x = PAGE.w - MARGIN - TITLE_BLOCK.w;
  const y = PAGE.h - MARGIN - TITLE_BLOCK.h;
  pdf.setLineWidth(0.3);
  pdf.rect(x, y, TITLE_BLOCK.w, TITLE_BLOCK.h);
  const d = doc.details;
  const cell = (cx: number, cy: number, w: number, label: string, value: string, bold = false) => {
    pdf.setFont(PACK_FONT, 'normal');
    pdf.setFontSize(6);
    pdf.setTextColor(...GREY);
    pdf.text(label, cx + 1.5, cy + 2.6);
    pdf.setFont(PACK_FONT, bold ? 'bold' : 'normal');
    pdf.setFontSize(bold ? 10 : 8);
    pdf.setTextColor(...INK);
    const fitted = pdf.splitTextToSize(value || '–', w - 3) as string[];
    pdf.text(
      fitted.length > 1 ? `${(fitted[0] ?? '').replace(/\s*$/, '')}…` : (fitted[0] ?? ''),
      cx + 1.5,
      cy + 6.6,
    );
  };
  const row = 9;
  const half = TITLE_BLOCK.w / 2;
  const quarter = TITLE_BLOCK.w / 4;
  pdf.setDrawColor(...RULE);
  pdf.setLineWidth(0.2);
  for (let k = 1; k < 4; k++) pdf.line(x, y + k * row, x + TITLE_BLOCK.w, y + k * row);
  pdf.line(x + half, y + row, x + half, y + 4 * row);
  pdf.line(x + half + quarter, y + 2 * row, x + half + quarter, y + 4 * row);
  cell(x, y, TITLE_BLOCK.w, 'Project', d.title, true);
  cell(x, y + row, half, 'Client', d.client);
  cell(x + half, y + row, half, 'Site', d.site);
  cell(x, y + 2 * row, half, 'Sheet', title);
  cell(x + half, y + 2 * row, quarter, 'Reference', d.reference);
  cell(x + half + quarter, y + 2 * row, quarter, 'Revision', d.revision);
  cell(x, y + 3 * row, half, 'Drawn by / date', `${d.author || '–'} / ${d.date || '–'}`);
  cell(x + half, y + 3 * row, quarter, 'Sheet', `${page} of ${pages}`);
  cell(x + half + quarter, y + 3 * row, quarter, 'Made', madeAt.toISOString().slice(0, 10));
  // The caution line, on every sheet, beside the title block.
  const cw = x - MARGIN - 8;
  pdf.setFont(PACK_FONT, 'bold');
  pdf.setFontSize(7.5);
  pdf.setTextColor(...INK);
  pdf.text('Design aid only.', MARGIN + 4, y + 4);
  pdf.setFont(PACK_FONT, 'normal');
  pdf.setFontSize(7);
  const caution = pdf.splitTextToSize(
    `Local wiring rules, the supply company’s requirements and licensed practice prevail. Every value must be verified on site by a competent person before the installation is energised or certified. Conductor data: ${results.dataSet.title}. Drop limits: ${results.profile.title}. Standards and editions used: see the summary sheet. Made with Dropline from the project file; figures are only as good as its inputs.`,
    cw,
  ) as string[];
  pdf.text(caution, MARGIN + 4, y + 8);
}
