/**
 * Plain vector symbols for the PDF single-line diagram, in the spirit of IEC 60617: a source as a
 * circle with a sine, a board as a rectangle with a busbar, a junction as a dot, and a load as a
 * circle or square with a mark for its kind. Drawn with a Pen's lines, circles and rectangles only,
 * in the current stroke colour and width, and always inside the node's box.
 */
import type { LoadKind, NodeElement } from '../../model/types.ts';
import type { Box, Pt } from './diagramLayout.ts';
import type { Pen } from './pen.ts';

/** Straight lines through `pts` in order. */
export function polyline(pdf: Pen, pts: readonly Pt[]): void {
  for (let k = 1; k < pts.length; k++) pdf.line(pts[k - 1]![0], pts[k - 1]![1], pts[k]![0], pts[k]![1]);
}

/** Draws in units of a symbol's radius, from its centre (v grows downwards, as on the page). */
interface UnitPen {
  circle(u: number, v: number, r: number): void;
  rect(u: number, v: number, w: number, h: number): void;
  poly(...pts: Pt[]): void;
}

function unitPen(pdf: Pen, cx: number, cy: number, s: number): UnitPen {
  const at = ([u, v]: Pt): Pt => [cx + u * s, cy + v * s];
  return {
    circle: (u, v, r) => void pdf.circle(cx + u * s, cy + v * s, r * s, 'S'),
    rect: (u, v, w, h) => void pdf.rect(cx + u * s, cy + v * s, w * s, h * s, 'S'),
    poly: (...pts) => polyline(pdf, pts.map(at)),
  };
}

/** `n` + 1 points along a curve v = f(t), u from u0 to u1, t from 0 to 1. */
function curve(u0: number, u1: number, n: number, f: (t: number) => number): Pt[] {
  return Array.from({ length: n + 1 }, (_, i): Pt => [u0 + ((u1 - u0) * i) / n, f(i / n)]);
}

const sine = (v: number, amp: number) => (t: number) => v - amp * Math.sin(t * 2 * Math.PI);

/** Where each load mark's outline starts, from the centre, so the lead from the top edge meets it. */
const MARK_TOP: Partial<Record<LoadKind, number>> = {
  sockets: -0.4,
  heating: -0.7,
  cooking: -0.7,
  other: -0.7,
};

const MARKS: Record<LoadKind, (p: UnitPen) => void> = {
  lighting: (p) => {
    p.circle(0, 0, 0.8);
    p.poly([-0.57, -0.57], [0.57, 0.57]);
    p.poly([0.57, -0.57], [-0.57, 0.57]);
  },
  sockets: (p) => {
    p.poly(
      ...Array.from({ length: 11 }, (_, i): Pt => [
        -0.7 * Math.cos((i * Math.PI) / 10),
        0.3 - 0.7 * Math.sin((i * Math.PI) / 10),
      ]),
    );
    p.poly([-0.7, 0.3], [0.7, 0.3]);
  },
  heating: (p) => {
    p.rect(-0.8, -0.7, 1.6, 1.4);
    p.poly(...Array.from({ length: 7 }, (_, i): Pt => [-0.6 + i * 0.2, i % 2 ? -0.35 : 0.35]));
  },
  cooking: (p) => {
    p.rect(-0.8, -0.7, 1.6, 1.4);
    for (const u of [-0.35, 0.35]) for (const v of [-0.3, 0.3]) p.circle(u, v, 0.18);
  },
  waterHeating: (p) => {
    p.rect(-0.55, -0.8, 1.1, 1.6);
    p.poly(...curve(-0.4, 0.4, 8, sine(-0.2, 0.12)));
    p.poly(...curve(-0.4, 0.4, 8, sine(0.25, 0.12)));
  },
  motor: (p) => {
    p.circle(0, 0, 0.8);
    p.poly([-0.4, 0.4], [-0.4, -0.4], [0, 0.1], [0.4, -0.4], [0.4, 0.4]);
  },
  evCharging: (p) => {
    p.circle(0, 0, 0.8);
    p.poly([-0.05, -0.35], [-0.45, -0.35], [-0.45, 0.35], [-0.05, 0.35]);
    p.poly([-0.45, 0], [-0.15, 0]);
    p.poly([0.05, -0.35], [0.25, 0.35], [0.45, -0.35]);
  },
  hvac: (p) => {
    p.circle(0, 0, 0.8);
    for (let i = 0; i < 3; i++) {
      const a = (i * 2 * Math.PI) / 3 - Math.PI / 2;
      p.poly(
        [0, 0],
        [0.6 * Math.cos(a), 0.6 * Math.sin(a)],
        [0.6 * Math.cos(a + 0.6), 0.6 * Math.sin(a + 0.6)],
      );
    }
  },
  other: (p) => {
    p.rect(-0.8, -0.7, 1.6, 1.4);
    p.poly([-0.8, 0.7], [0.8, -0.7]);
  },
};

/**
 * Draws the symbol of node `n` in its box (top-left `x`, `y`, size `w` × `h`, millimetres). Cables
 * meet the box at its top and bottom centres, so the symbols carry a lead to the top edge.
 *
 * @example
 *   drawNodeSymbol(pdf, load, [40, 60], 10, 8.8); // a lamp: circle with a cross, lead to the top
 */
export function drawNodeSymbol(pdf: Pen, n: NodeElement, [x, y]: Pt, w: number, h: number): void {
  const cx = x + w / 2;
  const cy = y + h / 2;
  if (n.kind === 'junction') {
    pdf.line(cx, y, cx, y + h);
    pdf.circle(cx, cy, w * 0.3, 'F');
    return;
  }
  if (n.kind === 'board') {
    pdf.rect(x, y, w, h, 'S');
    pdf.line(x + w * 0.04, y + h * 0.8, x + w * 0.96, y + h * 0.8);
    return;
  }
  const r = Math.min(w, h) / 2 - h * 0.12;
  const p = unitPen(pdf, cx, cy, r);
  if (n.kind === 'supply') {
    p.circle(0, 0, 1);
    p.poly(...curve(-0.6, 0.6, 8, sine(0, 0.35)));
    return;
  }
  const kind = n.loadKind in MARKS ? n.loadKind : 'other';
  pdf.line(cx, y, cx, cy + (MARK_TOP[kind] ?? -0.8) * r);
  MARKS[kind](p);
}

/**
 * The part of node `n`'s box (top-left `x`, `y`, size `w` × `h`) its symbol inks, lead included:
 * a load's or supply's mark is narrower than its box, so text may come closer at the sides.
 */
export function symbolExtent(n: NodeElement, [x, y]: Pt, w: number, h: number): Box {
  if (n.kind === 'board' || n.kind === 'junction') return { x, y, w, h };
  const r = Math.min(w, h) / 2 - h * 0.12;
  const [cx, cy] = [x + w / 2, y + h / 2];
  // Every mark lies within 0.8 r of the centre, the supply's circle within r; the lead comes down from the top.
  const half = (n.kind === 'supply' ? 1 : 0.8) * r;
  const top = n.kind === 'supply' ? cy - half : y;
  return { x: cx - half, y: top, w: 2 * half, h: cy + half - top };
}
