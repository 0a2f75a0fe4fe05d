import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { csvField, scheduleCsv, scheduleFileName } from '../../../src/export/scheduleCsv.ts';
import { boardSchedule, cableSchedule } from '../../../src/export/schedules.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { solve } from '../../../src/solver/solve.ts';
import { CAUTIONS } from '../../../src/model/cautions.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

/**
 * A reader written from RFC 4180 section 2 (fields split by commas, records by CRLF, a quoted
 * field may hold commas, line breaks and doubled quotes), to read the file back as a spreadsheet
 * would.
 */
function readCsv(text: string): string[][] {
  const records: string[][] = [];
  let field = '';
  let record: string[] = [];
  let quoted = false;
  for (let k = 0; k < text.length; k++) {
    const c = text[k]!;
    if (quoted) {
      if (c === '"' && text[k + 1] === '"') {
        field += '"';
        k++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      record.push(field);
      field = '';
    } else if (c === '\r' && text[k + 1] === '\n') {
      record.push(field);
      records.push(record);
      record = [];
      field = '';
      k++;
    } else field += c;
  }
  if (field !== '' || record.length) records.push([...record, field]);
  return records;
}

describe('schedule as CSV', () => {
  test('fields are quoted as RFC 4180 section 2 rules 5–7 ask', () => {
    // RFC 4180 §2: a field holding a comma, a double quote or a line break is quoted; a quote
    // inside is doubled.
    expect(csvField('plain')).toBe('plain');
    expect(csvField('Sub-main, store')).toBe('"Sub-main, store"');
    expect(csvField('6" duct')).toBe('"6"" duct"');
    expect(csvField('line\r\nbreak')).toBe('"line\r\nbreak"');
  });

  test('a name a spreadsheet would run as a formula is kept as text', () => {
    // Common practice for files opened in spreadsheets (formula injection): a leading = + - @
    // in a text cell gets an apostrophe. Numbers are left as they are.
    expect(csvField('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvField('@sum')).toBe("'@sum");
    expect(csvField('-0.25', false)).toBe('-0.25');
  });

  test('the demo cable schedule reads back with its details, cautions and every row', () => {
    const doc = demo();
    const results = solve(doc);
    const schedule = cableSchedule(doc, results);
    const text = scheduleCsv('Cable schedule', schedule, doc, results, 'Status (worst load fed)');
    expect(text.startsWith('\uFEFF')).toBe(true);
    const rows = readCsv(text.slice(1));
    expect(rows[0]).toEqual(['Dropline cable schedule']);
    expect(rows.find((r) => r[0] === 'Project')?.[1]).toBe(doc.details.title);
    expect(rows.find((r) => r[0] === 'Drop limits')?.[1]).toBe(results.profile.title);
    expect(rows.filter((r) => r[0] === 'Caution').map((r) => r[1])).toEqual([...CAUTIONS]);
    const head = rows.findIndex((r) => r[0] === 'Id');
    expect(rows[head]).toEqual(['Id', 'Status (worst load fed)', ...schedule.columns.map((c) => c.label)]);
    const body = rows.slice(head + 1);
    expect(body.map((r) => r[0])).toEqual(doc.cables.map((c) => c.id));
    // A row carries the solver's figures as the schedule shows them, its status in our words.
    const row = body.find((r) => r[0] === doc.cables[3]!.id)!;
    const shown = schedule.rows[3]!;
    const at = (id: string) => 2 + schedule.columns.findIndex((c) => c.id === id);
    expect(row[at('ib')]).toBe(shown.cells.ib!.text);
    expect(Number(row[at('cumPct')])).toBeCloseTo(results.cables[shown.id]!.cumulativePct.value, 2);
    // The segment drop is a number a spreadsheet can add, its basis in the next column.
    const drop = results.cables[shown.id]!.dropPct;
    expect(Number(row[at('dropPct')])).toBeCloseTo(drop.value, 2);
    expect(row[at('dropBasis')]).toBe(drop.basis);
    const bases = new Set(body.map((r) => r[at('dropBasis')]));
    expect([...bases].sort()).toEqual(['U0', 'ULL']);
    expect(row[1]).toBe({ within: 'clear', close: 'tight', over: 'over' }[shown.status!]);
  });

  test('a figure with no value is an empty cell, not a dash', () => {
    const doc = demo();
    const results = solve(doc);
    const schedule = boardSchedule(doc, results);
    const rows = readCsv(scheduleCsv('Board schedule', schedule, doc, results).slice(1));
    const supply = rows.find((r) => r[0] === doc.nodes.find((n) => n.kind === 'supply')!.id)!;
    // The supply has no incoming cable.
    expect(supply[2 + schedule.columns.findIndex((c) => c.id === 'cable')]).toBe('');
    expect(rows.flat()).not.toContain('–');
  });

  test('the file is named after the project reference', () => {
    const doc = demo();
    expect(scheduleFileName(doc, 'Cable schedule')).toBe(`${doc.details.reference}-cable-schedule.csv`);
  });
});
