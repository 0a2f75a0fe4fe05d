/**
 * Turns the document's node and cable lists into a tree rooted at the supply: index maps, parent
 * links and a breadth-first order. Everything that does not fit a tree (a node fed twice, a cable
 * to nowhere, a loop, an island) becomes a finding and is left out; the rest is still solved.
 */
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_INVALID, KIND_JUNCTION, KIND_LOAD, KIND_SUPPLY } from './dropState.ts';
import type { DropFinding } from './findings.ts';
import { shown } from './findings.ts';
import { RowMemo, readCable, readNode } from './readFields.ts';
import { elementLabel } from './elementLabel.ts';
import { ValueList } from './idList.ts';

function kindCode(kind: unknown): number | undefined {
  switch (kind) {
    case 'supply':
      return KIND_SUPPLY;
    case 'board':
      return KIND_BOARD;
    case 'junction':
      return KIND_JUNCTION;
    case 'load':
      return KIND_LOAD;
    default:
      return undefined;
  }
}

const KIND_WORD = ['supply', 'board', 'junction', 'load'];

/** "board B2" / "load L7" for messages. */
export function nodeLabel(s: DropState, i: number): string {
  const node = s.nodes[i] as { name?: unknown } | undefined;
  return elementLabel(KIND_WORD[s.nodeKind[i] ?? KIND_INVALID] ?? 'element', s.nodeIds.at(i), node?.name);
}

type Loose = Record<string, unknown>;

function isObject(v: unknown): v is Loose {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Message for a node the index leaves out (no id, unknown kind). */
function malformedNode(el: unknown, i: number, id: unknown): DropFinding {
  return {
    code: 'malformedElement',
    severity: 'error',
    ...(typeof id === 'string' && id !== '' ? { elementId: id } : {}),
    message:
      typeof id !== 'string' || id === ''
        ? `node number ${i + 1} in the list has no id (got ${shown(id)}); give it a unique text id.`
        : `node ${id}: kind must be supply, board, junction or load, got ${shown(isObject(el) ? el.kind : el)}.`,
  };
}

/**
 * Fills the index, kind, parent and order arrays of `s`, reads each element's fields once (see
 * readFields.ts) and pushes topology findings.
 */
export function buildTopology(s: DropState): void {
  const { nodes, cables, findings, nodeIndex, cableIndex, nodeIds, nodeKind, parentCable } = s;
  const { cableFrom, cableTo } = s;
  const n = s.nodeCount;
  const m = s.cableCount;
  const supplies: number[] = [];

  for (let i = 0; i < n; i++) {
    const el: unknown = nodes[i];
    let id: unknown;
    let kind: number | undefined;
    if (typeof el === 'object' && el !== null && !Array.isArray(el)) {
      id = (el as Loose).id;
      kind = kindCode((el as Loose).kind);
    }
    if (typeof id !== 'string' || id === '' || kind === undefined) {
      nodeKind[i] = KIND_INVALID;
      findings.push(malformedNode(el, i, id));
      continue;
    }
    if (nodeIndex.claim(id, i) !== i) {
      nodeKind[i] = KIND_INVALID;
      findings.push({
        code: 'duplicateId',
        severity: 'error',
        elementId: id,
        message: `id ${id} is used by more than one node; the later one is left out until it gets its own id.`,
      });
      continue;
    }
    nodeKind[i] = kind;
    if (kind === KIND_SUPPLY) supplies.push(i);
    else readNode(s, i, el as Loose, kind);
  }

  s.root = supplies[0] ?? -1;
  if (supplies.length === 0 && n > 0) {
    findings.push({
      code: 'noSupply',
      severity: 'error',
      message: 'the project has no supply: add one supply at the origin so the distribution can be solved.',
    });
  }
  for (let k = 1; k < supplies.length; k++) {
    const i = supplies[k] as number;
    findings.push({
      code: 'manySupplies',
      severity: 'error',
      elementId: nodeIds.at(i),
      message: `${nodeLabel(s, i)}: a project has exactly one supply; remove this one or join its part of the diagram to the first supply. Nothing below it is solved.`,
    });
  }

  const rows = new RowMemo(s.catalogue, s.rows);
  // The cables are read once, in a loop of their own: each cable's id is claimed, its two ends
  // kept and its fields read (readFields.ts). The ends are then found in a second loop that reads
  // no cable (a cable with a problem is read again for its message only). Each loop's iterations
  // do not wait on each other, so the processor overlaps their reads of memory; in one long loop
  // each read waited behind the rest of the cable's work, and at 100,000 elements the cables no
  // longer stay in cache from one loop to the next. Paired benchmark runs: each step took the
  // 10k → 100k scaling down by 0.1 to 0.6, the 10k solve unchanged (docs/solver.md).
  // `childCables` holds each cable's claim until the adjacency below overwrites it.
  const holder = s.childCables;
  const fromIds = new ValueList(m);
  const toIds = new ValueList(m);
  for (let j = 0; j < m; j++) {
    const c: unknown = cables[j];
    const id = typeof c === 'object' && c !== null && !Array.isArray(c) ? (c as Loose).id : undefined;
    const claim = typeof id === 'string' && id !== '' ? cableIndex.claim(id, j) : -1;
    holder[j] = claim;
    if (claim === j) {
      fromIds.set(j, (c as Loose).from);
      toIds.set(j, (c as Loose).to);
      readCable(s, j, c as Loose, rows);
    }
  }
  // childStart[from + 1] counts children first, then becomes the start of each list.
  const start = s.childStart;
  let lastTo = -1;
  let lastFrom = -1;
  for (let j = 0; j < m; j++) {
    // The claim says whether the id is well formed and new, so the id itself is not read again
    // here (a test of a string's type or length reads the string).
    if (holder[j] !== j) {
      findings.push(cableIdProblem(cables[j], j, holder[j] as number));
      continue;
    }
    const fromId = fromIds.at(j);
    const toId = toIds.at(j);
    // Cables mostly follow the node list: try the node after the last one fed, and the last
    // sending end (siblings) or the last node fed (a chain), before the index. A node holds its
    // id in nodeIds only when it is the id's first holder, which is what the index answers; a
    // node that holds none is KIND_INVALID, so '' never matches.
    const nextTo = lastTo + 1;
    const to =
      nextTo < n && nodeKind[nextTo] !== KIND_INVALID && nodeIds.at(nextTo) === toId
        ? nextTo
        : nodeIndex.get(toId);
    const from =
      lastFrom >= 0 && nodeIds.at(lastFrom) === fromId
        ? lastFrom
        : lastTo >= 0 && nodeIds.at(lastTo) === fromId
          ? lastTo
          : nodeIndex.get(fromId);
    if (to !== undefined) lastTo = to;
    if (from !== undefined) lastFrom = from;
    const problem = cableProblem(s, cables, j, from, to);
    if (problem) {
      findings.push(problem);
      // A cable left out of the tree shows no conductor figures (its r and x read as not known).
      s.cableRowAt[j] = 0;
      continue;
    }
    parentCable[to as number] = j;
    cableFrom[j] = from as number;
    cableTo[j] = to as number;
    start[(from as number) + 1] = (start[(from as number) + 1] as number) + 1;
  }
  // Children as one flat list (compressed adjacency) so the walk allocates nothing per node.
  for (let i = 0; i < n; i++) start[i + 1] = (start[i + 1] as number) + (start[i] as number);
  const childCables = s.childCables;
  // `order` doubles as the fill cursor per node until the walk writes it.
  const fill = s.order;
  fill.set(start.subarray(0, n));
  // Document order can stand in for breadth-first order in the passes when every cable runs
  // forward in the list and siblings come in cable order (see DropState.walk).
  let forward = true;
  for (let j = 0; j < m; j++) {
    const from = cableFrom[j] as number;
    if (from < 0) continue;
    const at = fill[from] as number;
    childCables[at] = j;
    fill[from] = at + 1;
    const to = cableTo[j] as number;
    if (
      to < from ||
      (at > (start[from] as number) && to < (cableTo[childCables[at - 1] as number] as number))
    )
      forward = false;
  }

  const order = s.order;
  const reached = s.reached;
  let len = 0;
  if (s.root >= 0) {
    order[len++] = s.root;
    reached[s.root] = 1;
    for (let head = 0; head < len; head++) {
      const u = order[head] as number;
      const end = start[u + 1] as number;
      for (let k = start[u] as number; k < end; k++) {
        const v = cableTo[childCables[k] as number] as number;
        if (reached[v]) continue;
        reached[v] = 1;
        order[len++] = v;
      }
    }
  }
  s.orderLength = len;
  const walk = s.walk;
  s.walkIsDocumentOrder = forward;
  if (forward) {
    let w = 0;
    for (let i = 0; i < n; i++) if (reached[i]) walk[w++] = i;
  } else walk.set(order.subarray(0, len));
  if (len < n) {
    order.fill(0, len);
    classifyUnreached(s, findings);
  }
}

/** The finding for cable `j` whose id is missing (`holder` -1) or already held by an earlier cable. */
function cableIdProblem(c: unknown, j: number, holder: number): DropFinding {
  const id = isObject(c) ? c.id : undefined;
  if (holder < 0 || typeof id !== 'string')
    return {
      code: 'malformedElement',
      severity: 'error',
      message: `cable number ${j + 1} in the list has no id (got ${shown(id)}); give it a unique text id.`,
    };
  return {
    code: 'duplicateId',
    severity: 'error',
    elementId: id,
    message: `id ${id} is used by more than one cable; the later one is left out until it gets its own id.`,
  };
}

/** Which rule a cable with a valid, new id breaks in joining the tree, or undefined. */
function endsProblem(
  s: DropState,
  from: number | undefined,
  to: number | undefined,
): 'unknownEnd' | 'loop' | 'feedsSupply' | 'fromLoad' | 'fedTwice' | undefined {
  if (from === undefined || to === undefined) return 'unknownEnd';
  if (from === to) return 'loop';
  if (s.nodeKind[to] === KIND_SUPPLY) return 'feedsSupply';
  if (s.nodeKind[from] === KIND_LOAD) return 'fromLoad';
  if (s.parentCable[to] !== -1) return 'fedTwice';
  return undefined;
}

/**
 * Why cable `j` (valid, new id) cannot join the tree, or undefined. The cable is read again only
 * for the message of a problem.
 */
function cableProblem(
  s: DropState,
  cables: readonly unknown[],
  j: number,
  from: number | undefined,
  to: number | undefined,
): DropFinding | undefined {
  const code = endsProblem(s, from, to);
  if (code === undefined) return undefined;
  const cable = cables[j] as Loose;
  const id = cable.id as string;
  if (code === 'unknownEnd') {
    const field = from === undefined ? 'from' : 'to';
    return {
      code,
      severity: 'error',
      elementId: id,
      message: `cable ${id}: ${field} names no node (got ${shown(cable[field])}); connect it to an existing board, junction, load or the supply.`,
    };
  }
  const u = from as number;
  const v = to as number;
  const message =
    code === 'loop'
      ? `cable ${id} starts and ends at ${nodeLabel(s, u)}; connect its far end to another node.`
      : code === 'feedsSupply'
        ? `cable ${id} runs into ${nodeLabel(s, v)}; a cable's "to" end must be downstream of the supply. Swap its ends.`
        : code === 'fromLoad'
          ? `cable ${id} starts at ${nodeLabel(s, u)}; loads are end points. Start it at a board or junction, or swap its ends.`
          : `cable ${id}: ${nodeLabel(s, v)} is already fed by cable ${s.cableIds.at(s.parentCable[v] as number)}; a radial distribution feeds each node once. Remove one of the two or add a junction.`;
  return { code, severity: 'error', elementId: id, message };
}

/** Names each island root and each loop once; nodes hanging below them need no finding of their own. */
function classifyUnreached(s: DropState, findings: DropFinding[]): void {
  const n = s.nodeCount;
  const mark = new Uint8Array(n); // 0 unseen, 1 on the current walk, 2 done
  const walk: number[] = [];
  for (let i = 0; i < n; i++) {
    if (s.reached[i] || mark[i] || s.nodeKind[i] === KIND_INVALID) continue;
    walk.length = 0;
    let w = i;
    while (w >= 0 && mark[w] === 0 && !s.reached[w]) {
      mark[w] = 1;
      walk.push(w);
      const pc = s.parentCable[w] as number;
      w = pc >= 0 ? (s.cableFrom[pc] as number) : -1;
    }
    if (w >= 0 && mark[w] === 1) {
      const ring: string[] = [];
      let x = w;
      do {
        const pc = s.parentCable[x] as number;
        ring.push(s.cableIds.at(pc));
        x = s.cableFrom[pc] as number;
      } while (x !== w);
      ring.reverse();
      findings.push({
        code: 'loop',
        severity: 'error',
        elementId: ring[0] as string,
        message: `cables ${ring.join(', ')} form a loop; remove one of them so every node is fed from one side only. Nothing in or below the loop is solved.`,
      });
    } else if (w < 0) {
      const top = walk[walk.length - 1] as number;
      if (s.nodeKind[top] !== KIND_SUPPLY) {
        findings.push({
          code: 'island',
          severity: 'error',
          elementId: s.nodeIds.at(top),
          message: `${nodeLabel(s, top)} is fed by nothing: connect a cable to it from a board or the supply. It and everything below it are not solved.`,
        });
      }
    }
    for (const x of walk) mark[x] = 2;
  }
}
