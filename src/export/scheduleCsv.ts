/**
 * A schedule as a CSV file (RFC 4180) for a spreadsheet or a tender pack: the project's details,
 * the data and limits used and the cautions first, then one header row and one row per element,
 * every row of the schedule whatever the view's filter. Cells hold the text the schedule shows,
 * so the file and the screen agree figure for figure; a figure with no value is left empty.
 */
import type { ProjectDocument } from '../model/types.ts';
import { CAUTIONS } from '../model/cautions.ts';
import type { Results } from '../solver/results.ts';
import { STATUS_SHOWN } from '../solver/results.ts';
import type { Schedule } from './schedules.ts';

/** The byte order mark: without it, some spreadsheets read "mm²" and "Ω" in the wrong encoding. */
const BOM = '\uFEFF';
const NO_VALUE = '–';

/**
 * One field: quoted where it holds a comma, a quote or a line break (quotes doubled). Text that a
 * spreadsheet would run as a formula (it starts with =, +, -, @ or a tab) gets a leading
 * apostrophe, so a name typed into a drawing cannot act in the file's reader.
 */
export function csvField(value: string, text = true): string {
  const safe = text && /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

function line(fields: readonly string[], text = true): string {
  return fields.map((f) => csvField(f, text)).join(',');
}

/**
 * `note` (where the sheet has one) is written above the cautions. `statusLabel` heads the second column (after the id, as on screen): a load's own status, or for
 * cables and boards the status of the worst load they feed (what the schedule's glyph shows).
 * @example scheduleCsv('Cable schedule', cableSchedule(doc, results), doc, results)
 *   // "\uFEFFDropline cable schedule\r\nProject,…\r\n…\r\nId,Status,Cable,From,To,Length m,…"
 */
export function scheduleCsv(
  title: string,
  schedule: Schedule,
  doc: ProjectDocument,
  results: Results,
  statusLabel = 'Status',
  note?: string,
): string {
  const d = doc.details;
  const lines: string[] = [
    line([`Dropline ${title.toLowerCase()}`]),
    line(['Project', d.title]),
    line(['Client', d.client]),
    line(['Site', d.site]),
    line(['Reference', d.reference]),
    line(['Revision', d.revision]),
    line(['Date', d.date]),
    line(['Conductor data', `${results.dataSet.title} (${results.dataSet.id})`]),
    line(['Drop limits', results.profile.title]),
    line(['Standards and editions', results.references.join('; ')]),
    ...(note ? [line(['Note', note])] : []),
    ...CAUTIONS.map((c) => line(['Caution', c])),
    '',
    line(['Id', statusLabel, ...schedule.columns.map((c) => c.label)]),
  ];
  for (const row of schedule.rows) {
    const cells = schedule.columns.map((c) => {
      const shown = row.cells[c.id]?.text ?? '';
      return csvField(shown === NO_VALUE ? '' : shown, !c.numeric);
    });
    const status = row.status ? STATUS_SHOWN[row.status] : '';
    lines.push([csvField(row.id), csvField(status), ...cells].join(','));
  }
  return BOM + lines.join('\r\n') + '\r\n';
}

export { scheduleFileName } from './fileNames.ts';
