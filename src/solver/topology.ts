/**
 * Turns the document's node and cable lists into a tree rooted at the supply: index maps, parent
 * links and a breadth-first order. Everything that does not fit a tree (a node fed twice, a cable
 * to nowhere, a loop, an island) becomes a finding and is left out; the rest is still solved.
 */
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_INVALID, KIND_JUNCTION, KIND_LOAD, KIND_SUPPLY } from './dropState.ts';
import type { DropFinding } from './findings.ts';
import { shown } from './findings.ts';

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
  const word = KIND_WORD[s.nodeKind[i] ?? KIND_INVALID] ?? 'element';
  const name =
    typeof node?.name === 'string' && node.name !== '' && node.name !== s.nodeIds[i] ? ` (${node.name})` : '';
  return `${word} ${s.nodeIds[i]}${name}`;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Fills the index, kind, parent and order arrays of `s` and pushes topology findings. */
export function buildTopology(s: DropState): void {
  const { nodes, cables, findings } = s;
  const n = s.nodeCount;
  const m = s.cableCount;
  const supplies: number[] = [];

  for (let i = 0; i < n; i++) {
    const el: unknown = nodes[i];
    const id = isObject(el) ? el.id : undefined;
    const kind = isObject(el) ? kindCode(el.kind) : undefined;
    if (typeof id !== 'string' || id === '' || kind === undefined) {
      s.nodeKind[i] = KIND_INVALID;
      s.nodeIds[i] = '';
      findings.push({
        code: 'malformedElement',
        severity: 'error',
        ...(typeof id === 'string' && id !== '' ? { elementId: id } : {}),
        message:
          typeof id !== 'string' || id === ''
            ? `node number ${i + 1} in the list has no id (got ${shown(id)}); give it a unique text id.`
            : `node ${id}: kind must be supply, board, junction or load, got ${shown(isObject(el) ? el.kind : el)}.`,
      });
      continue;
    }
    if (s.nodeIndex.has(id)) {
      s.nodeKind[i] = KIND_INVALID;
      s.nodeIds[i] = '';
      findings.push({
        code: 'duplicateId',
        severity: 'error',
        elementId: id,
        message: `id ${id} is used by more than one node; the later one is left out until it gets its own id.`,
      });
      continue;
    }
    s.nodeIndex.set(id, i);
    s.nodeIds[i] = id;
    s.nodeKind[i] = kind;
    if (kind === KIND_SUPPLY) supplies.push(i);
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
      elementId: s.nodeIds[i] as string,
      message: `${nodeLabel(s, i)}: a project has exactly one supply; remove this one or join its part of the diagram to the first supply. Nothing below it is solved.`,
    });
  }

  const childCount = new Int32Array(n + 1);
  for (let j = 0; j < m; j++) {
    const c: unknown = cables[j];
    const id = isObject(c) ? c.id : undefined;
    if (typeof id !== 'string' || id === '') {
      s.cableIds[j] = '';
      findings.push({
        code: 'malformedElement',
        severity: 'error',
        message: `cable number ${j + 1} in the list has no id (got ${shown(id)}); give it a unique text id.`,
      });
      continue;
    }
    if (s.cableIndex.has(id)) {
      s.cableIds[j] = '';
      findings.push({
        code: 'duplicateId',
        severity: 'error',
        elementId: id,
        message: `id ${id} is used by more than one cable; the later one is left out until it gets its own id.`,
      });
      continue;
    }
    s.cableIndex.set(id, j);
    s.cableIds[j] = id;
    const cable = c as Record<string, unknown>;
    const from = typeof cable.from === 'string' ? s.nodeIndex.get(cable.from) : undefined;
    const to = typeof cable.to === 'string' ? s.nodeIndex.get(cable.to) : undefined;
    if (from === undefined || to === undefined) {
      const field = from === undefined ? 'from' : 'to';
      findings.push({
        code: 'unknownEnd',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: ${field} names no node (got ${shown(cable[field])}); connect it to an existing board, junction, load or the supply.`,
      });
      continue;
    }
    if (from === to) {
      findings.push({
        code: 'loop',
        severity: 'error',
        elementId: id,
        message: `cable ${id} starts and ends at ${nodeLabel(s, from)}; connect its far end to another node.`,
      });
      continue;
    }
    if (s.nodeKind[to] === KIND_SUPPLY) {
      findings.push({
        code: 'feedsSupply',
        severity: 'error',
        elementId: id,
        message: `cable ${id} runs into ${nodeLabel(s, to)}; a cable's "to" end must be downstream of the supply. Swap its ends.`,
      });
      continue;
    }
    if (s.nodeKind[from] === KIND_LOAD) {
      findings.push({
        code: 'fromLoad',
        severity: 'error',
        elementId: id,
        message: `cable ${id} starts at ${nodeLabel(s, from)}; loads are end points. Start it at a board or junction, or swap its ends.`,
      });
      continue;
    }
    if (s.parentCable[to] !== -1) {
      const first = s.cableIds[s.parentCable[to] as number];
      findings.push({
        code: 'fedTwice',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: ${nodeLabel(s, to)} is already fed by cable ${first}; a radial distribution feeds each node once. Remove one of the two or add a junction.`,
      });
      continue;
    }
    s.parentCable[to] = j;
    s.cableFrom[j] = from;
    s.cableTo[j] = to;
    childCount[from] = (childCount[from] as number) + 1;
  }

  // Children as one flat list (compressed adjacency) so the walk allocates nothing per node.
  const start = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) start[i + 1] = (start[i] as number) + (childCount[i] as number);
  const fill = start.slice(0, n);
  const childCables = new Int32Array(start[n] as number);
  for (let j = 0; j < m; j++) {
    const from = s.cableFrom[j] as number;
    if (from < 0) continue;
    const at = fill[from] as number;
    childCables[at] = j;
    fill[from] = at + 1;
  }

  let len = 0;
  if (s.root >= 0) {
    s.order[len++] = s.root;
    s.reached[s.root] = 1;
    for (let head = 0; head < len; head++) {
      const u = s.order[head] as number;
      const end = start[u + 1] as number;
      for (let k = start[u] as number; k < end; k++) {
        const v = s.cableTo[childCables[k] as number] as number;
        if (s.reached[v]) continue;
        s.reached[v] = 1;
        s.order[len++] = v;
      }
    }
  }
  s.orderLength = len;
  if (len < n) classifyUnreached(s, findings);
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
        ring.push(s.cableIds[pc] as string);
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
          elementId: s.nodeIds[top] as string,
          message: `${nodeLabel(s, top)} is fed by nothing: connect a cable to it from a board or the supply. It and everything below it are not solved.`,
        });
      }
    }
    for (const x of walk) mark[x] = 2;
  }
}
