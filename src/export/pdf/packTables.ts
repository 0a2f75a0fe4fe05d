/** The tender pack's tables: the schedules, the findings and the working, flowing over as many sheets as they need. */
import type { jsPDF } from 'jspdf';
import { autoTable, type CellDef, type RowInput, type UserOptions } from 'jspdf-autotable';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results, Status } from '../../solver/results.ts';
import { SCHEDULE_SHEETS, type ScheduleSheet } from '../schedules.ts';
import { STATUS_LOOK } from '../statusLook.ts';
import { valueText, workingRecords } from '../working.ts';
import { CONTENT, HEAD_FILL, INK, PACK_FONT, PAGE, RULE, rgb, type Rgb, type Sheets } from './packPage.ts';

function statusText(status: Status | null | undefined): string {
  const look = STATUS_LOOK[status ?? 'none'];
  return `${look.glyph} ${look.word}`;
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

/**
 * What every pack table shares: it starts under the sheet's heading, keeps clear of the title
 * block, never splits a row over two sheets, and gives each sheet it runs onto the sheet's title.
 */
export function flowing(pdf: jsPDF, sheets: Sheets, title: string) {
  return {
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
    // The hook's own pageNumber counts the table's pages; the sheet titles go by the document's.
    didDrawPage: () => sheets.note(pdf.getCurrentPageInfo().pageNumber, title),
  } satisfies UserOptions;
}

/** Columns left empty for handwriting on site: room to write a figure. */
const ON_SITE_WIDTH_MM = 17;

function table(
  pdf: jsPDF,
  sheets: Sheets,
  title: string,
  head: string[],
  body: RowInput[],
  colour?: (row: number, col: number) => Rgb | undefined,
  extra: Pick<UserOptions, 'startY' | 'columnStyles'> = {},
) {
  autoTable(pdf, {
    ...flowing(pdf, sheets, title),
    ...extra,
    head: [head],
    body,
    didParseCell: (data) => {
      if (data.section !== 'body' || !colour) return;
      const c = colour(data.row.index, data.column.index);
      if (c) data.cell.styles.textColor = c;
    },
  });
}

export function scheduleSheet(
  pdf: jsPDF,
  sheets: Sheets,
  doc: ProjectDocument,
  results: Results,
  sheet: ScheduleSheet,
) {
  const { title, build, statusLabel, note } = SCHEDULE_SHEETS[sheet];
  const schedule = build(doc, results);
  sheets.start(title);
  let startY = CONTENT.y;
  if (note) {
    pdf.setFont(PACK_FONT, 'normal');
    pdf.setFontSize(8);
    const lines = pdf.splitTextToSize(note, CONTENT.w) as string[];
    pdf.text(lines, CONTENT.x, CONTENT.y + 3);
    startY = CONTENT.y + 3 + lines.length * 3.6;
  }
  const statuses = schedule.rows.map((r) => r.status);
  // Two columns (id, status) come before the schedule's own.
  const columnStyles = Object.fromEntries(
    schedule.columns.flatMap((c, k) => (c.onSite ? [[k + 2, { minCellWidth: ON_SITE_WIDTH_MM }]] : [])),
  );
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
    { startY, columnStyles },
  );
}

export function findingsSheet(pdf: jsPDF, sheets: Sheets, results: Results) {
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

export function workingSheet(pdf: jsPDF, sheets: Sheets, doc: ProjectDocument, results: Results) {
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
  const base = flowing(pdf, sheets, 'Working');
  autoTable(pdf, {
    ...base,
    head: [['Figure', 'Formula', 'Inputs (with their source)', 'Result']],
    body,
    styles: { ...base.styles, fontSize: 7 },
    columnStyles: { 0: { cellWidth: 70 }, 1: { cellWidth: 95 }, 3: { cellWidth: 40 } },
  });
}
