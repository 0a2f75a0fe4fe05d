import type { Board, Id, Junction, Load, NodeElement, Position, ProjectDocument, Supply } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';
import { describeNode } from './describe.ts';
import { connectCable } from './cables.ts';
import { documentIds } from '../ids.ts';
import { MAX_ALLOWANCE_M } from '../schema.ts';
import { withMeasuredLengths } from '../planLengths.ts';

type Editable<T> = Partial<Omit<T, 'id' | 'kind'>>;

/** Fields of any node kind; a key the element's kind does not have is refused by name. */
export type NodePatch = Editable<Supply> & Editable<Board> & Editable<Junction> & Editable<Load>;

const COMMON = ['name', 'position'];
const FIELDS: Record<NodeElement['kind'], readonly string[]> = {
  supply: [
    ...COMMON,
    'phases',
    'u0V',
    'earthing',
    'zeOhm',
    'zeSource',
    'pfcKa',
    'ownership',
    'transformer',
    'raOhm',
  ],
  board: [...COMMON, 'diversity', 'spareCapacityPct'],
  junction: COMMON,
  load: [
    ...COMMON,
    'loadKind',
    'category',
    'demand',
    'powerFactor',
    'phases',
    'phase',
    'demandFactor',
    'distributed',
    'motor',
  ],
};

function finitePosition(p: Position): boolean {
  return Number.isFinite(p.x) && Number.isFinite(p.y);
}

/**
 * Adds `node`; with `feedFrom`, also a cable from that node to it. With `routeAllowanceM` as well,
 * and both ends placed on the site plan, the new cable is measured on the plan (its route plus the
 * allowance) instead of taking the default length.
 */
export function addNode(
  doc: ProjectDocument,
  node: NodeElement,
  feedFrom?: Id,
  routeAllowanceM?: number,
): CommandResult {
  const taken = new Set(documentIds(doc));
  if (!node.id) return fail('A new element needs an id.');
  if (taken.has(node.id))
    return fail(`Id ${node.id} is already used; pick another for the new ${node.kind}.`);
  if (!finitePosition(node.position))
    return fail(`${describeNode(node)}: position must be two finite numbers.`);
  const added: ProjectDocument = { ...doc, nodes: [...doc.nodes, node] };
  if (feedFrom === undefined) return ok(added, [node.id]);
  if (
    routeAllowanceM !== undefined &&
    !(Number.isFinite(routeAllowanceM) && routeAllowanceM >= 0 && routeAllowanceM <= MAX_ALLOWANCE_M)
  )
    return fail(
      `The allowance added to a length measured on the plan must be 0 to ${MAX_ALLOWANCE_M} metres; got ${routeAllowanceM}.`,
    );
  const from = doc.nodes.find((n) => n.id === feedFrom);
  const measured = routeAllowanceM !== undefined && from?.plan !== undefined && node.plan !== undefined;
  const fed = connectCable(
    added,
    feedFrom,
    node.id,
    undefined,
    measured ? { route: { allowanceM: routeAllowanceM } } : undefined,
  );
  if (!fed.ok) return fed;
  const out = measured ? withMeasuredLengths(fed.doc, new Set(fed.created)) : fed.doc;
  return ok(out, [node.id, ...fed.created]);
}

/**
 * Merges a patch into one node. `undefined` for an optional field (e.g. `motor`) removes it.
 */
export function updateNode(doc: ProjectDocument, id: Id, patch: NodePatch): CommandResult {
  const index = doc.nodes.findIndex((n) => n.id === id);
  const node = doc.nodes[index];
  if (!node) return fail(`No element with id ${id}; it may have been deleted.`);
  const allowed = FIELDS[node.kind];
  for (const key of Object.keys(patch)) {
    if (key === 'id' || key === 'kind')
      return fail(`${describeNode(node)}: the ${key} of an element cannot be changed.`);
    if (!allowed.includes(key)) return fail(`${describeNode(node)}: a ${node.kind} has no field "${key}".`);
  }
  if (patch.position && !finitePosition(patch.position)) {
    return fail(`${describeNode(node)}: position must be two finite numbers.`);
  }
  if (patch.name !== undefined && patch.name.trim() === '') {
    return fail(`${describeNode(node)}: the name cannot be empty; type a name or keep the old one.`);
  }
  const merged: Record<string, unknown> = { ...node };
  for (const [key, value] of Object.entries(patch)) {
    if (value === undefined) delete merged[key];
    else merged[key] = value;
  }
  const nodes = doc.nodes.slice();
  nodes[index] = merged as unknown as NodeElement;
  return ok({ ...doc, nodes });
}

export function moveNodes(doc: ProjectDocument, moves: { id: Id; position: Position }[]): CommandResult {
  const byId = new Map(moves.map((m) => [m.id, m.position]));
  for (const m of moves) {
    if (!doc.nodes.some((n) => n.id === m.id)) return fail(`Cannot move ${m.id}: no such element.`);
    if (!finitePosition(m.position)) return fail(`Cannot move ${m.id}: position must be two finite numbers.`);
  }
  const nodes = doc.nodes.map((n) => {
    const p = byId.get(n.id);
    return p && (p.x !== n.position.x || p.y !== n.position.y) ? { ...n, position: { x: p.x, y: p.y } } : n;
  });
  return ok({ ...doc, nodes });
}
