/**
 * The tender pack's "Alternatives compared" sheet, present when the project keeps alternatives:
 * the current design set against each of them with the tables `dropline compare` prints
 * (../comparison.ts), then the conductor-metal working once for every design.
 */
import type { jsPDF } from 'jspdf';
import { autoTable } from 'jspdf-autotable';
import type { CatalogueSet } from '../../catalogue/catalogueSet.ts';
import { alternativeDocument } from '../../model/commands/alternatives.ts';
import type { ProjectDocument } from '../../model/types.ts';
import { compareDesigns, type DesignComparison } from '../../solver/compare/compareDesigns.ts';
import type { Results } from '../../solver/results.ts';
import { solve } from '../../solver/solve.ts';
import {
  alternativeLabel,
  comparisonTables,
  CURRENT_DESIGN_LABEL,
  metalWorking,
  tableList,
  type TextTable,
} from '../comparison.ts';
import { STATUS_LOOK } from '../statusLook.ts';
import { CONTENT, GREY, INK, PACK_FONT, rgb, type Sheets } from './packPage.ts';
import { flowing } from './packTables.ts';

export const ALTERNATIVES_SHEET = 'Alternatives compared';

/**
 * The current design against each alternative the project keeps, each alternative solved with the
 * same conductor data as the current design.
 */
export function compareAlternatives(
  doc: ProjectDocument,
  results: Results,
  catalogue?: CatalogueSet,
): DesignComparison[] {
  const current = { label: CURRENT_DESIGN_LABEL, doc, results };
  return doc.alternatives.map((alt) => {
    const altDoc = alternativeDocument(doc, alt);
    const altResults = catalogue ? solve(altDoc, catalogue) : solve(altDoc);
    return compareDesigns(current, { label: alternativeLabel(alt), doc: altDoc, results: altResults });
  });
}

const BOTTOM = CONTENT.y + CONTENT.h;
const TONE = { worse: rgb(STATUS_LOOK.over.colour), better: rgb(STATUS_LOOK.within.colour) } as const;

/** Writes down the sheet, starting a continued page when what comes next would not fit. */
class Cursor {
  y = CONTENT.y;
  constructor(
    private readonly pdf: jsPDF,
    private readonly sheets: Sheets,
  ) {}

  room(mm: number): void {
    if (this.y + mm <= BOTTOM) return;
    this.pdf.addPage('a3', 'landscape');
    this.sheets.note(this.pdf.getNumberOfPages(), ALTERNATIVES_SHEET);
    this.y = CONTENT.y;
  }

  text(text: string, size: number, bold = false, colour = INK, keepWith = 0): void {
    const pdf = this.pdf;
    pdf.setFont(PACK_FONT, bold ? 'bold' : 'normal');
    pdf.setFontSize(size);
    const lines = pdf.splitTextToSize(text, CONTENT.w) as string[];
    const lineMm = size * 0.42;
    this.room(lines.length * lineMm + keepWith);
    pdf.setTextColor(...colour);
    pdf.text(lines, CONTENT.x, this.y + lineMm * 0.8);
    this.y += lines.length * lineMm + 1;
  }

  table(t: TextTable): void {
    // A table's title stays with its note and its first rows.
    if (t.title) this.text(t.title, 9.5, true, INK, 18);
    if (t.note) this.text(t.note, 7.5, false, GREY, 14);
    if (t.rows.length === 0) {
      this.text(t.empty, 8);
      this.y += 3;
      return;
    }
    const base = flowing(this.pdf, this.sheets, ALTERNATIVES_SHEET);
    autoTable(this.pdf, {
      ...base,
      startY: this.y,
      head: [t.headers],
      body: t.rows,
      columnStyles: Object.fromEntries(t.align.map((a, k) => [k, { halign: a }])),
      didParseCell: (data) => {
        if (data.section === 'head') data.cell.styles.halign = t.align[data.column.index] ?? 'left';
        if (data.section !== 'body') return;
        const tone = t.tones[data.row.index];
        if (tone) data.cell.styles.textColor = TONE[tone];
      },
    });
    const last = (this.pdf as unknown as { lastAutoTable?: { finalY?: number } }).lastAutoTable;
    this.y = (last?.finalY ?? this.y) + 5;
  }
}

/** The sheet itself; nothing when there is nothing to compare. */
export function alternativesSheet(
  pdf: jsPDF,
  sheets: Sheets,
  doc: ProjectDocument,
  comparisons: readonly DesignComparison[],
): void {
  if (comparisons.length === 0) return;
  sheets.start(ALTERNATIVES_SHEET);
  const at = new Cursor(pdf, sheets);
  at.text(
    `The current design set against ${comparisons.length === 1 ? 'the alternative' : `each of the ${comparisons.length} alternatives`} kept in the project: A is the current design, B the alternative, and each change is B − A. Elements are matched by id. How designs are compared and the metal estimated is under the methods on the summary sheet; the working for the metal is at the end of this sheet. The figures of an alternative are its own design’s, solved with the same data as the current design; verify the chosen design as a whole before it is built.`,
    8.5,
  );
  at.y += 3;
  comparisons.forEach((c, k) => {
    const alt = doc.alternatives[k];
    at.text(`${k + 1}. ${c.a.label} against “${c.b.label}”`, 11.5, true, INK, 30);
    if (alt)
      at.text(
        `Kept ${alt.keptAt ? alt.keptAt.slice(0, 10) : '(date not recorded)'}${alt.note ? `. Note: ${alt.note}` : '.'}`,
        8,
        false,
        GREY,
        24,
      );
    at.y += 1;
    for (const t of tableList(comparisonTables(c))) at.table(t);
    at.y += 3;
  });
  const metal = metalWorking([comparisons[0]!.a, ...comparisons.map((c) => c.b)]);
  at.text(metal.table.title, 11.5, true, INK, 30);
  for (const line of metal.lines) at.text(line, 8);
  at.y += 1;
  at.table({ ...metal.table, title: '' });
}
