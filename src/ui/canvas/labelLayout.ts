/**
 * Keeps cable labels from covering each other. A label sits just above the element its cable
 * feeds; loads drawn side by side (a board's final circuits) put their labels side by side, and
 * where two would overlap the second is lifted by one label height, so neighbours alternate.
 * Sizes are estimates from the text (no DOM measuring, so it stays cheap and testable).
 */
import type { Id, NodeElement } from '../../model/types.ts';
import { NODE_SIZE } from '../../model/layout.ts';

/** Label font metrics, in px at zoom 1 (styles.css: 10 px text, 9 px heading, 13 px lines). */
const CHAR_PX = 5.4;
const HEADING_CHAR_PX = 4.9;
const HEADING_MAX_PX = 128;
const PADDING_PX = 14;
const LINE_PX = 13;
const GAP_PX = 4;

export interface LabelBox {
  id: Id;
  /** The element the cable feeds; its top centre is where the label hangs. */
  to: NodeElement;
  heading: string;
  lines: string[];
}

export function labelWidthPx(heading: string, lines: string[]): number {
  const body = Math.max(0, ...lines.map((l) => l.length * CHAR_PX));
  const head = Math.min(HEADING_MAX_PX, heading.length * HEADING_CHAR_PX);
  return Math.ceil(Math.max(body, head) + PADDING_PX);
}

export function labelHeightPx(lines: string[]): number {
  return (lines.length + 1) * LINE_PX + 4;
}

/**
 * The lift of each label in px (0 for most). Labels hanging at the same height are placed left to
 * right on two levels: a label goes on the lower level if it clears the one before it there, else
 * on the upper one; if it clears neither, on whichever overlaps less.
 */
export function labelRaises(boxes: LabelBox[]): Map<Id, number> {
  const rows = new Map<number, LabelBox[]>();
  for (const b of boxes) {
    const y = Math.round(b.to.position.y);
    const row = rows.get(y);
    if (row) row.push(b);
    else rows.set(y, [b]);
  }
  const out = new Map<Id, number>();
  for (const row of rows.values()) {
    const placed = row.map((b) => {
      const w = labelWidthPx(b.heading, b.lines);
      const cx = b.to.position.x + NODE_SIZE[b.to.kind].width / 2;
      return { b, left: cx - w / 2, right: cx + w / 2, h: labelHeightPx(b.lines) };
    });
    placed.sort((p, q) => p.left - q.left);
    const lift = Math.max(...placed.map((p) => p.h)) + GAP_PX;
    const rightEdge = [-Infinity, -Infinity];
    for (const p of placed) {
      const level =
        p.left >= rightEdge[0]! + GAP_PX
          ? 0
          : p.left >= rightEdge[1]! + GAP_PX
            ? 1
            : rightEdge[0]! <= rightEdge[1]!
              ? 0
              : 1;
      rightEdge[level] = p.right;
      out.set(p.b.id, level * lift);
    }
  }
  return out;
}
