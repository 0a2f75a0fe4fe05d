/**
 * The single-line diagram as SVG (src/export/svg/diagramSvg.ts), from the demo project:
 * - it parses as XML (jsdom's DOMParser) into one <svg> with a viewBox in millimetres;
 * - its drawing is the PDF's: the same lines, rectangles, circles and text, in the same order, at
 *   the same places, as drawDiagram makes on the pack's diagram sheet, recorded with the spy in
 *   pdfRecord.ts (text at the baseline jsPDF's text() puts it on);
 * - every node and cable id is a text of its own, each cable's run across carries its status's
 *   colour, width and dash from STATUS_LOOK, and the heading names the project, the data used and
 *   the caution;
 * - a name with markup characters is escaped and reads back as typed; a drawing too large for
 *   legible labels on A3 is drawn whole at 4 pt or more; an empty document still makes a drawing.
 */
import { readFileSync } from 'node:fs';
import { JSDOM } from 'jsdom';
import { describe, expect, test } from 'vitest';
import { randomNetwork } from '../../../bench/randomNetwork.ts';
import { packFontsFromDisk } from '../../../src/cli/run.ts';
import { drawingFileName } from '../../../src/export/fileNames.ts';
import { drawDiagram, fitDiagram } from '../../../src/export/pdf/diagram.ts';
import { CONTENT } from '../../../src/export/pdf/packPage.ts';
import { STATUS_LOOK } from '../../../src/export/statusLook.ts';
import { SVG_CAUTION, diagramSvg } from '../../../src/export/svg/diagramSvg.ts';
import { tidyPositions } from '../../../src/model/layout.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import { solve } from '../../../src/solver/solve.ts';
import { FONT, PT_MM, newPdf, record, type Mark } from './pdfRecord.ts';

const fonts = packFontsFromDisk();
const { DOMParser } = new JSDOM('').window;
/** SVG numbers are written to a thousandth of a millimetre. */
const TOL = 0.0015;

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

/** The SVG parsed as XML; throws when the parser reports an error. */
function parse(svg: string): Element {
  const xml = new DOMParser().parseFromString(svg, 'image/svg+xml');
  const error = xml.getElementsByTagName('parsererror')[0];
  if (error) throw new Error(error.textContent ?? 'parser error');
  return xml.documentElement;
}

const n = (e: Element, name: string): number => Number(e.getAttribute(name));
const near = (a: number, b: number): boolean => Math.abs(a - b) <= TOL;

/** The texts of the drawing, as read back. */
function texts(root: Element): string[] {
  return Array.from(root.getElementsByTagName('text'), (t) => t.textContent ?? '');
}

/** jsPDF's text(): where a baseline option puts the alphabetic baseline (line height factor 1.15). */
function baselineY(m: Mark): number {
  const h = m.box.h;
  const shift = m.baseline === 'top' ? 0.85 * h : m.baseline === 'middle' ? 0.35 * h : 0;
  return m.at![1] + shift;
}

/** Whether an SVG element draws what the PDF spy recorded for `m`. */
function same(e: Element, m: Mark): boolean {
  if (e.tagName !== m.kind) return false;
  const b = m.box;
  if (m.kind === 'line') {
    const [x1, y1, x2, y2] = m.ends!;
    return near(n(e, 'x1'), x1) && near(n(e, 'y1'), y1) && near(n(e, 'x2'), x2) && near(n(e, 'y2'), y2);
  }
  if (m.kind === 'rect')
    return (
      near(n(e, 'x'), b.x) && near(n(e, 'y'), b.y) && near(n(e, 'width'), b.w) && near(n(e, 'height'), b.h)
    );
  if (m.kind === 'circle')
    return near(n(e, 'cx'), b.x + b.w / 2) && near(n(e, 'cy'), b.y + b.h / 2) && near(n(e, 'r'), b.w / 2);
  return (
    e.textContent === m.text &&
    near(n(e, 'x'), m.at![0]) &&
    near(n(e, 'y'), baselineY(m)) &&
    near(n(e, 'font-size'), b.h) &&
    (e.getAttribute('font-weight') === 'bold') === m.bold
  );
}

describe('the demo project as SVG', () => {
  const doc = demo();
  const results = solve(doc);
  const svg = diagramSvg(doc, results, fonts);
  const root = parse(svg);
  // The pack's diagram sheet, as the tender pack draws it.
  const pdf = newPdf();
  const marks = record(pdf);
  drawDiagram(pdf, doc, results, CONTENT, FONT);

  test('is one <svg> document with a viewBox in millimetres, cropped to what it draws', () => {
    expect(root.tagName).toBe('svg');
    expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
    const [x, y, w, h] = root.getAttribute('viewBox')!.split(' ').map(Number) as [
      number,
      number,
      number,
      number,
    ];
    // Within the A3 sheet the pack draws on, and holding every shape's anchor point.
    expect(w).toBeLessThanOrEqual(420);
    expect(h).toBeLessThanOrEqual(297);
    for (const e of Array.from(root.children)) {
      if (e.tagName === 'title') continue;
      const px = Number(e.getAttribute('x') ?? e.getAttribute('x1') ?? e.getAttribute('cx'));
      const py = Number(e.getAttribute('y') ?? e.getAttribute('y1') ?? e.getAttribute('cy'));
      expect(px, e.outerHTML).toBeGreaterThanOrEqual(x);
      expect(px, e.outerHTML).toBeLessThanOrEqual(x + w);
      expect(py, e.outerHTML).toBeGreaterThanOrEqual(y);
      expect(py, e.outerHTML).toBeLessThanOrEqual(y + h);
    }
    // The heading sits just above the drawing, not at the top of an empty sheet.
    const heading = Array.from(root.getElementsByTagName('text'))[0]!;
    expect(Number(heading.getAttribute('y')) - y).toBeLessThan(20);
    const drawingTop = Math.min(
      ...Array.from(root.children)
        .slice(5) // the title, the background and the three heading lines
        .map((e) =>
          Number(
            e.getAttribute('y') ??
              e.getAttribute('y1') ??
              Number(e.getAttribute('cy')) - Number(e.getAttribute('r')),
          ),
        ),
    );
    expect(drawingTop - Number(heading.getAttribute('y'))).toBeLessThan(25);
    expect(root.getAttribute('width')).toBe(`${w}mm`);
    expect(root.getAttribute('height')).toBe(`${h}mm`);
    expect(root.getAttribute('font-family')).toBe('DejaVu Sans Condensed, DejaVu Sans, Arial, sans-serif');
    expect(() => parse('<svg><text>a & b</text></svg>')).toThrow();
  });

  test('draws what the PDF diagram sheet draws, call for call, at the same places', () => {
    const drawn = Array.from(root.children).filter((e) =>
      ['line', 'rect', 'circle', 'text'].includes(e.tagName),
    );
    // The background, then the three heading lines, then the drawing, then the standards used.
    const drawing = drawn.slice(4, 4 + marks.length);
    expect(marks.length).toBeGreaterThan(100);
    expect(drawing.length).toBe(marks.length);
    const after = drawn.slice(4 + marks.length).map((e) => e.textContent ?? '');
    expect(after.join('; ')).toBe(`Standards and editions used: ${results.references.join('; ')}`);
    const differ = marks.flatMap((m, i) =>
      same(drawing[i]!, m) ? [] : [`${i}: ${m.kind} ${m.text ?? ''} ≠ ${drawing[i]!.outerHTML}`],
    );
    expect(differ).toEqual([]);
  });

  test('names every node and cable by id in a text of its own', () => {
    const all = new Set(texts(root));
    for (const id of [...doc.nodes.map((x) => x.id), ...doc.cables.map((c) => c.id)])
      expect(all, id).toContain(id);
  });

  test('draws each cable’s run across in its own status’s colour, width and dash', () => {
    const fitted = fitDiagram(newPdf(), doc, results, CONTENT, FONT)!;
    const k = Math.min(fitted.plan.scale, 0.25);
    const lines = Array.from(root.getElementsByTagName('line'));
    for (const { cable, route } of fitted.plan.cables) {
      const look = STATUS_LOOK[results.cables[cable.id]!.status ?? 'none'];
      const dash = look.dash ? look.dash.split(' ').map((d) => Number(d) * k) : [];
      const [[x1, y1], [x2, y2]] = [fitted.plan.at(...route[1]!), fitted.plan.at(...route[2]!)];
      const styled = lines.filter((l) => {
        const drawnDash = (l.getAttribute('stroke-dasharray') ?? '').split(' ').filter(Boolean).map(Number);
        return (
          l.getAttribute('stroke') === look.colour.toLowerCase() &&
          near(n(l, 'stroke-width'), look.strokeWidth * k) &&
          drawnDash.length === dash.length &&
          drawnDash.every((d, i) => near(d, dash[i]!))
        );
      });
      const across = styled.some(
        (l) => near(n(l, 'x1'), x1) && near(n(l, 'y1'), y1) && near(n(l, 'x2'), x2) && near(n(l, 'y2'), y2),
      );
      expect(across, `${cable.id} in ${look.word}`).toBe(true);
    }
  });

  test('heads the drawing with the project, the data used and the caution', () => {
    const [title, data, caution] = texts(root);
    const d = doc.details;
    expect(title).toBe(`${d.title} · ${d.reference} · revision ${d.revision}: single-line diagram`);
    expect(data).toBe(`Conductor data: ${results.dataSet.title} · Drop limits: ${results.profile.title}`);
    expect(caution).toBe(SVG_CAUTION);
    expect(caution).toBe(
      'Design aid only: local wiring rules, the supply company and licensed practice prevail; verify on site by a competent person.',
    );
    expect(root.getElementsByTagName('title')[0]!.textContent).toBe(title);
  });

  test('is named after the project reference and revision', () => {
    expect(drawingFileName(doc)).toBe(
      `${doc.details.reference.replace(/[^\w.-]+/g, '-')}-rev-${doc.details.revision}-single-line.svg`,
    );
    expect(drawingFileName({ ...doc, details: { ...doc.details, reference: 'X/1', revision: '' } })).toBe(
      'X-1-single-line.svg',
    );
  });
});

describe('awkward documents as SVG', () => {
  const base = demo();

  test('markup characters in names are escaped and read back as typed', () => {
    const name = `<&"'>`;
    const doc: ProjectDocument = {
      ...base,
      details: { ...base.details, title: `A&B <works> "main"` },
      nodes: base.nodes.map((x) => (x.id === 'L5' ? { ...x, name: `${name}\u0001` } : x)),
    };
    const svg = diagramSvg(doc, solve(doc), fonts);
    expect(svg).toContain('&lt;&amp;&quot;&apos;&gt;');
    const root = parse(svg);
    expect(texts(root).map((t) => t.trim())).toContain(name);
    expect(root.getElementsByTagName('title')[0]!.textContent).toMatch(/^A&B <works> "main" · /);
  });

  test('a drawing too large for legible labels on A3 is drawn whole at 4 pt or more', () => {
    const doc = randomNetwork(600, 7);
    const pos = tidyPositions(doc);
    for (const x of doc.nodes) x.position = pos[x.id]!;
    const root = parse(diagramSvg(doc, solve(doc), fonts));
    expect(Number(root.getAttribute('viewBox')!.split(' ')[2])).toBeGreaterThan(420);
    const sizes = Array.from(root.getElementsByTagName('text'), (t) => n(t, 'font-size'));
    expect(Math.min(...sizes)).toBeGreaterThanOrEqual(4 * PT_MM - TOL);
    const all = new Set(texts(root));
    const missing = [...doc.nodes.map((x) => x.id), ...doc.cables.map((c) => c.id)].filter(
      (id) => !all.has(id),
    );
    expect(missing).toEqual([]);
  }, 60_000);

  test('an empty document makes a drawing with the heading and a note', () => {
    const doc = { ...base, nodes: [], cables: [] };
    const root = parse(diagramSvg(doc, solve(doc), fonts));
    expect(texts(root)).toContain(SVG_CAUTION);
    expect(texts(root).some((t) => /^Nothing to draw/.test(t))).toBe(true);
    expect(texts(root).join(' ')).toContain('Standards and editions used: ');
    expect(root.getElementsByTagName('line').length).toBe(0);
  });
});
