/**
 * What the protection pass reads from the drop results, as flat arrays indexed by document
 * position: the fed tree in parent-first order, each cable's design current and reactance per
 * metre, and the node kinds. From the drop solver's own arrays when the results are its (no result
 * object is built), otherwise from the result objects (results made by hand in tests).
 */
import type { Cable, NodeElement, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../results.ts';
import { dropStateOf } from '../solveDrop.ts';
import { cableIbA } from '../flow.ts';
import { KIND_BOARD, KIND_INVALID, KIND_JUNCTION, KIND_LOAD, KIND_SUPPLY } from '../dropState.ts';

export { KIND_BOARD, KIND_JUNCTION, KIND_LOAD };

export interface TreeInputs {
  nodes: readonly NodeElement[];
  cables: readonly Cable[];
  /** Index of the supply the pass starts from, -1 where there is none. */
  root: number;
  /** Fed cables, parents before children (the first `orderLength` entries). */
  order: Int32Array;
  orderLength: number;
  cableFrom: Int32Array;
  cableTo: Int32Array;
  /** The cable feeding each node in this tree, -1 where none. */
  feeding: Int32Array;
  /** Node kind codes (dropState KIND_*). */
  nodeKind: Uint8Array;
  /** 1 where the results hold an entry for the cable. */
  cableHasResult: Uint8Array;
  ibA: Float64Array;
  xOhmPerM: Float64Array;
  /** Element index of a result key, -1 where the key names no element of this tree. */
  cableOf: (id: string) => number;
  nodeOf: (id: string) => number;
}

const KINDS: Readonly<Record<string, number>> = {
  supply: KIND_SUPPLY,
  board: KIND_BOARD,
  junction: KIND_JUNCTION,
  load: KIND_LOAD,
};

/** The drop solver's tree and figures, read from its arrays. */
function fromDropState(doc: ProjectDocument, results: Results): TreeInputs | undefined {
  const s = dropStateOf(results);
  if (!s || s.nodes !== doc.nodes || s.cables !== doc.cables) return undefined;
  const m = s.cableCount;
  const order = new Int32Array(Math.max(0, s.orderLength - 1));
  const feeding = new Int32Array(s.nodeCount).fill(-1);
  const ibA = new Float64Array(m);
  const xOhmPerM = new Float64Array(m);
  const hasResult = new Uint8Array(m);
  let len = 0;
  for (let k = 1; k < s.orderLength; k++) {
    const v = s.order[k] as number;
    const j = s.parentCable[v] as number;
    order[len++] = j;
    feeding[v] = j;
    hasResult[j] = 1;
    ibA[j] = cableIbA(s, j);
    // The same figure CableResultView.xOhmPerM gives (the oracle test holds the two together).
    const row = s.cableRow[j];
    const parallel = (s.cables[j] as { parallel?: unknown }).parallel;
    const n = typeof parallel === 'number' && parallel >= 1 ? parallel : 1;
    xOhmPerM[j] = row ? (row.xOhmPerM * (row.frequencyHz ? s.frequencyHz / row.frequencyHz : 1)) / n : NaN;
  }
  const cableIds = s.cableIds;
  const nodeIds = s.nodeIds;
  return {
    nodes: s.nodes,
    cables: s.cables,
    root: s.root >= 0 && s.nodeKind[s.root] === KIND_SUPPLY ? s.root : -1,
    order,
    orderLength: len,
    cableFrom: s.cableFrom,
    cableTo: s.cableTo,
    feeding,
    nodeKind: s.nodeKind,
    cableHasResult: hasResult,
    ibA,
    xOhmPerM,
    cableOf: (id) => {
      const j = s.cableIndex.get(id);
      return j !== undefined && cableIds[j] === id ? j : -1;
    },
    nodeOf: (id) => {
      const v = s.nodeIndex.get(id);
      return v !== undefined && nodeIds[v] === id ? v : -1;
    },
  };
}

/**
 * Breadth-first from the supply over the drawn cables, keeping nodes the results hold; a node fed
 * twice follows the feed its result path names.
 */
function fromResultObjects(doc: ProjectDocument, results: Results): TreeInputs {
  const nodes = doc.nodes;
  const cables = doc.cables;
  const n = nodes.length;
  const m = cables.length;
  const nodeIndex = new Map<string, number>();
  const nodeKind = new Uint8Array(n).fill(KIND_INVALID);
  for (let i = 0; i < n; i++) {
    const node = nodes[i]!;
    nodeIndex.set(node.id, i);
    nodeKind[i] = KINDS[node.kind] ?? KIND_INVALID;
  }
  const cableIndex = new Map<string, number>();
  const cableFrom = new Int32Array(m).fill(-1);
  const cableTo = new Int32Array(m).fill(-1);
  const incoming = new Int32Array(n);
  const children = new Map<number, number[]>();
  for (let j = 0; j < m; j++) {
    const c = cables[j]!;
    cableIndex.set(c.id, j);
    const from = nodeIndex.get(c.from) ?? -1;
    const to = nodeIndex.get(c.to) ?? -1;
    cableFrom[j] = from;
    cableTo[j] = to;
    if (to >= 0) incoming[to]!++;
    if (from < 0) continue;
    const list = children.get(from);
    if (list) list.push(j);
    else children.set(from, [j]);
  }
  const supplyAt = nodes.findIndex((x) => x.kind === 'supply');
  const root = supplyAt >= 0 ? (nodeIndex.get(nodes[supplyAt]!.id) ?? -1) : -1;
  const feeding = new Int32Array(n).fill(-1);
  const order = new Int32Array(m);
  const hasResult = new Uint8Array(m);
  const ibA = new Float64Array(m);
  const xOhmPerM = new Float64Array(m);
  let len = 0;
  if (root >= 0) {
    const seen = new Uint8Array(n);
    seen[root] = 1;
    const queue = [root];
    for (let head = 0; head < queue.length; head++) {
      for (const j of children.get(queue[head]!) ?? []) {
        const c = cables[j]!;
        const v = cableTo[j]!;
        if (v < 0 || seen[v] || !results.nodes[c.to]) continue;
        if (incoming[v]! > 1) {
          const path = results.nodes[c.to]!.path;
          if (path[path.length - 1] !== c.id) continue;
        }
        seen[v] = 1;
        feeding[v] = j;
        order[len++] = j;
        queue.push(v);
        const cr = results.cables[c.id];
        if (!cr) continue;
        hasResult[j] = 1;
        ibA[j] = cr.ibA;
        xOhmPerM[j] = cr.xOhmPerM;
      }
    }
  }
  return {
    nodes,
    cables,
    root,
    order,
    orderLength: len,
    cableFrom,
    cableTo,
    feeding,
    nodeKind,
    cableHasResult: hasResult,
    ibA,
    xOhmPerM,
    cableOf: (id) => cableIndex.get(id) ?? -1,
    nodeOf: (id) => nodeIndex.get(id) ?? -1,
  };
}

export function treeInputs(doc: ProjectDocument, results: Results): TreeInputs {
  return fromDropState(doc, results) ?? fromResultObjects(doc, results);
}
