/**
 * The tender pack read back as a reviewer's PDF reader sees it: poppler's pdfinfo and pdftotext
 * (an outside reader, not our writer) give the page size, the page count and the text. Checked:
 * A3 landscape; every sheet framed with the title block, sheet n of N and the caution line; the
 * summary names the data set, limit profile, standards and all four cautions; the schedules hold
 * every row the editor's schedules hold; every finding is listed; the working holds each element's
 * records with the solver's own results; Unicode (Ω, Σ, mm², φ) survives; a project that keeps
 * alternatives gets the "Alternatives compared" sheet with the tables `dropline compare` prints, and
 * one that keeps none does not.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, test } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { solve } from '../../../src/solver/solve.ts';
import { CAUTIONS } from '../../../src/model/cautions.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import type { Results } from '../../../src/solver/results.ts';
import { SCHEDULE_SHEETS } from '../../../src/export/schedules.ts';
import { valueText } from '../../../src/export/working.ts';
import { packFontsFromDisk } from '../../../src/cli/run.ts';
import { PACK_METHODS, tenderPackBytes, tenderPackFileName } from '../../../src/export/pdf/tenderPack.ts';
import { compareAlternatives } from '../../../src/export/pdf/packComparison.ts';
import { comparisonTables, tableList } from '../../../src/export/comparison.ts';

/** The text of every page of a pack, as poppler reads it. */
function pdfPages(pack: Uint8Array): string[] {
  const file = join(mkdtempSync(join(tmpdir(), 'dropline-pack-')), 'pack.pdf');
  writeFileSync(file, pack);
  return execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' })
    .split('\f')
    .filter((p, k, all) => k < all.length - 1 || p.trim() !== '');
}

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

/** Whitespace folded to single spaces, so wrapped lines compare with the text they came from. */
const flat = (s: string) => s.replace(/\s+/g, ' ').trim();

let doc: ProjectDocument;
let results: Results;
let pages: string[];
let info: string;
let bytes: Uint8Array;

beforeAll(() => {
  doc = demo();
  results = solve(doc);
  bytes = tenderPackBytes(doc, results, packFontsFromDisk(), { madeAt: new Date('2026-12-02T10:00:00Z') });
  const file = join(mkdtempSync(join(tmpdir(), 'dropline-pack-')), 'pack.pdf');
  writeFileSync(file, bytes);
  info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  // -raw keeps the order text was drawn in, so a table cell's lines stay together.
  pages = execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' })
    .split('\f')
    .filter((p, k, all) => k < all.length - 1 || p.trim() !== '');
}, 60_000);

describe('the tender pack', () => {
  test('is a PDF of A3 landscape sheets, each framed with the title block and the caution line', () => {
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).toBe('%PDF-');
    // ISO 216 A3 is 420 × 297 mm = 1190.55 × 841.89 pt.
    expect(info).toMatch(/Page size:\s+1190\.55 x 841\.89 pts \(A3\)/);
    const count = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
    expect(count).toBe(pages.length);
    expect(count).toBeGreaterThan(6);
    pages.forEach((text, k) => {
      const t = flat(text);
      expect(t).toContain(`${k + 1} of ${count}`);
      expect(t).toContain('Design aid only.');
      expect(t).toContain('verified on site by a competent person');
      expect(t).toContain(doc.details.title);
      expect(t).toContain(doc.details.reference);
      expect(t).toContain('2026-12-02');
    });
  });

  test('has its sheets in order: diagram, summary, schedules, findings, working', () => {
    // Each sheet's heading is the first text drawn on its page.
    const firstPageOf = (title: string) => pages.findIndex((p) => p.trimStart().startsWith(title));
    const order = [
      'Single-line diagram',
      'Site plan',
      'Summary, data and cautions',
      'Cable schedule',
      'Loads',
      'Board schedule',
      'Expected test values',
      'Findings',
      'Working',
    ].map(firstPageOf);
    expect(order.every((p) => p >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  test('the summary names the data, the limits, the standards, the methods and every caution', () => {
    const summary = flat(pages.find((p) => p.trimStart().startsWith('Summary, data and cautions'))!);
    expect(summary).toContain(results.dataSet.title);
    expect(summary).toContain(results.profile.title);
    for (const r of results.references) expect(summary).toContain(flat(r));
    for (const c of CAUTIONS) expect(summary).toContain(flat(c));
    for (const m of PACK_METHODS) expect(summary).toContain(flat(m));
    // The demo's revision table, every row.
    expect(summary).toContain('Revisions');
    for (const r of doc.details.revisions ?? []) expect(summary).toContain(flat(r.description));
    expect(doc.details.revisions?.length).toBeGreaterThan(1);
    const loads = Object.values(results.loads);
    const over = loads.filter((l) => l.status === 'over').length;
    expect(summary).toContain(`${loads.length}: `);
    expect(summary).toContain(`${over} over`);
  });

  test('the schedules hold every row and figure the editor’s schedules show', () => {
    const all = flat(pages.join(' '));
    for (const sheet of Object.values(SCHEDULE_SHEETS)) {
      const schedule = sheet.build(doc, results);
      expect(schedule.rows.length).toBeGreaterThan(0);
      for (const row of schedule.rows) {
        for (const c of schedule.columns) {
          const text = row.cells[c.id]?.text ?? '';
          if (text.length > 0 && text.length < 30) expect(all).toContain(flat(text));
        }
      }
    }
    // Units the schedules print survive the font; a sheet with a note prints it.
    expect(all).toContain('mm²');
    expect(all).toContain(flat(SCHEDULE_SHEETS.tests.note!.slice(0, 80)));
  });

  test('every finding is listed with its message', () => {
    const all = flat(pages.join(' '));
    expect(results.findings.length).toBeGreaterThan(0);
    for (const f of results.findings) expect(all).toContain(flat(f.message));
  });

  test('the working shows each record’s formula and the solver’s result', () => {
    const all = flat(pages.join(' '));
    const over = Object.entries(results.loads).find(([, l]) => l.status === 'over');
    expect(over).toBeDefined();
    const [id, load] = over!;
    expect(all).toContain(`Load ${id}`);
    for (const w of load.working) {
      expect(all).toContain(flat(w.formula));
      expect(all).toContain(valueText(w.result.value, w.result.unit));
    }
    const cable = doc.cables[0]!;
    for (const w of results.cables[cable.id]!.working) expect(all).toContain(flat(w.title));
    expect(all).toMatch(/Ω/);
    expect(all).toMatch(/φ/);
  });

  test('the project’s alternatives are compared with the current design after the summary', () => {
    expect(doc.alternatives.length).toBeGreaterThan(0);
    const firstPageOf = (title: string) => pages.findIndex((p) => p.trimStart().startsWith(title));
    const at = firstPageOf('Alternatives compared');
    expect(at).toBeGreaterThan(firstPageOf('Summary, data and cautions'));
    expect(at).toBeLessThan(firstPageOf('Cable schedule'));
    const sheet = flat(pages.filter((p) => p.trimStart().startsWith('Alternatives compared')).join(' '));
    for (const alt of doc.alternatives) expect(sheet).toContain(`Current design against “${alt.name}”`);
    // The same tables `dropline compare` prints: every short cell of every table is on the sheet.
    for (const c of compareAlternatives(doc, results)) {
      for (const t of tableList(comparisonTables(c))) {
        expect(sheet).toContain(t.title);
        const cells = t.rows.length > 0 ? [...t.headers, ...t.rows.flat()] : [t.empty];
        for (const cell of cells)
          if (cell.length > 0 && cell.length < 30) expect(sheet).toContain(flat(cell));
      }
    }
    // The conductor-metal working once, with the densities and their sources.
    expect(sheet.match(/Conductor metal: working/g)).toHaveLength(1);
    expect(sheet).toContain('ρ Cu = 8890 kg/m³ (IEC 60028');
    expect(sheet).toContain('ρ Al = 2703 kg/m³ (IEC 60889');
  });

  test('a project that keeps no alternatives has no comparison sheet', () => {
    const alone = { ...doc, alternatives: [] };
    const text = pdfPages(tenderPackBytes(alone, solve(alone), packFontsFromDisk(), { working: false }));
    expect(text.some((p) => p.includes('Alternatives compared'))).toBe(false);
    expect(text.some((p) => p.trimStart().startsWith('Summary, data and cautions'))).toBe(true);
  });

  test('the site plan sheet places every element and labels each sub-main with its measured length', () => {
    const sheet = flat(pages.find((p) => p.trimStart().startsWith('Site plan'))!);
    for (const n of doc.nodes) expect(sheet).toContain(n.id);
    for (const c of doc.cables.filter((x) => doc.nodes.find((n) => n.id === x.to)?.kind !== 'load'))
      expect(sheet).toContain(`${c.id} ${c.lengthM.toFixed(1)} m`);
    expect(sheet).toContain('length = Σ (|Δx| + |Δy|) + allowance, rounded up to 0.1 m');
    // The demo's picture is SVG, which the pack made outside the editor says it leaves out.
    expect(sheet).toContain('make the pack in the editor to include it');
  });

  test('a PNG plan picture is placed on the plan sheet; a project with nothing on a plan has no such sheet', () => {
    // A 2 × 1 pixel PNG (signature, IHDR, IDAT and IEND chunks, made with zlib).
    const png =
      'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAIAAAABCAIAAAB7QOjdAAAAD0lEQVR4nGM4wcXFdYILAAbJAbkUv7uOAAAAAElFTkSuQmCC';
    const withPng = { ...doc, alternatives: [], plan: { image: png, widthM: 130 } };
    const file = join(mkdtempSync(join(tmpdir(), 'dropline-pack-')), 'plan.pdf');
    writeFileSync(file, tenderPackBytes(withPng, results, packFontsFromDisk(), { working: false }));
    const images = execFileSync('pdfimages', ['-list', file], { encoding: 'utf8' })
      .trim()
      .split('\n')
      .slice(2);
    expect(images).toHaveLength(1);
    expect(images[0]).toMatch(/^\s*2\s+0\s+image\s+2\s+1\s/);
    const unplaced = {
      ...doc,
      alternatives: [],
      nodes: doc.nodes.map(({ plan: _p, ...n }) => n as typeof n),
    } as ProjectDocument;
    const text = pdfPages(tenderPackBytes(unplaced, results, packFontsFromDisk(), { working: false }));
    expect(text.some((p) => p.trimStart().startsWith('Site plan'))).toBe(false);
  });

  test('can leave the working out', () => {
    const short = tenderPackBytes(doc, results, packFontsFromDisk(), { working: false });
    expect(short.length).toBeLessThan(bytes.length);
  });

  test('is named after the project reference and revision', () => {
    expect(tenderPackFileName(doc)).toBe(
      `${doc.details.reference.replace(/[^\w.-]+/g, '-')}-rev-${doc.details.revision}-tender-pack.pdf`,
    );
    expect(tenderPackFileName({ ...doc, details: { ...doc.details, reference: '', revision: '' } })).toMatch(
      /-tender-pack\.pdf$/,
    );
  });
});
