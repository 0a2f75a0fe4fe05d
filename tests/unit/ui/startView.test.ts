import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { NODE_SIZE } from '../../../src/model/layout.ts';
import { newLoad } from '../../../src/model/defaults.ts';
import { READABLE_ZOOM, fitViewport, startViewport, supplyEnd } from '../../../src/ui/canvas/startView.ts';
import { detailForZoom } from '../../../src/ui/canvas/flowTypes.ts';
import { smallNetwork } from '../commands/fixture.ts';

const SCREEN = { width: 860, height: 830 };

function demo() {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

/** Screen position of a canvas point under a viewport. */
function onScreen(vp: { x: number; y: number; zoom: number }, p: { x: number; y: number }) {
  return { x: p.x * vp.zoom + vp.x, y: p.y * vp.zoom + vp.y };
}

describe('opening view', () => {
  test('a small project opens fitted whole', () => {
    const doc = smallNetwork();
    const fit = fitViewport(doc, SCREEN);
    expect(startViewport(doc, SCREEN)).toEqual(fit);
    for (const n of doc.nodes) {
      const p = onScreen(fit, n.position);
      expect(p.x).toBeGreaterThanOrEqual(0);
      expect(p.y).toBeGreaterThanOrEqual(0);
      const q = onScreen(fit, {
        x: n.position.x + NODE_SIZE[n.kind].width,
        y: n.position.y + NODE_SIZE[n.kind].height,
      });
      expect(q.x).toBeLessThanOrEqual(SCREEN.width);
      expect(q.y).toBeLessThanOrEqual(SCREEN.height);
    }
  });

  test('the demo fits too small to read, so it opens at full-label zoom on the main board', () => {
    const doc = demo();
    expect(detailForZoom(fitViewport(doc, SCREEN).zoom)).toBe(0);
    const vp = startViewport(doc, SCREEN);
    expect(vp.zoom).toBe(READABLE_ZOOM);
    expect(detailForZoom(vp.zoom)).toBe(2);
    const main = supplyEnd(doc)!;
    expect(main.kind).toBe('board');
    const c = onScreen(vp, {
      x: main.position.x + NODE_SIZE.board.width / 2,
      y: main.position.y,
    });
    expect(c.x).toBeGreaterThan(SCREEN.width * 0.3);
    expect(c.x).toBeLessThan(SCREEN.width * 0.7);
    const supply = doc.nodes.find((n) => n.kind === 'supply')!;
    const top = onScreen(vp, supply.position);
    expect(top.y).toBeGreaterThan(0);
    expect(top.y).toBeLessThan(SCREEN.height / 3);
  });

  test('the view stays inside the diagram rather than showing empty canvas beside it', () => {
    const doc = smallNetwork();
    // Many loads to the right of the board: the board is at the left end of the drawing.
    for (let i = 0; i < 30; i++)
      doc.nodes.push(newLoad(`L${i + 10}`, { x: 200 + i * 130, y: 320 }, 'lighting'));
    const vp = startViewport(doc, SCREEN);
    expect(vp.zoom).toBe(READABLE_ZOOM);
    const leftMost = Math.min(...doc.nodes.map((n) => n.position.x));
    expect(onScreen(vp, { x: leftMost, y: 0 }).x).toBeGreaterThanOrEqual(0);
    expect(onScreen(vp, { x: leftMost, y: 0 }).x).toBeLessThan(60);
  });

  test('an empty project opens at 1:1', () => {
    const doc = smallNetwork();
    doc.nodes = [];
    doc.cables = [];
    expect(startViewport(doc, SCREEN).zoom).toBe(1);
  });
});
