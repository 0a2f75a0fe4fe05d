/**
 * Where the PDF single-line diagram puts things: the fit of the drawing into its box, each cable's
 * route, and the text blocks with their lines. Pure apart from the text measure passed in, so the
 * drawing step only draws.
 *
 * Label text is EM canvas units high, capped at MAX_PT; below MIN_PT the full labels give way to
 * ids alone (printed at MIN_PT where each fits its place), and below ID_MIN_PT to no text at all.
 */
import { NODE_SIZE } from '../../model/layout.ts';
import type { Cable, NodeElement, ProjectDocument } from '../../model/types.ts';
import type { Results, Status } from '../../solver/results.ts';
import { fmt, fmtExact } from '../format.ts';
import { LOAD_KIND_LABELS } from '../labels.ts';
import { statusLook } from '../statusLook.ts';

/** A rectangle in millimetres on the page (jsPDF unit 'mm'), or in canvas units. */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A point: millimetres on the page, or canvas units. */
export type Pt = [number, number];

/** A run of text in one style; `cut` marks the one part of a line that may be shortened with …. */
export interface Seg {
  text: string;
  bold?: boolean;
  colour?: string;
  cut?: boolean;
}

/** Text lines at `x` (left edge) and `top` (top of the first line), canvas units. */
export interface Block {
  /** The node or cable the label belongs to. */
  of: string;
  x: number;
  top: number;
  maxW: number;
  centred: boolean;
  lines: Seg[][];
}

/** Everything the drawing step needs, laid out. */
export interface Plan {
  /** The page rectangle the drawing was fitted into (at a fixed scale: the drawing's own extent), millimetres. */
  area: Box;
  /** What the drawing covers with its labels' room, canvas units. */
  bounds: Box;
  /** Millimetres per canvas unit. */
  scale: number;
  /** A canvas point on the page. */
  at: (x: number, y: number) => Pt;
  mode: 'full' | 'ids' | 'none';
  /** Text height, millimetres. */
  textMm: number;
  nodes: { node: NodeElement; r: Box }[];
  cables: { cable: Cable; route: Pt[]; status: Status | null }[];
  blocks: Block[];
  /** What the drawing covers, canvas units, so the key can avoid it. */
  taken: Box[];
}

/** Width of a line of text at a text height, millimetres. */
export type Measure = (segs: Seg[], textMm: number) => number;

/** Millimetres per typographic point. */
export const PT_MM = 25.4 / 72;
/** Line pitch as a multiple of the text height. */
export const LINE = 1.15;
/** Label text height in canvas units: three cable lines fit between two ranks of the tidy layout. */
const EM = 14;
const MIN_PT = 4;
const MAX_PT = 8;
const ID_MIN_PT = 2.5;
/** Space between a label and the line or symbol it sits beside, canvas units. */
export const GAP = 3;
/** How far a load's label may reach beyond its box on either side. */
const SLACK = 12;
const SIDE_W = 9 * EM;
const CABLE_LABEL_W = 8.6 * EM;

function nodeBox(n: NodeElement): Box | null {
  const size = NODE_SIZE[n.kind] as { width: number; height: number } | undefined;
  const p = n.position as NodeElement['position'] | undefined;
  if (!size || !p || !Number.isFinite(p.x) || !Number.isFinite(p.y)) return null;
  return { x: p.x, y: p.y, w: size.width, h: size.height };
}

/** The node's box grown by the room its label may take (canvas units). */
function footprint(kind: NodeElement['kind'], r: Box): Box {
  const lines = 2 * LINE * EM;
  if (kind === 'load') return { x: r.x - SLACK, y: r.y, w: r.w + 2 * SLACK, h: r.h + GAP + lines };
  if (kind === 'board') return r;
  const cy = r.y + r.h / 2;
  const y = Math.min(r.y, cy - lines / 2);
  return { x: r.x, y, w: r.w + GAP + SIDE_W, h: Math.max(r.y + r.h, cy + lines / 2) - y };
}

/** The smallest rectangle holding all of `boxes` (a loop, not a spread: documents can be large). */
function union(boxes: Box[]): Box {
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const b of boxes) {
    x0 = Math.min(x0, b.x);
    y0 = Math.min(y0, b.y);
    x1 = Math.max(x1, b.x + b.w);
    y1 = Math.max(y1, b.y + b.h);
  }
  return { x: x0, y: y0, w: x1 - x0, h: y1 - y0 };
}

/** The rectangle spanned by two points. */
function span([x0, y0]: Pt, [x1, y1]: Pt): Box {
  return { x: Math.min(x0, x1), y: Math.min(y0, y1), w: Math.abs(x1 - x0), h: Math.abs(y1 - y0) };
}

/** Whether two rectangles share some area. */
export function overlaps(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/** The editor's step route: down from the bottom centre of `a`, across at mid-height, down into the top centre of `b`. */
function route(a: Box, b: Box): Pt[] {
  const sx = a.x + a.w / 2;
  const sy = a.y + a.h;
  const tx = b.x + b.w / 2;
  const my = (sy + b.y) / 2;
  return [
    [sx, sy],
    [sx, my],
    [tx, my],
    [tx, b.y],
  ];
}

function pct(value: number | undefined): string {
  return value !== undefined && Number.isFinite(value) ? `${fmt(value, 2)} %` : '–';
}

/** "4 mm²", "2×240 mm²". */
function sizeText(c: Cable): string {
  return `${c.parallel > 1 ? `${c.parallel}×` : ''}${fmtExact(c.sizeMm2)} mm²`;
}

/** A cable's label as groups of words: a group starts a line and wraps within itself. */
function cableWords(c: Cable, results: Results): Seg[][][] {
  const r = results.cables[c.id];
  const look = statusLook(r?.status);
  const drop = r ? pct(r.dropPct.value) : '–';
  return [
    [[{ text: c.id, bold: true }], [{ text: look.glyph, colour: look.colour }]],
    [[{ text: sizeText(c) }], [{ text: `${fmtExact(c.lengthM)} m` }]],
    [[{ text: drop === '–' ? drop : `+${drop}` }], [{ text: `Σ ${pct(r?.cumulativePct.value)}` }]],
  ];
}

/** `word` after `line`, with a space between. */
function join(line: Seg[], word: Seg[]): Seg[] {
  return line.length ? [...line, { ...word[0]!, text: ` ${word[0]!.text}` }, ...word.slice(1)] : word;
}

/** Word groups in lines no wider than `maxW`: each group starts a line (the second joins the first if it fits whole) and wraps within itself. */
function packGroups(groups: Seg[][][], maxW: number, width: (segs: Seg[]) => number): Seg[][] {
  const lines: Seg[][] = [];
  groups.forEach((group, g) => {
    const joined = join(lines[0] ?? [], group.reduce(join, []));
    if (g === 1 && lines.length === 1 && width(joined) <= maxW) {
      lines[0] = joined;
      return;
    }
    let line: Seg[] = [];
    for (const word of group) {
      const next = join(line, word);
      if (line.length && width(next) > maxW) {
        lines.push(line);
        line = word;
      } else line = next;
    }
    lines.push(line);
  });
  return lines;
}

/** The label's lines; where they run past `maxLines`, the words flow freely if that takes fewer. */
function pack(groups: Seg[][][], maxW: number, maxLines: number, width: (segs: Seg[]) => number): Seg[][] {
  const structured = packGroups(groups, maxW, width);
  if (structured.length <= maxLines) return structured;
  const flowing = packGroups([groups.flat()], maxW, width);
  return flowing.length < structured.length ? flowing : structured;
}

function nodeLines(n: NodeElement, results: Results): Seg[][] {
  const name = n.name || (n.kind === 'load' ? (LOAD_KIND_LABELS[n.loadKind] ?? '') : '');
  const id: Seg = { text: n.id, bold: true };
  if (n.kind === 'board') return [[id], [{ text: name, cut: true }]];
  const head = [id, { text: ` ${name}`, cut: true }];
  if (n.kind !== 'load') return [head];
  const r = results.loads[n.id];
  const look = statusLook(r?.status);
  return [head, [{ text: look.glyph, colour: look.colour }, { text: ` Σ ${pct(r?.cumulativePct.value)}` }]];
}

/** Room right of x, between y0 and y1, before the next obstacle or the drawing's right edge. */
function roomRight(x: number, y0: number, y1: number, obstacles: Box[], right: number): number {
  let room = right - x - GAP;
  for (const o of obstacles) {
    if (o.x > x + 0.5 && o.y < y1 && o.y + o.h > y0) room = Math.min(room, o.x - x - 2 * GAP);
  }
  return room;
}

interface Surroundings {
  /** Vertical runs and node boxes, which end a label's room to the right. */
  obstacles: Box[];
  /** Horizontal runs, which a label moves below. */
  across: Box[];
  /** The drawing's right edge. */
  right: number;
  width: (segs: Seg[]) => number;
  lineH: number;
}

/** A cable's label in its band, right of its last run, moved below any horizontal run crossing it. */
function cableBlock(band: Box, words: Seg[][][], around: Surroundings): Omit<Block, 'of'> {
  const { obstacles, across, right, width, lineH } = around;
  let top = band.y;
  for (let pass = 0; ; pass++) {
    const bottom = Math.max(band.y + band.h, top + lineH);
    const maxW = roomRight(band.x, top, bottom, obstacles, right);
    const lines = pack(words, maxW, Math.max(1, Math.floor((bottom - top) / lineH)), width);
    const x0 = band.x + GAP;
    const x1 = x0 + Math.max(...lines.map(width));
    const y1 = top + lines.length * lineH;
    const hits = across.filter((s) => s.y > top && s.y < y1 && s.x < x1 && s.x + s.w > x0);
    if (hits.length === 0 || pass === 3) return { x: x0, top, maxW, centred: false, lines };
    top = Math.max(...hits.map((s) => s.y)) + GAP;
  }
}

function nodeBlock(n: NodeElement, r: Box, lines: Seg[][], lineH: number): Omit<Block, 'of'> {
  if (n.kind === 'load')
    return { x: r.x - SLACK, top: r.y + r.h + GAP, maxW: r.w + 2 * SLACK, centred: true, lines };
  if (n.kind === 'board') return { x: r.x + 10, top: r.y + 8, maxW: r.w - 20, centred: true, lines };
  return {
    x: r.x + r.w + GAP,
    top: r.y + r.h / 2 - (lines.length * lineH) / 2,
    maxW: SIDE_W,
    centred: false,
    lines,
  };
}

/** The scale at which labels print at `pt` points (below the 8 pt cap), millimetres per canvas unit. */
export function scaleForLabelPt(pt: number): number {
  return (pt * PT_MM) / EM;
}

/** The smallest label size printed in full, points. */
export const LABEL_MIN_PT = MIN_PT;

/**
 * Lays out the diagram of `doc` in `area` (millimetres): null when nothing has a position.
 * Cables to a missing or unplaced node are left out. With `fixedScale` (millimetres per canvas
 * unit) the drawing is not fitted: its top-left goes at the area's top-left at that scale, and the
 * plan's area is the drawing's own extent there.
 *
 * @example
 *   const plan = planDiagram(doc, results, { x: 14, y: 22, w: 392, h: 225 }, measure);
 *   plan?.mode; // 'full' when labels print at 4 pt or more
 */
export function planDiagram(
  doc: ProjectDocument,
  results: Results,
  area: Box,
  measure: Measure,
  fixedScale?: number,
): Plan | null {
  const nodes: Plan['nodes'] = [];
  const boxes = new Map<string, Box>();
  for (const node of doc.nodes) {
    const r = nodeBox(node);
    if (r) nodes.push({ node, r });
    if (r) boxes.set(node.id, r);
  }
  const cables: Plan['cables'] = [];
  for (const cable of doc.cables) {
    const a = boxes.get(cable.from);
    const b = boxes.get(cable.to);
    // Results are built when first read: only the cables drawn build theirs.
    if (a && b) cables.push({ cable, route: route(a, b), status: results.cables[cable.id]?.status ?? null });
  }
  if (nodes.length === 0 || (fixedScale === undefined && !(area.w > 0 && area.h > 0))) return null;
  // A cable's label goes right of its last vertical run, below the horizontal one.
  const bands = cables.map(({ route: p }) => span([p[2]![0], p[2]![1] + GAP], p[3]!));
  const bounds = union([
    ...nodes.map(({ node, r }) => footprint(node.kind, r)),
    ...bands.map((b) => ({ ...b, w: GAP + CABLE_LABEL_W })),
  ]);
  const scale = fixedScale ?? Math.min(area.w / bounds.w, area.h / bounds.h);
  if (!(scale > 0 && Number.isFinite(scale))) return null;
  if (fixedScale !== undefined) area = { x: area.x, y: area.y, w: bounds.w * scale, h: bounds.h * scale };
  const ox = area.x + (area.w - bounds.w * scale) / 2 - bounds.x * scale;
  const oy = area.y + (area.h - bounds.h * scale) / 2 - bounds.y * scale;
  const at = (x: number, y: number): Pt => [ox + x * scale, oy + y * scale];

  const labelPt = Math.min(MAX_PT, (EM * scale) / PT_MM);
  let mode: Plan['mode'] = labelPt >= MIN_PT ? 'full' : labelPt >= ID_MIN_PT ? 'ids' : 'none';
  const textMm = (mode === 'full' ? labelPt : MIN_PT) * PT_MM;
  const width = (segs: Seg[]): number => measure(segs, textMm) / scale;
  const lineH = (textMm * LINE) / scale;
  const segments = cables.flatMap(({ route: p }) => [
    span(p[0]!, p[1]!),
    span(p[1]!, p[2]!),
    span(p[2]!, p[3]!),
  ]);
  const taken = [...nodes.map(({ node, r }) => footprint(node.kind, r)), ...bands, ...segments];
  if (mode === 'none') return { area, bounds, scale, at, mode, textMm, nodes, cables, blocks: [], taken };

  const obstacles = [...segments.filter((s) => s.w === 0), ...nodes.map((n) => n.r)];
  const blocks = nodes.map(({ node, r }) => ({
    ...nodeBlock(
      node,
      r,
      mode === 'full' ? nodeLines(node, results) : [[{ text: node.id, bold: true }]],
      lineH,
    ),
    of: node.id,
  }));
  const around: Surroundings = {
    obstacles,
    across: segments.filter((s) => s.h === 0 && s.w > 0),
    right: bounds.x + bounds.w,
    width,
    lineH,
  };
  cables.forEach(({ cable }, j) => {
    const words = mode === 'full' ? cableWords(cable, results) : [[[{ text: cable.id, bold: true }]]];
    blocks.push({ ...cableBlock(bands[j]!, words, around), of: cable.id });
  });
  // Ids alone must each fit their place, or no text is drawn at all.
  if (mode === 'ids' && blocks.some((b) => width(b.lines[0]!.slice(0, 1)) > b.maxW)) mode = 'none';
  const shown = mode === 'none' ? [] : blocks;
  return { area, bounds, scale, at, mode, textMm, nodes, cables, blocks: shown, taken };
}
