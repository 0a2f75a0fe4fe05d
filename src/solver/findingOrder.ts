/**
 * Keeps findings in the order they have always come in when a pass walks the tree in document
 * order (DropState.walk) instead of breadth-first order: the pass tags what it pushed with the
 * node it was working on, and `settle` sorts that tail by the node's breadth-first position,
 * keeping each node's own findings in the order pushed.
 */
import type { DropState } from './dropState.ts';
import type { DropFinding } from './findings.ts';

export class FindingTail {
  private readonly start: number;
  private readonly nodes: number[] = [];
  private seen: number;

  constructor(private readonly findings: DropFinding[]) {
    this.start = findings.length;
    this.seen = findings.length;
  }

  /** How many findings there were at the last `tag`. */
  get seenCount(): number {
    return this.seen;
  }

  /** Marks the findings pushed since the last call as belonging to node `v`. */
  tag(v: number): void {
    if (this.findings.length === this.seen) return;
    for (let k = this.seen; k < this.findings.length; k++) this.nodes.push(v);
    this.seen = this.findings.length;
  }

  /** Sorts the tail by breadth-first position of its nodes, leaves first when `leavesFirst`. */
  settle(s: DropState, leavesFirst: boolean): void {
    const count = this.nodes.length;
    if (count < 2 || !s.walkIsDocumentOrder) return;
    const rank = breadthFirstRank(s);
    const tail = this.findings.slice(this.start, this.start + count);
    const top = s.orderLength - 1;
    // Position of a finding's node in the order wanted: breadth-first, or its reverse.
    const key = (k: number) => {
      const r = rank[this.nodes[k] as number] as number;
      return leavesFirst ? top - r : r;
    };
    if (count <= 64) {
      const idx = Array.from({ length: count }, (_, k) => k);
      idx.sort((a, b) => key(a) - key(b) || a - b);
      for (let k = 0; k < count; k++) this.findings[this.start + k] = tail[idx[k] as number] as DropFinding;
      return;
    }
    // A stable counting sort by position: linear, where a comparison sort of many findings is not.
    const at = new Int32Array(s.orderLength + 1);
    for (let k = 0; k < count; k++) at[key(k) + 1]!++;
    for (let r = 0; r < s.orderLength; r++) at[r + 1]! += at[r]!;
    for (let k = 0; k < count; k++) this.findings[this.start + at[key(k)]!++] = tail[k] as DropFinding;
  }
}

/** Position of each reached node in breadth-first order (`s.rank`, filled on first use). */
export function breadthFirstRank(s: DropState): Int32Array {
  if (!s.rankReady) {
    for (let k = 0; k < s.orderLength; k++) s.rank[s.order[k] as number] = k;
    s.rankReady = true;
  }
  return s.rank;
}
