/**
 * What the protection pass reads from the drop results, as flat arrays indexed by document
 * position: the fed tree in parent-first order, each cable's design current and reactance per
 * metre, and the node kinds. From the drop solver's own arrays when the results are its (no result
 * object is built), otherwise from the result objects (results made by hand in tests).
 */
import type { Cable, NodeElement, ProjectDocument } from '../../model/types.ts';
import { IdList, type IdsByPosition } from '../idList.ts';
import type { Results } from '../results.ts';
import { dropStateOf } from '../solveDrop.ts';
import { cableRow, type DropState } from '../dropState.ts';
import { cableIbA } from '../flow.ts';
import { KIND_BOARD, KIND_INVALID, KIND_JUNCTION, KIND_LOAD, KIND_SUPPLY } from '../dropState.ts';
import { breadthFirstRank } from '../findingOrder.ts';

export { KIND_BOARD, KIND_JUNCTION, KIND_LOAD };

export interface TreeInputs {
  nodes: readonly NodeElement[];
  cables: readonly Cable[];
  /** Index of the supply the pass starts from, -1 where there is none. */
  root: number;
  /**
   * Fed nodes, parents before children, in the order the sweeps visit them: entries `orderStart`
   * to `orderEnd` (the root, at 0, excluded). Document order where the drop solver found it to be
   * parents first (then the sweeps read memory front to back), else breadth-first.
   */
  walk: Int32Array;
  orderStart: number;
  orderEnd: number;
  /** Position of each fed node in breadth-first order from the root (orders the findings). */
  rank: Int32Array;
  cableFrom: Int32Array;
  cableTo: Int32Array;
  /** The cable feeding each fed node in this tree. */
  feeding: Int32Array;
  /** 1 where the node is in the tree. */
  reached: Uint8Array;
  /** Node kind codes (dropState KIND_*). */
  nodeKind: Uint8Array;
  /** The id of each fed node (so the checks need not read the node). */
  nodeIds: IdsByPosition;
  /** 1 where a load has motor starting data. */
  loadMotor: Uint8Array;
  /** 1 where the results hold an entry for the cable; null where every fed cable has one. */
  cableHasResult: Uint8Array | null;
  /** The drop solver's state when the figures come from it (the pass then reads its arrays directly). */
  drop: DropState | null;
  /** Design current Ib and reactance per metre (parallel cables combined) of a fed cable. */
  ibA: (j: number) => number;
  xOhmPerM: (j: number) => number;
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

/**
 * Reactance per metre of a cable from the drop solver's conductor row, parallel cables combined: the
 * same figure CableResultView.xOhmPerM gives (the oracle test holds the two together).
 */
export function dropXOhmPerM(s: DropState, j: number, parallel: unknown): number {
  const row = cableRow(s, j);
  const n = typeof parallel === 'number' && parallel >= 1 ? parallel : 1;
  // Number.NaN rather than the global NaN: V8 then keeps the figure unboxed.
  return row ? (row.xOhmPerM * (row.frequencyHz ? s.frequencyHz / row.frequencyHz : 1)) / n : Number.NaN;
}

/** The drop solver's tree and figures, read from its arrays. */
function fromDropState(doc: ProjectDocument, results: Results): TreeInputs | undefined {
  const s = dropStateOf(results);
  if (!s || s.nodes !== doc.nodes || s.cables !== doc.cables) return undefined;
  const cables = s.cables;
  const cableIds = s.cableIds;
  const nodeIds = s.nodeIds;
  return {
    nodes: s.nodes,
    cables: s.cables,
    root: s.root >= 0 && s.nodeKind[s.root] === KIND_SUPPLY ? s.root : -1,
    walk: s.walk,
    orderStart: 1,
    orderEnd: s.orderLength,
    rank: breadthFirstRank(s),
    cableFrom: s.cableFrom,
    cableTo: s.cableTo,
    feeding: s.parentCable,
    reached: s.reached,
    nodeKind: s.nodeKind,
    nodeIds: s.nodeIds,
    loadMotor: s.loadMotor,
    cableHasResult: null,
    drop: s,
    ibA: (j) => cableIbA(s, j),
    xOhmPerM: (j) => dropXOhmPerM(s, j, (cables[j] as { parallel?: unknown }).parallel),
    cableOf: (id) => {
      const j = s.cableIndex.get(id);
      return j !== undefined && cableIds.at(j) === id ? j : -1;
    },
    nodeOf: (id) => {
      const v = s.nodeIndex.get(id);
      return v !== undefined && nodeIds.at(v) === id ? v : -1;
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
  const nodeIds = new IdList(n);
  const loadMotor = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const node = nodes[i]!;
    nodeIndex.set(node.id, i);
    nodeIds.set(i, node.id);
    nodeKind[i] = KINDS[node.kind] ?? KIND_INVALID;
    if (node.kind === 'load' && node.motor) loadMotor[i] = 1;
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
  const order = new Int32Array(n);
  const hasResult = new Uint8Array(m);
  const ibA = new Float64Array(m);
  const xOhmPerM = new Float64Array(m);
  let len = 0;
  const seen = new Uint8Array(n);
  const rank = new Int32Array(n);
  if (root >= 0) {
    seen[root] = 1;
    order[len++] = root;
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
        rank[v] = len;
        order[len++] = v;
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
    walk: order,
    orderStart: 1,
    orderEnd: len,
    rank,
    cableFrom,
    cableTo,
    feeding,
    reached: seen,
    nodeKind,
    nodeIds,
    loadMotor,
    cableHasResult: hasResult,
    drop: null,
    ibA: (j) => ibA[j]!,
    xOhmPerM: (j) => xOhmPerM[j]!,
    cableOf: (id) => cableIndex.get(id) ?? -1,
    nodeOf: (id) => nodeIndex.get(id) ?? -1,
  };
}

export function treeInputs(doc: ProjectDocument, results: Results): TreeInputs {
  return fromDropState(doc, results) ?? fromResultObjects(doc, results);
}
