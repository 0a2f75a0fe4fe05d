/**
 * The tender pack: one A3 landscape PDF a reviewer can check without the program. Sheets, in
 * order: the single-line diagram (a key plan and several sheets when the drawing is too large for
 * legible labels on one); the summary (project, settings, data and standards used,
 * results in brief, methods and assumptions, the cautions in full); the cable, load and board
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
import { autoTable, type CellDef, type RowInput } from 'jspdf-autotable';
import type { ProjectDocument } from '../../model/types.ts';
import { CAUTIONS } from '../../model/cautions.ts';
import type { Results, Status } from '../../solver/results.ts';
import { SCHEDULE_SHEETS, type ScheduleSheet } from '../schedules.ts';
import { STATUS_LOOK } from '../statusLook.ts';
import { valueText, workingRecords } from '../working.ts';
import { drawDiagram } from './diagram.ts';
import { drawKeyPlan, planDiagramSheets } from './diagramSheets.ts';
import { drawDiagramWindow } from './diagramWindow.ts';

/** The pack's font as base64 TrueType files (regular and bold). */
export interface PackFonts {
  regular: string;
  bold: string;
}

export interface PackOptions {
  /** Include the working sheets (every figure's formula, inputs and result). Default true. */
  working?: boolean;
  /** When the pack was made, printed in the title block; default now. */
  madeAt?: Date;
}

/** The family name the pack registers its font under. */
export const PACK_FONT = 'DejaVuSansCondensed';

/** A3 landscape, millimetres. */
const PAGE = { w: 420, h: 297 };
const MARGIN = 10;
const TITLE_BLOCK = { w: 170, h: 36 };
/** The band along the bottom with the title block and the caution line. */
const FOOT = TITLE_BLOCK.h + 4;
/** Where sheet content may go. */
const CONTENT = {
  x: MARGIN + 4,
  y: MARGIN + 15,
  w: PAGE.w - 2 * MARGIN - 8,
  h: PAGE.h - 2 * MARGIN - 15 - FOOT,
};

const INK: [number, number, number] = [30, 36, 44];
const GREY: [number, number, number] = [110, 118, 128];
const RULE: [number, number, number] = [170, 176, 184];
const HEAD_FILL: [number, number, number] = [226, 232, 238];

/** Methods and assumptions the figures rest on, as the engine applies them (docs/solver.md, docs/protection.md). */
export const PACK_METHODS: readonly string[] = [
  'Route lengths are one way, in metres. The method applies the loop: 2 × for a single-phase circuit, √3 line to line for a balanced three-phase one; an unbalanced three-phase segment is solved per phase with its neutral current (neutral taken equal to the phase conductor).',
  'Conductor resistance is the IEC 60228 maximum at 20 °C corrected to the conductor operating temperature (α20 0.00393/K copper, 0.00403/K aluminium), with a reactance per metre for the construction, unless a loaded data set gives the figures; the data set used is named on this sheet and in every working record.',
  'A segment’s drop is I (r cos φ + x sin φ) × L where the power factor is known. Percentages add along each path from the origin; single-phase and per-phase figures are % of U0, a balanced three-phase segment’s own drop is % of the line voltage.',
  'Design current is the sum of the loads below, with each load’s demand factor and each board’s diversity, per phase; Ib of a cable is its worst phase. Where the settings say so, the device rating In is used for the drop instead (conservative).',
  'Loop impedance Zs = Ze + Σ (R1 + R2) along the path at operating temperature, compared with Cmin × U0 / Ia for the protective device. Prospective fault currents use the source impedance and the cables at 20 °C with cmax.',
  'Capacity Iz is the tabulated It times the ambient, grouping and insulation factors given for the circuit; combinations with no table are reported as not assessed, never guessed.',
  `Status words: ${(['within', 'close', 'over'] as const).map((k) => `${STATUS_LOOK[k].glyph} ${STATUS_LOOK[k].word} (${STATUS_LOOK[k].meaning})`).join(', ')}; boards and cables show the worst load they feed.`,
];

type Rgb = [number, number, number];

function rgb(hex: string): Rgb {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function statusText(status: Status | null | undefined): string {
  const look = STATUS_LOOK[status ?? 'none'];
  return `${look.glyph} ${look.word}`;
}

/** "PBJ-E-001-tender-pack.pdf" from the project's reference (or title). */
export function tenderPackFileName(doc: ProjectDocument): string {
  const base = (doc.details.reference || doc.details.title || 'project')
    .replace(/[^\w.-]+/g, '-')
    .replace(/^-+|-+$/g, '');
  const rev = doc.details.revision ? `-rev-${doc.details.revision.replace(/[^\w.-]+/g, '-')}` : '';
  return `${base || 'project'}${rev}-tender-pack.pdf`;
}

/** Sheet titles by page, filled as pages are made and printed in each title block at the end. */
class Sheets {
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

function frame(
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

function countStatuses(results: Results): Record<Status | 'none', number> {
  const out: Record<Status | 'none', number> = { within: 0, close: 0, over: 0, none: 0 };
  for (const id of Object.keys(results.loads)) out[results.loads[id]!.status ?? 'none']++;
  return out;
}

/** Label/value lines under a heading; returns the y below them. */
function block(
  pdf: jsPDF,
  x: number,
  y: number,
  w: number,
  heading: string,
  lines: readonly (readonly [string, string])[],
): number {
  pdf.setFont(PACK_FONT, 'bold');
  pdf.setFontSize(10.5);
  pdf.setTextColor(...INK);
  pdf.text(heading, x, y);
  y += 5.5;
  for (const [label, value] of lines) {
    pdf.setFont(PACK_FONT, 'normal');
    pdf.setFontSize(8.5);
    pdf.setTextColor(...GREY);
    pdf.text(label, x, y);
    pdf.setTextColor(...INK);
    const wrapped = pdf.splitTextToSize(value || '–', w - 48) as string[];
    pdf.text(wrapped, x + 46, y);
    y += 4.2 * wrapped.length;
  }
  return y + 4;
}

/** Paragraphs (bulleted) under a heading; returns the y below them. */
function paragraphs(
  pdf: jsPDF,
  x: number,
  y: number,
  w: number,
  heading: string,
  items: readonly string[],
): number {
  pdf.setFont(PACK_FONT, 'bold');
  pdf.setFontSize(10.5);
  pdf.setTextColor(...INK);
  pdf.text(heading, x, y);
  y += 5.5;
  pdf.setFont(PACK_FONT, 'normal');
  pdf.setFontSize(8.5);
  for (const item of items) {
    const wrapped = pdf.splitTextToSize(item, w - 5) as string[];
    pdf.text('•', x, y);
    pdf.text(wrapped, x + 4, y);
    y += 4 * wrapped.length + 1.2;
  }
  return y + 3;
}

function summarySheet(pdf: jsPDF, doc: ProjectDocument, results: Results): void {
  const d = doc.details;
  const s = doc.settings;
  const colW = (CONTENT.w - 12) / 2;
  const left = CONTENT.x;
  const right = CONTENT.x + colW + 12;
  let y = CONTENT.y;
  y = block(pdf, left, y, colW, 'Project', [
    ['Title', d.title],
    ['Client', d.client],
    ['Site', d.site],
    ['Reference', d.reference],
    ['Revision', d.revision],
    ['Author', d.author],
    ['Date', d.date],
    ['Notes', d.notes],
  ]);
  const counts = countStatuses(results);
  const errors = results.findings.filter((f) => f.severity === 'error').length;
  const warnings = results.findings.length - errors;
  const supply = doc.nodes.find((n) => n.kind === 'supply');
  y = block(pdf, left, y, colW, 'Settings and supply', [
    ['Frequency', `${s.frequencyHz} Hz`],
    ['Nominal voltages', `U0 ${s.u0V} V, ULL ${s.uLlV} V`],
    [
      'Supply',
      supply && supply.kind === 'supply'
        ? `${supply.id}: ${supply.phases === 3 ? 'three-phase' : 'single-phase'}, ${supply.earthing}, Ze ${supply.zeOhm} Ω, Ipf ${supply.pfcKa} kA, ${supply.ownership} supply`
        : 'none',
    ],
    ['Close to limit', `above ${Math.round(s.closeThreshold * 100)} % of a load’s drop budget`],
    [
      'Drop worked out with',
      s.designCurrentBasis === 'In' ? 'the device rating In (conservative)' : 'the design current Ib',
    ],
    [
      'Long-run allowance',
      s.longRunAllowance ? 'applied (+0.005 % per metre beyond 100 m, at most +0.5 %)' : 'not applied',
    ],
  ]);
  y = block(pdf, left, y, colW, 'Results in brief', [
    [
      'Loads',
      `${Object.keys(results.loads).length}: ${counts.within} within, ${counts.close} close, ${counts.over} over, ${counts.none} with no result`,
    ],
    ['Cables', String(doc.cables.length)],
    ['Findings', `${errors} errors, ${warnings} warnings (listed on the findings sheet)`],
    ...(results.protection
      ? ([
          [
            'Protection checks',
            `${results.protection.failedChecks} failed, ${results.protection.unassessedChecks} not assessed`,
          ],
        ] as const)
      : []),
  ]);
  let r = CONTENT.y;
  r = block(pdf, right, r, colW, 'Data and standards used', [
    ['Conductor data', `${results.dataSet.title} (${results.dataSet.id}); ${results.dataSet.source}`],
    ['Drop limits', `${results.profile.title}; ${results.profile.source}`],
    ...(results.protection
      ? ([
          ['Fuse data', results.protection.fuseDataSet.title],
          ['Capacity tables', results.protection.capacityDataSets.join('; ')],
        ] as const)
      : []),
  ]);
  r = paragraphs(pdf, right, r, colW, 'Standards and editions', results.references);
  r = paragraphs(pdf, right, r, colW, 'Cautions', CAUTIONS);
  const methodsY = Math.max(y, r);
  paragraphs(pdf, left, methodsY, CONTENT.w, 'Methods and assumptions', PACK_METHODS);
}

const TABLE_STYLE = {
  font: PACK_FONT,
  fontSize: 7.5,
  cellPadding: 1.2,
  textColor: INK,
  lineColor: RULE,
  lineWidth: 0.1,
  overflow: 'linebreak' as const,
};

function table(
  pdf: jsPDF,
  sheets: Sheets,
  title: string,
  head: string[],
  body: RowInput[],
  colour?: (row: number, col: number) => Rgb | undefined,
) {
  autoTable(pdf, {
    head: [head],
    body,
    startY: CONTENT.y,
    margin: {
      top: CONTENT.y,
      left: CONTENT.x,
      right: PAGE.w - CONTENT.x - CONTENT.w,
      bottom: PAGE.h - CONTENT.y - CONTENT.h,
    },
    theme: 'grid',
    rowPageBreak: 'avoid',
    styles: TABLE_STYLE,
    headStyles: { fillColor: HEAD_FILL, textColor: INK, fontStyle: 'bold' },
    didParseCell: (data) => {
      if (data.section !== 'body' || !colour) return;
      const c = colour(data.row.index, data.column.index);
      if (c) data.cell.styles.textColor = c;
    },
    // The hook's own pageNumber counts the table's pages; the sheet titles go by the document's.
    didDrawPage: () => sheets.note(pdf.getCurrentPageInfo().pageNumber, title),
  });
}

function scheduleSheet(
  pdf: jsPDF,
  sheets: Sheets,
  doc: ProjectDocument,
  results: Results,
  sheet: ScheduleSheet,
) {
  const { title, build, statusLabel } = SCHEDULE_SHEETS[sheet];
  const schedule = build(doc, results);
  sheets.start(title);
  const statuses = schedule.rows.map((r) => r.status);
  table(
    pdf,
    sheets,
    title,
    ['Id', statusLabel, ...schedule.columns.map((c) => c.label)],
    schedule.rows.map((row) => [
      row.id,
      statusText(row.status),
      ...schedule.columns.map((c) => row.cells[c.id]?.text ?? ''),
    ]),
    (row, col) => (col === 1 ? rgb(STATUS_LOOK[statuses[row] ?? 'none'].colour) : undefined),
  );
}

function findingsSheet(pdf: jsPDF, sheets: Sheets, results: Results) {
  sheets.start('Findings');
  const list = results.findings;
  if (list.length === 0) {
    pdf.setFont(PACK_FONT, 'normal');
    pdf.setFontSize(9);
    pdf.text('No findings: every element could be solved and every check passed.', CONTENT.x, CONTENT.y + 4);
    return;
  }
  table(
    pdf,
    sheets,
    'Findings',
    ['Severity', 'Element', 'Code', 'What and the fix'],
    list.map((f) => [f.severity, f.elementId ?? '', f.code, f.message]),
    (row) => (list[row]?.severity === 'error' ? rgb(STATUS_LOOK.over.colour) : undefined),
  );
}

function workingSheet(pdf: jsPDF, sheets: Sheets, doc: ProjectDocument, results: Results) {
  sheets.start('Working');
  const body: RowInput[] = [];
  const heading = (text: string): CellDef => ({
    content: text,
    colSpan: 4,
    styles: { fontStyle: 'bold', fillColor: [240, 243, 246], fontSize: 8.5 },
  });
  const element = (id: string, label: string) => {
    const groups = workingRecords(results, id);
    if (!groups) return;
    body.push([heading(label)]);
    for (const g of groups) {
      if (g.records.length === 0) continue;
      for (const w of g.records) {
        const inputs = w.inputs
          .map((i) => `${i.name} = ${valueText(i.value, i.unit)}  (${i.source})`)
          .join('\n');
        body.push([
          `${g.title}: ${w.title}`,
          w.note ? `${w.formula}\nNote: ${w.note}` : w.formula,
          inputs,
          valueText(w.result.value, w.result.unit),
        ]);
      }
    }
  };
  for (const c of doc.cables)
    element(c.id, `Cable ${c.id}${c.name ? ` “${c.name}”` : ''} (${c.from} → ${c.to})`);
  for (const n of doc.nodes)
    element(n.id, `${n.kind[0]!.toUpperCase()}${n.kind.slice(1)} ${n.id}${n.name ? ` “${n.name}”` : ''}`);
  autoTable(pdf, {
    head: [['Figure', 'Formula', 'Inputs (with their source)', 'Result']],
    body,
    startY: CONTENT.y,
    margin: {
      top: CONTENT.y,
      left: CONTENT.x,
      right: PAGE.w - CONTENT.x - CONTENT.w,
      bottom: PAGE.h - CONTENT.y - CONTENT.h,
    },
    theme: 'grid',
    rowPageBreak: 'avoid',
    styles: { ...TABLE_STYLE, fontSize: 7 },
    headStyles: { fillColor: HEAD_FILL, textColor: INK, fontStyle: 'bold' },
    columnStyles: { 0: { cellWidth: 70 }, 1: { cellWidth: 95 }, 3: { cellWidth: 40 } },
    didDrawPage: () => sheets.note(pdf.getCurrentPageInfo().pageNumber, 'Working'),
  });
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

/** Registers the pack's font on a jsPDF document. */
export function registerPackFont(pdf: jsPDF, fonts: PackFonts): void {
  pdf.addFileToVFS(`${PACK_FONT}.ttf`, fonts.regular);
  pdf.addFont(`${PACK_FONT}.ttf`, PACK_FONT, 'normal');
  pdf.addFileToVFS(`${PACK_FONT}-Bold.ttf`, fonts.bold);
  pdf.addFont(`${PACK_FONT}-Bold.ttf`, PACK_FONT, 'bold');
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
  sheets.start('Summary, data and cautions');
  summarySheet(pdf, doc, results);
  for (const sheet of ['cables', 'loads', 'boards'] as const) scheduleSheet(pdf, sheets, doc, results, sheet);
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
