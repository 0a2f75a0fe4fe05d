/**
 * Labels of a large drawing moved clear of each other before it is split over sheets. The layout
 * (diagramLayout.ts) places each label by its own element, so on a dense drawing a cable's label
 * can run into a junction's label or into the label of a load beside it, and an id becomes
 * unreadable. Here, node labels of loads, boards and supplies stay where they are; each cable
 * label, then each junction label, that covers text already placed or a symbol moves to the
 * nearest clear place beside its line or symbol (a line up or down, or the other side), clear of
 * text, symbols and cable runs. A label with no clear place nearby stays where the layout put it.
 */
import { GAP, LINE, overlaps, type Box, type Plan } from './diagramLayout.ts';
import { within } from './diagramGeometry.ts';
import { symbolExtent } from './diagramSymbols.ts';
import type { PlacedLabel as Label } from './diagramWindow.ts';

/** Boxes, each with the element it belongs to, sorted into vertical strips so a look-up scans only its neighbourhood. */
class Strips {
  private readonly strips = new Map<number, { b: Box; of: string }[]>();
  constructor(private readonly width: number) {}
  private span(b: Box): number[] {
    const out: number[] = [];
    for (let k = Math.floor(b.x / this.width); k <= Math.floor((b.x + b.w) / this.width); k++) out.push(k);
    return out;
  }
  add(b: Box, of = ''): void {
    for (const k of this.span(b)) {
      const list = this.strips.get(k);
      if (list) list.push({ b, of });
      else this.strips.set(k, [{ b, of }]);
    }
  }
  /** Takes out the boxes of `of` that lie where `near` does. */
  remove(near: Box, of: string): void {
    for (const k of this.span(near)) {
      const list = this.strips.get(k);
      if (list)
        this.strips.set(
          k,
          list.filter((e) => e.of !== of),
        );
    }
  }
  /** Whether `b` overlaps a box of another element than `self`. */
  hits(b: Box, self = ''): boolean {
    for (const k of this.span(b))
      if (this.strips.get(k)?.some((e) => e.of !== self && overlaps(e.b, b))) return true;
    return false;
  }
}

/** A hair smaller, so text set line under line or side by side does not count as covering. */
function inset(b: Box): Box {
  const e = 0.05;
  return { x: b.x + e, y: b.y + e, w: Math.max(0, b.w - 2 * e), h: Math.max(0, b.h - 2 * e) };
}

/** The boxes of a label's visible runs, `h` high. */
function runBoxes(l: Label, h: number): Box[] {
  return l.runs.filter((r) => r.text.trim()).map((r) => inset({ x: r.x, y: r.y, w: r.w, h }));
}

/** `l` moved by (`dx`, `dy`) millimetres. */
function moved(l: Label, dx: number, dy: number): Label {
  return {
    of: l.of,
    runs: l.runs.map((r) => ({ ...r, x: r.x + dx, y: r.y + dy })),
    extent: { ...l.extent, x: l.extent.x + dx, y: l.extent.y + dy },
  };
}

/** Shifts to try, nearest first: a line up or down, the other side of the line or symbol. */
function shifts(mirror: number, pitch: number): [number, number][] {
  const out: [number, number][] = [];
  for (const k of [0, 1, -1, 2, -2, 3, -3])
    for (const dx of [0, mirror]) if (k || dx) out.push([dx, k * pitch]);
  return out;
}

/** Half the widest cable stroke on a sheet, millimetres: moved text keeps this clear of the lines. */
const STROKE = 0.25;

/** A box wider by `pad` on either side. */
function widen(b: Box, pad: number): Box {
  return { ...b, x: b.x - pad, w: b.w + 2 * pad };
}

/** What a label may not cover once moved: other text, symbols and cable runs, in drawing millimetres. */
interface Ground {
  text: Strips;
  symbols: Strips;
  lines: Strips;
}

/** The symbols and cable runs of `plan`, in drawing millimetres; the text is added by the caller. */
function groundOf(plan: Plan): Ground {
  const s = plan.scale;
  const ground = { text: new Strips(20), symbols: new Strips(20), lines: new Strips(20) };
  for (const { node, r } of plan.nodes)
    ground.symbols.add(symbolExtent(node, plan.at(r.x, r.y), r.w * s, r.h * s));
  for (const { route } of plan.cables) {
    const pts = route.map(([x, y]) => plan.at(x, y));
    for (let k = 1; k < pts.length; k++) {
      const [[x0, y0], [x1, y1]] = [pts[k - 1]!, pts[k]!];
      ground.lines.add({
        x: Math.min(x0, x1),
        y: Math.min(y0, y1),
        w: Math.abs(x1 - x0),
        h: Math.abs(y1 - y0),
      });
    }
  }
  return ground;
}

/**
 * Where `l` goes: where it is when it covers no text and no symbol; else the nearest clear place
 * (with a little room beside other text if it can have it); else where it is.
 */
function settle(l: Label, mirror: number, plan: Plan, ground: Ground): Label {
  const h = plan.textMm;
  const boxes = runBoxes(l, h);
  if (!boxes.some((b) => ground.text.hits(b, l.of) || ground.symbols.hits(b))) return l;
  const options = shifts(mirror, h * LINE).map(([dx, dy]) => moved(l, dx, dy));
  const clear = (m: Label, pad: number): boolean =>
    within(m.extent, plan.area) &&
    !runBoxes(m, h).some(
      (b) =>
        ground.text.hits(widen(b, pad), l.of) ||
        ground.symbols.hits(b) ||
        ground.lines.hits({ x: b.x - STROKE, y: b.y - STROKE, w: b.w + 2 * STROKE, h: b.h + 2 * STROKE }),
    );
  return options.find((m) => clear(m, h * 0.5)) ?? options.find((m) => clear(m, 0)) ?? l;
}

/**
 * `labels` (in the plan's order, drawing millimetres) with cable and junction labels that cover
 * other text or a symbol moved clear where a place nearby is free. Returns the labels and how
 * many still cover other text.
 */
export function settleLabels(plan: Plan, labels: readonly Label[]): { labels: Label[]; covered: number } {
  const s = plan.scale;
  const h = plan.textMm;
  const kinds = new Map(plan.nodes.map((n) => [n.node.id, n.node.kind]));
  const widths = new Map(plan.nodes.map((n) => [n.node.id, n.r.w * s]));
  const ground = groundOf(plan);
  for (const l of labels) for (const b of runBoxes(l, h)) ground.text.add(b, l.of);
  const out = [...labels];
  // Node labels other than junctions' stay; then cables move, then junctions, whose short labels find room more easily.
  for (const turn of ['cable', 'junction'] as const) {
    out.forEach((l, i) => {
      const kind = kinds.get(l.of) ?? 'cable';
      if (kind !== turn) return;
      // The other side: left of a cable's run, or left of a junction's dot.
      const mirror = -(l.extent.w + 2 * GAP * s + (widths.get(l.of) ?? 0));
      const best = settle(l, mirror, plan, ground);
      if (best === l) return;
      ground.text.remove(l.extent, l.of);
      for (const b of runBoxes(best, h)) ground.text.add(b, l.of);
      out[i] = best;
    });
  }
  const covered = out.filter((l) => runBoxes(l, h).some((b) => ground.text.hits(b, l.of))).length;
  return { labels: out, covered };
}
