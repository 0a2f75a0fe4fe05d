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
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { jsPDF, type TextOptionsLight } from 'jspdf';
import { afterAll, describe, expect, test } from 'vitest';
import { drawDiagram, type Box } from '../../../src/export/pdf/diagram.ts';
import { STATUS_LOOK } from '../../../src/export/statusLook.ts';
import { NODE_SIZE } from '../../../src/model/layout.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import type { Position, ProjectDocument } from '../../../src/model/types.ts';
import { solve } from '../../../src/solver/solve.ts';

const FONT = 'DejaVu';
const FONT_FILES = {
  normal: readFileSync('public/fonts/DejaVuSansCondensed.ttf').toString('base64'),
  bold: readFileSync('public/fonts/DejaVuSansCondensed-Bold.ttf').toString('base64'),
};
/** The sheet content area of an A3 landscape page with a frame and title block. */
const BOX: Box = { x: 14, y: 22, w: 392, h: 225 };
const PT_MM = 25.4 / 72;
const dirs: string[] = [];

afterAll(() => {
  for (const d of dirs) rmSync(d, { recursive: true, force: true });
});

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

function newPdf(): jsPDF {
  const pdf = new jsPDF({ orientation: 'landscape', unit: 'mm', format: 'a3' });
  for (const style of ['normal', 'bold'] as const) {
    pdf.addFileToVFS(`${FONT}-${style}.ttf`, FONT_FILES[style]);
    pdf.addFont(`${FONT}-${style}.ttf`, FONT, style);
  }
  return pdf;
}

interface Mark {
  kind: 'line' | 'rect' | 'circle' | 'text';
  box: Box;
  /** For lines: the end points and the stroke in force. */
  ends?: [number, number, number, number];
  colour?: string;
  width?: number;
  dash?: number[];
  text?: string;
}

/** Wraps the drawing primitives of `pdf` so every call is recorded with its extent on the page. */
function record(pdf: jsPDF): Mark[] {
  const marks: Mark[] = [];
  let dash: number[] = [];
  const setDash = pdf.setLineDashPattern.bind(pdf);
  pdf.setLineDashPattern = (d: number[], phase: number) => {
    dash = [...d];
    return setDash(d, phase);
  };
  const line = pdf.line.bind(pdf);
  pdf.line = (x1: number, y1: number, x2: number, y2: number, style?: string | null) => {
    marks.push({
      kind: 'line',
      box: { x: Math.min(x1, x2), y: Math.min(y1, y2), w: Math.abs(x2 - x1), h: Math.abs(y2 - y1) },
      ends: [x1, y1, x2, y2],
      colour: pdf.getDrawColor(),
      width: pdf.getLineWidth(),
      dash,
    });
    return line(x1, y1, x2, y2, style);
  };
  const rect = pdf.rect.bind(pdf);
  pdf.rect = (x: number, y: number, w: number, h: number, style?: string | null) => {
    marks.push({ kind: 'rect', box: { x, y, w, h } });
    return rect(x, y, w, h, style);
  };
  const circle = pdf.circle.bind(pdf);
  pdf.circle = (x: number, y: number, r: number, style?: string | null) => {
    marks.push({ kind: 'circle', box: { x: x - r, y: y - r, w: 2 * r, h: 2 * r } });
    return circle(x, y, r, style);
  };
  const text = pdf.text.bind(pdf) as (t: string, x: number, y: number, o?: TextOptionsLight) => jsPDF;
  (pdf as { text: unknown }).text = (t: string, x: number, y: number, o?: TextOptionsLight) => {
    const h = pdf.getFontSize() * PT_MM;
    const w = pdf.getTextWidth(t);
    const top = o?.baseline === 'top' ? y : o?.baseline === 'middle' ? y - h / 2 : y - 0.8 * h;
    const left = o?.align === 'center' ? x - w / 2 : o?.align === 'right' ? x - w : x;
    marks.push({ kind: 'text', box: { x: left, y: top, w, h }, text: t });
    return text(t, x, y, o);
  };
  return marks;
}

function inside(b: Box, box: Box, tol: number): boolean {
  return (
    b.x >= box.x - tol &&
    b.y >= box.y - tol &&
    b.x + b.w <= box.x + box.w + tol &&
    b.y + b.h <= box.y + box.h + tol
  );
}

function pageText(pdf: jsPDF): string {
  const dir = mkdtempSync(join(tmpdir(), 'dropline-diagram-'));
  dirs.push(dir);
  const file = join(dir, 'diagram.pdf');
  writeFileSync(file, Buffer.from(pdf.output('arraybuffer')));
  return execFileSync('pdftotext', ['-layout', file, '-'], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'ignore'],
  });
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
