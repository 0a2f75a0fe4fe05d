/**
 * The PDF single-line diagram (src/export/pdf/diagram.ts), drawn from the demo project:
 * - every line, rectangle, circle and piece of text lies inside the box it was given, labels print
 *   at 4 pt or more and no piece of text covers another;
 * - every cable is drawn along the editor's route (bottom centre of its sending node, across at
 *   mid-height, top centre of its receiving node, at the returned scale), in its own status's
 *   colour, line width and dash;
 * - read back with pdftotext (poppler), the page names every node and cable by id and prints each
 *   load's status glyph with its cumulative drop as the solver gives it;
 * - an empty document, a cable to a missing node and a node without a position draw without
 *   throwing; a box too small for legible labels leaves them out, printing ids alone where they
 *   fit and no text at all where they do not.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { drawDiagram, type Box } from '../../../src/export/pdf/diagram.ts';
import { STATUS_LOOK } from '../../../src/export/statusLook.ts';
import { NODE_SIZE } from '../../../src/model/layout.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import type { Position, ProjectDocument } from '../../../src/model/types.ts';
import { solve } from '../../../src/solver/solve.ts';
import { FONT, PT_MM, inside, newPdf, pageText, record } from './pdfRecord.ts';

/** The sheet content area of an A3 landscape page with a frame and title block. */
const BOX: Box = { x: 14, y: 22, w: 392, h: 225 };

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

function hex(colour: string): [number, number, number] {
  const n = Number.parseInt(colour.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function sameColour(a: string, b: string): boolean {
  const [p, q] = [hex(a), hex(b)];
  return p.every((c, i) => Math.abs(c - q[i]!) <= 2);
}

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

describe('drawDiagram on the demo project', () => {
  const doc = demo();
  const results = solve(doc);
  const pdf = newPdf();
  const marks = record(pdf);
  const out = drawDiagram(pdf, doc, results, BOX, FONT);

  test('draws labels at a legible size and keeps every mark inside the box', () => {
    expect(out.labels).toBe(true);
    expect(out.scale).toBeGreaterThan(0);
    for (const kind of ['line', 'rect', 'circle', 'text'] as const) {
      expect(marks.filter((m) => m.kind === kind).length, kind).toBeGreaterThan(0);
    }
    const outside = marks.filter((m) => !inside(m.box, BOX, 0.5));
    expect(outside.map((m) => `${m.kind} ${m.text ?? ''} ${JSON.stringify(m.box)}`)).toEqual([]);
    for (const m of marks.filter((m) => m.kind === 'text'))
      expect(m.box.h / PT_MM).toBeGreaterThanOrEqual(3.99);
  });

  test('no piece of text covers another', () => {
    const texts = marks.filter((m) => m.kind === 'text');
    const shrink = (b: Box): Box => ({ x: b.x + 0.05, y: b.y + 0.05, w: b.w - 0.1, h: b.h - 0.1 });
    const clash = (a: Box, b: Box) =>
      a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
    const pairs = texts.flatMap((a, i) =>
      texts
        .slice(i + 1)
        .filter((b) => clash(shrink(a.box), shrink(b.box)))
        .map((b) => `${a.text} / ${b.text}`),
    );
    expect(pairs).toEqual([]);
  });

  test('routes each cable from its nodes at the returned scale, in its own status style', () => {
    // The first board's outline is its box: the anchor from which every other point follows.
    const s = out.scale;
    const board = doc.nodes.find((n) => n.kind === 'board')!;
    const outline = marks.find(
      (m) =>
        m.kind === 'rect' &&
        Math.abs(m.box.w - NODE_SIZE.board.width * s) < 1e-6 &&
        Math.abs(m.box.h - NODE_SIZE.board.height * s) < 1e-6,
    )!;
    const page = (x: number, y: number) => ({
      x: outline.box.x + (x - board.position.x) * s,
      y: outline.box.y + (y - board.position.y) * s,
    });
    const size = (id: string) => NODE_SIZE[doc.nodes.find((n) => n.id === id)!.kind];
    const pos = (id: string): Position => doc.nodes.find((n) => n.id === id)!.position;
    const near = (a: number, b: number) => Math.abs(a - b) < 1e-6;
    const k = Math.min(s, 0.25);

    for (const c of doc.cables) {
      const from = page(pos(c.from).x + size(c.from).width / 2, pos(c.from).y + size(c.from).height);
      const to = page(pos(c.to).x + size(c.to).width / 2, pos(c.to).y);
      const mid = (from.y + to.y) / 2;
      const look = STATUS_LOOK[results.cables[c.id]!.status ?? 'none'];
      const dash = look.dash ? look.dash.split(' ').map((d) => Number(d) * k) : [];
      const styled = marks.filter(
        (m) =>
          m.kind === 'line' &&
          sameColour(m.colour!, look.colour) &&
          near(m.width!, look.strokeWidth * k) &&
          m.dash!.length === dash.length &&
          m.dash!.every((d, i) => near(d, dash[i]!)),
      );
      const has = (x1: number, y1: number, x2: number, y2: number) =>
        styled.some(
          ({ ends: e }) => near(e![0], x1) && near(e![1], y1) && near(e![2], x2) && near(e![3], y2),
        );
      expect(has(from.x, from.y, from.x, mid), `${c.id} leaves ${c.from}`).toBe(true);
      expect(has(from.x, mid, to.x, mid), `${c.id} goes across`).toBe(true);
      expect(has(to.x, mid, to.x, to.y), `${c.id} enters ${c.to}`).toBe(true);
    }
  });

  test('the page names every node and cable and prints each load’s cumulative drop', () => {
    const text = pageText(pdf);
    for (const id of [...doc.nodes.map((n) => n.id), ...doc.cables.map((c) => c.id)]) {
      expect(text, id).toMatch(new RegExp(`(^|\\s)${escape(id)}(\\s|$)`, 'm'));
    }
    for (const n of doc.nodes.filter((n) => n.kind === 'load')) {
      const r = results.loads[n.id]!;
      const glyph = STATUS_LOOK[r.status ?? 'none'].glyph;
      expect(text, n.id).toMatch(new RegExp(`${escape(glyph)}\\s+Σ ${r.cumulativePct.value.toFixed(2)} %`));
    }
    for (const word of ['clear', 'tight', 'over', 'no result']) expect(text).toContain(word);
  });
});

describe('drawDiagram on awkward documents', () => {
  const base = demo();

  test('an empty document draws nothing', () => {
    const doc = { ...base, nodes: [], cables: [] };
    const pdf = newPdf();
    const marks = record(pdf);
    expect(drawDiagram(pdf, doc, solve(doc), BOX, FONT)).toEqual({ scale: 0, labels: false });
    expect(marks).toEqual([]);
  });

  test('a cable to a missing node and a node without a position are left out', () => {
    const ghost = { ...base.cables[0]!, id: 'CX', from: 'MB', to: 'NOWHERE' };
    const doc: ProjectDocument = {
      ...base,
      nodes: base.nodes.map((n) =>
        n.id === 'L29' ? { ...n, position: undefined as unknown as Position } : n,
      ),
      cables: [...base.cables, ghost],
    };
    const pdf = newPdf();
    const marks = record(pdf);
    const out = drawDiagram(pdf, doc, solve(doc), BOX, FONT);
    expect(out.scale).toBeGreaterThan(0);
    const texts = marks.filter((m) => m.kind === 'text').map((m) => m.text);
    expect(texts).not.toContain('CX');
    expect(texts).not.toContain('L29');
    expect(texts).not.toContain('C34');
    expect(marks.every((m) => inside(m.box, BOX, 0.5))).toBe(true);
  });

  test('a box too small for labels at 4 pt still names each element by id where ids fit', () => {
    // About 3 pt labels: the ids alone print at 4 pt.
    const mid: Box = { x: 10, y: 10, w: 280, h: 168 };
    const pdf = newPdf();
    const marks = record(pdf);
    const out = drawDiagram(pdf, base, solve(base), mid, FONT);
    expect(out.labels).toBe(false);
    const ids = [...base.nodes.map((n) => n.id), ...base.cables.map((c) => c.id)];
    const keyWords = Object.values(STATUS_LOOK).map((l) => `${l.glyph} ${l.word}`);
    const texts = marks.filter((m) => m.kind === 'text' && !keyWords.includes(m.text!));
    expect(texts.map((m) => m.text).sort()).toEqual([...ids].sort());
    for (const m of texts) expect(m.box.h / PT_MM).toBeCloseTo(4, 6);
    expect(marks.every((m) => inside(m.box, mid, 0.5))).toBe(true);
  });

  test('a tiny box leaves the labels out and stays inside', () => {
    const small: Box = { x: 20, y: 20, w: 40, h: 25 };
    const pdf = newPdf();
    const marks = record(pdf);
    const out = drawDiagram(pdf, base, solve(base), small, FONT);
    expect(out.labels).toBe(false);
    expect(out.scale).toBeGreaterThan(0);
    expect(marks.filter((m) => m.kind === 'text')).toEqual([]);
    expect(marks.every((m) => inside(m.box, small, 0.5))).toBe(true);
  });
});
