/**
 * A single-line diagram too large for one sheet (src/export/pdf/diagramSheets.ts and
 * diagramWindow.ts), on a 1,000-element network laid out as the editor's tidy layout does:
 * - the demo project still goes on one sheet, exactly as drawDiagram draws it;
 * - the large network goes on several windows, named by column letter and row number, at a scale
 *   where labels print at 4 pt or more; every node's centre lies in a window and every label lies
 *   whole in one;
 * - on each window sheet every piece of text prints at 4 pt or more, inside the box, clear of the
 *   others, and each continuation note names the sheet that holds the drawing beyond that edge;
 * - read back with pdftotext, the window sheets carry the status key and name every node and
 *   cable by id; the key plan names every window;
 * - the tender pack carries the key plan and then one sheet per window, and its diagram sheets
 *   name every node and cable by id;
 * - a drawing taller than a sheet (the same network cut into strips and stacked) goes on a grid
 *   of several columns and rows, with the same checks.
 */
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, test } from 'vitest';
import { randomNetwork } from '../../../bench/randomNetwork.ts';
import { packFontsFromDisk } from '../../../src/cli/run.ts';
import { drawDiagram, type Box } from '../../../src/export/pdf/diagram.ts';
import { drawKeyPlan, planDiagramSheets, type DiagramSheets } from '../../../src/export/pdf/diagramSheets.ts';
import { drawDiagramWindow } from '../../../src/export/pdf/diagramWindow.ts';
import { tenderPackBytes } from '../../../src/export/pdf/tenderPack.ts';
import { NODE_SIZE, tidyPositions } from '../../../src/model/layout.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import type { Results } from '../../../src/solver/results.ts';
import { solve } from '../../../src/solver/solve.ts';
import { FONT, PT_MM, clash, inside, newPdf, pdfPages, record, type Mark } from './pdfRecord.ts';

/** The tender pack's sheet content box (A3 landscape, frame, heading and title block). */
const BOX: Box = { x: 14, y: 25, w: 392, h: 222 };

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

function large(): ProjectDocument {
  const doc = randomNetwork(1000, 7);
  const pos = tidyPositions(doc);
  for (const n of doc.nodes) n.position = pos[n.id]!;
  return doc;
}

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const names = (text: string, id: string): boolean =>
  new RegExp(`(^|\\s)${escape(id)}(\\s|$)`, 'm').test(text);

describe('the demo project', () => {
  test('goes on one sheet, drawn as before', () => {
    const doc = demo();
    const results = solve(doc);
    const plan = planDiagramSheets(newPdf(), doc, results, BOX, FONT);
    expect(plan.windows).toEqual([]);
    expect(plan.layout).toBeNull();
    const out = drawDiagram(newPdf(), doc, results, BOX, FONT);
    expect(out.labels).toBe(true);
    expect(plan.scale).toBe(out.scale);
  });

  test('its tender pack has one diagram sheet and no key plan', () => {
    const doc = demo();
    const pages = pdfPages(tenderPackBytes(doc, solve(doc), packFontsFromDisk(), { working: false }));
    expect(pages[0]!.trimStart().startsWith('Single-line diagram\n')).toBe(true);
    expect(pages.filter((p) => p.includes('Single-line diagram:'))).toEqual([]);
  });
});

/** The window sheets of `build()`'s document, drawn one per page with the spy on. */
interface Drawn {
  doc: ProjectDocument;
  results: Results;
  plan: DiagramSheets;
  /** Each window sheet's marks, in the order of plan.windows. */
  sheets: Mark[][];
  /** Each window sheet's text as pdftotext reads it. */
  text: string[];
}

function drawSheets(doc: ProjectDocument): Drawn {
  const results = solve(doc);
  const pdf = newPdf();
  const plan = planDiagramSheets(pdf, doc, results, BOX, FONT);
  const marks = record(pdf);
  const sheets = plan.windows.map((w, k) => {
    if (k > 0) pdf.addPage('a3', 'landscape');
    const from = marks.length;
    drawDiagramWindow(pdf, plan.layout!, w, BOX, FONT, plan.windows);
    return marks.slice(from);
  });
  return { doc, results, plan, sheets, text: pdfPages(new Uint8Array(pdf.output('arraybuffer'))) };
}

/** The checks every split drawing passes. */
function splitChecks(get: () => Drawn): void {
  test('is split over several windows named by column and row, at a legible scale', () => {
    const { plan } = get();
    expect(plan.windows.length).toBeGreaterThan(1);
    expect(plan.layout).not.toBeNull();
    const ids = plan.windows.map((w) => w.name);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(id).toMatch(/^[A-Z]+[1-9]\d*$/);
    // Labels are EM = 14 canvas units high: at this scale they print at 4 pt or more.
    expect((14 * plan.scale) / PT_MM).toBeGreaterThanOrEqual(4);
    expect(plan.layout!.plan.mode).toBe('full');
    // Each window fills the drawing area above the key band at the sheet's scale.
    for (const w of plan.windows) expect(w.w * plan.scale).toBeLessThanOrEqual(BOX.w + 1e-6);
  });

  test('every node’s centre lies in a window, and every label lies whole in one', () => {
    const { doc, plan } = get();
    const lost = doc.nodes.filter((n) => {
      const size = NODE_SIZE[n.kind];
      const [cx, cy] = [n.position.x + size.width / 2, n.position.y + size.height / 2];
      return !plan.windows.some((w) => cx > w.x && cx < w.x + w.w && cy > w.y && cy < w.y + w.h);
    });
    expect(lost.map((n) => n.id)).toEqual([]);
    expect(plan.unplaced).toEqual([]);
  });

  test('each sheet’s text prints at 4 pt or more, inside the box, clear of the rest', () => {
    const { plan, sheets } = get();
    sheets.forEach((marks, k) => {
      const texts = marks.filter((m) => m.kind === 'text');
      expect(texts.length, plan.windows[k]!.name).toBeGreaterThan(20);
      for (const m of texts) {
        expect(m.box.h / PT_MM, m.text).toBeGreaterThanOrEqual(3.99);
        expect(inside(m.box, BOX, 0.01), `${plan.windows[k]!.name} ${m.text}`).toBe(true);
      }
      const inked = texts.filter((m) => m.text!.trim() !== '');
      const pairs = inked.flatMap((a, i) =>
        inked
          .slice(i + 1)
          .filter((b) => clash(a.box, b.box))
          .map((b) => `${a.text} / ${b.text}`),
      );
      expect(pairs, plan.windows[k]!.name).toEqual([]);
    });
  });

  test('each sheet carries the status key and names every node and cable', () => {
    const { doc, plan, text: pages } = get();
    for (const text of pages.slice(0, plan.windows.length))
      for (const word of ['clear', 'tight', 'over', 'no result']) expect(text).toContain(word);
    const all = pages.join('\n');
    const missing = [...doc.nodes, ...doc.cables].map((e) => e.id).filter((id) => !names(all, id));
    expect(missing).toEqual([]);
  });

  test('continuation notes name the sheet that holds the drawing beyond that edge', () => {
    const { plan, sheets } = get();
    const byName = new Map(plan.windows.map((w) => [w.name, w]));
    let count = 0;
    sheets.forEach((marks, k) => {
      const here = plan.windows[k]!;
      for (const m of marks.filter((m) => m.kind === 'text' && /^[←→↑↓] [A-Z]+\d+$/.test(m.text!))) {
        count++;
        const [arrow, name] = m.text!.split(' ') as [string, string];
        const there = byName.get(name);
        expect(there, m.text).toBeDefined();
        expect(name).not.toBe(here.name);
        // The sheet named holds the edge the cable leaves by.
        if (arrow === '→')
          expect(there!.x < here.x + here.w && there!.x + there!.w > here.x + here.w).toBe(true);
        if (arrow === '←') expect(there!.x < here.x && there!.x + there!.w > here.x).toBe(true);
        if (arrow === '↓')
          expect(there!.y < here.y + here.h && there!.y + there!.h > here.y + here.h).toBe(true);
        if (arrow === '↑') expect(there!.y < here.y && there!.y + there!.h > here.y).toBe(true);
      }
    });
    expect(count).toBeGreaterThanOrEqual(plan.windows.length);
  });

  test('the key plan names every window', () => {
    const { doc, results, plan } = get();
    const pdf = newPdf();
    const marks = record(pdf);
    drawKeyPlan(pdf, doc, results, BOX, FONT, plan.windows);
    const texts = marks.filter((m) => m.kind === 'text');
    for (const w of plan.windows) {
      const name = texts.find((m) => m.text === w.name);
      expect(name, w.name).toBeDefined();
      expect(name!.box.h / PT_MM).toBeGreaterThanOrEqual(4);
    }
    for (const m of texts) expect(inside(m.box, BOX, 0.01), m.text).toBe(true);
    const text = pdfPages(new Uint8Array(pdf.output('arraybuffer'))).join('\n');
    for (const w of plan.windows) expect(names(text, w.name), w.name).toBe(true);
  });
}

describe('a 1,000-element network', () => {
  let drawn: Drawn;
  beforeAll(() => {
    drawn = drawSheets(large());
  }, 30_000);
  splitChecks(() => drawn);

  test('lies in one row of windows, as wide as the tidy layout is', () => {
    expect(drawn.plan.windows.every((w) => w.name.endsWith('1'))).toBe(true);
  });

  test('the tender pack has the key plan, then a sheet per window naming every node and cable', () => {
    const { doc, results, plan } = drawn;
    const pages = pdfPages(tenderPackBytes(doc, results, packFontsFromDisk(), { working: false }));
    const titles = pages.map((p) => p.trimStart().split('\n')[0]!.trim());
    const diagram = [
      'Single-line diagram: key plan',
      ...plan.windows.map((w) => `Single-line diagram: sheet ${w.name}`),
    ];
    expect(titles.slice(0, diagram.length)).toEqual(diagram);
    expect(titles[diagram.length]).toBe('Summary, data and cautions');
    const text = pages.slice(1, diagram.length).join('\n');
    const missing = [...doc.nodes, ...doc.cables].map((e) => e.id).filter((id) => !names(text, id));
    expect(missing).toEqual([]);
  }, 30_000);
});

describe('a drawing taller than a sheet', () => {
  let drawn: Drawn;
  beforeAll(() => {
    // The tidy layout of 600 elements cut into strips and stacked: several rows of windows.
    const doc = randomNetwork(600, 4);
    const pos = tidyPositions(doc);
    for (const n of doc.nodes) {
      const band = Math.floor(pos[n.id]!.x / 4000);
      n.position = { x: pos[n.id]!.x - band * 4000, y: pos[n.id]!.y + band * 1600 };
    }
    drawn = drawSheets(doc);
  }, 30_000);
  splitChecks(() => drawn);

  test('goes on a grid of columns and rows, with notes across the top and bottom edges', () => {
    const names = drawn.plan.windows.map((w) => w.name);
    expect(names).toContain('A1');
    expect(names).toContain('A2');
    expect(names).toContain('B1');
    const notes = drawn.sheets.flat().filter((m) => m.kind === 'text' && /^[↑↓] /.test(m.text!));
    expect(notes.length).toBeGreaterThan(0);
  });
});
