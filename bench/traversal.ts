/**
 * The benchmark's baseline: the least any solver must do with the same document. It builds the
 * id -> index map of the nodes and the child adjacency from the cables, then walks the tree from
 * the supply iteratively doing one addition per element (node or cable).
 */
import type { ProjectDocument } from '../src/model/types.ts';

export function bareTraversal(doc: ProjectDocument): number {
  const nodes = doc.nodes;
  const cables = doc.cables;
  const n = nodes.length;
  const index = new Map<string, number>();
  let root = -1;
  for (let i = 0; i < n; i++) {
    const node = nodes[i]!;
    index.set(node.id, i);
    if (node.kind === 'supply' && root < 0) root = i;
  }
  const count = new Int32Array(n + 1);
  const to = new Int32Array(cables.length);
  const from = new Int32Array(cables.length);
  for (let j = 0; j < cables.length; j++) {
    const c = cables[j]!;
    from[j] = index.get(c.from) ?? -1;
    to[j] = index.get(c.to) ?? -1;
    if (from[j]! >= 0) count[from[j]! + 1]!++;
  }
  for (let i = 0; i < n; i++) count[i + 1]! += count[i]!;
  const fill = count.slice(0, n);
  const child = new Int32Array(cables.length);
  for (let j = 0; j < cables.length; j++) if (from[j]! >= 0) child[fill[from[j]!]!++] = j;
  const stack = new Int32Array(n);
  let top = 0;
  let sum = 0;
  if (root >= 0) stack[top++] = root;
  while (top > 0) {
    const u = stack[--top]!;
    sum += 1;
    for (let k = count[u]!; k < count[u + 1]!; k++) {
      const j = child[k]!;
      sum += 1;
      if (to[j]! >= 0) stack[top++] = to[j]!;
    }
  }
  return sum;
}
