/**
 * The tender pack: one A3 landscape PDF a reviewer can check without the program. Sheets, in
 * order: the single-line diagram (a key plan and several sheets when the drawing is too large for
 * legible labels on one); the summary (project, settings, data and standards used,
 * results in brief, methods and assumptions, the cautions in full); where the project keeps
 * alternatives, the current design compared with each (packComparison.ts); the cable, load and board
 * schedules; the findings; and the working behind every figure (formula, inputs with units and
 * sources, result), element by element. Every sheet carries a frame, a title block (project,
 * reference, revision, date, sheet n of N) and a one-line caution.
 *
 * Pure apart from jsPDF: the fonts come in as base64 TrueType (a Unicode font, so Ω, Σ, φ, √ and
 * mm² print as they read on screen), so the editor and the command line build the same file.
 *
 * @example
 *   const bytes = tenderPackBytes(doc, solve(doc), fonts);
 *   // Uint8Array starting "%PDF-"
 */
import { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { drawDiagram } from './diagram.ts';
import { drawKeyPlan, planDiagramSheets } from './diagramSheets.ts';
import { drawDiagramWindow } from './diagramWindow.ts';
import { CONTENT, PACK_FONT, Sheets, frame, registerPackFont, type PackFonts } from './packPage.ts';
import { summarySheet } from './packSummary.ts';
import { findingsSheet, scheduleSheet, workingSheet } from './packTables.ts';
import { alternativesSheet, compareAlternatives } from './packComparison.ts';
import { drawPlanSheet, hasPlanSheet, rasterOf, type PlanPicture } from './packPlan.ts';
import type { CatalogueSet } from '../../catalogue/catalogueSet.ts';

export { PACK_FONT, registerPackFont, type PackFonts } from './packPage.ts';
export { PACK_METHODS } from './packSummary.ts';
export { tenderPackFileName } from '../fileNames.ts';

export interface PackOptions {
  /** Include the working sheets (every figure's formula, inputs and result). Default true. */
  working?: boolean;
  /** When the pack was made, printed in the title block; default now. */
  madeAt?: Date;
  /**
   * The conductor data the results were solved with, when not the built-in set: the alternatives
   * the project keeps are solved with it too, for the "Alternatives compared" sheet.
   */
  catalogue?: CatalogueSet;
  /**
   * The site plan picture as a raster, when the project's own is an SVG (the editor draws it to
   * a PNG first); a PNG or JPEG picture in the project is used as it is.
   */
  planPicture?: PlanPicture;
}

/**
 * The single-line diagram: one sheet when its labels are legible fitted to it; otherwise a key
 * plan and one sheet per window of the drawing (diagramSheets.ts).
 */
function diagramSheets(pdf: jsPDF, sheets: Sheets, doc: ProjectDocument, results: Results): void {
  const plan = planDiagramSheets(pdf, doc, results, CONTENT, PACK_FONT);
  if (!plan.layout || plan.windows.length === 0) {
    sheets.start('Single-line diagram');
    drawDiagram(pdf, doc, results, CONTENT, PACK_FONT);
    return;
  }
  sheets.start('Single-line diagram: key plan');
  drawKeyPlan(pdf, doc, results, CONTENT, PACK_FONT, plan.windows, plan.unplaced);
  for (const w of plan.windows) {
    sheets.start(`Single-line diagram: sheet ${w.name}`);
    drawDiagramWindow(pdf, plan.layout, w, CONTENT, PACK_FONT, plan.windows);
  }
}

/** The tender pack as a jsPDF document (see the module comment for its sheets). */
export function buildTenderPack(
  doc: ProjectDocument,
  results: Results,
  fonts: PackFonts,
  options: PackOptions = {},
): jsPDF {
  const pdf = new jsPDF({ orientation: 'landscape', unit: 'mm', format: 'a3', compress: true });
  registerPackFont(pdf, fonts);
  const d = doc.details;
  pdf.setProperties({
    title: `${d.title} – tender pack${d.revision ? `, revision ${d.revision}` : ''}`,
    subject: 'Single-line diagram, schedules, findings and working. A design aid: verify on site.',
    author: d.author,
    creator: 'Dropline',
  });
  const sheets = new Sheets(pdf);
  diagramSheets(pdf, sheets, doc, results);
  if (hasPlanSheet(doc)) {
    sheets.start('Site plan');
    drawPlanSheet(pdf, doc, results, options.planPicture ?? rasterOf(pdf, doc));
  }
  sheets.start('Summary, data and cautions');
  summarySheet(pdf, doc, results);
  alternativesSheet(pdf, sheets, doc, compareAlternatives(doc, results, options.catalogue));
  for (const sheet of ['cables', 'loads', 'boards', 'tests'] as const)
    scheduleSheet(pdf, sheets, doc, results, sheet);
  findingsSheet(pdf, sheets, results);
  if (options.working !== false) workingSheet(pdf, sheets, doc, results);
  const pages = pdf.getNumberOfPages();
  const madeAt = options.madeAt ?? new Date();
  for (let p = 1; p <= pages; p++) {
    pdf.setPage(p);
    frame(pdf, doc, results, sheets.titles[p - 1] ?? '', p, pages, madeAt);
  }
  return pdf;
}

/** The tender pack's bytes. */
export function tenderPackBytes(
  doc: ProjectDocument,
  results: Results,
  fonts: PackFonts,
  options: PackOptions = {},
): Uint8Array {
  return new Uint8Array(buildTenderPack(doc, results, fonts, options).output('arraybuffer'));
}
