/**
 * Element ids: short, human-readable and safe to use as object keys.
 *
 * Ids appear as keys in the solver's results (`results.loads[id]`), in messages and on the
 * command line (`--working DB2`), so they are restricted to plain characters and may never be
 * the name of a built-in object property (an id `__proto__` or `constructor` used as a key
 * could reach the prototype of a results map).
 */
import type { Id, NodeKind, ProjectDocument } from './types.ts';

export const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,63}$/;

/** Names that must never be ids: every property of Object.prototype, plus `prototype`. */
export const RESERVED_IDS: ReadonlySet<string> = new Set([
  ...Object.getOwnPropertyNames(Object.prototype),
  'prototype',
]);

/** Why an id is unusable, or null when it is fine. */
export function idProblem(id: string): string | null {
  if (!ID_PATTERN.test(id)) {
    return 'must start with a letter or digit and use only letters, digits, ".", "_" and "-" (at most 64 characters)';
  }
  if (RESERVED_IDS.has(id)) return `"${id}" is a reserved word; choose another id`;
  return null;
}

/** The prefix new elements of each kind get: S1, DB1, J1, L1, C1. */
export const ID_PREFIX: Readonly<Record<NodeKind | 'cable', string>> = {
  supply: 'S',
  board: 'DB',
  junction: 'J',
  load: 'L',
  cable: 'C',
};

/**
 * The next free id with a prefix: one more than the highest number already used with it, so
 * ids of deleted elements are not reused while the document is open.
 *
 * @example
 *   nextId('L', ['L1', 'L2', 'DB1']); // 'L3'
 */
export function nextId(prefix: string, existing: Iterable<Id>): Id {
  let highest = 0;
  const taken = new Set<Id>();
  const pattern = new RegExp(`^${prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(\\d+)$`);
  for (const id of existing) {
    taken.add(id);
    const m = pattern.exec(id);
    if (m) highest = Math.max(highest, Number(m[1]));
  }
  let n = highest + 1;
  while (taken.has(`${prefix}${n}`)) n += 1;
  return `${prefix}${n}`;
}

/** Every id a document uses, nodes and cables together (they share one namespace). */
export function documentIds(doc: Pick<ProjectDocument, 'nodes' | 'cables'>): Id[] {
  return [...doc.nodes.map((n) => n.id), ...doc.cables.map((c) => c.id)];
}

/**
 * The next free id for an element kind in a document.
 *
 * @example
 *   nextIdFor(doc, 'board'); // 'DB3' when DB1 and DB2 exist
 */
export function nextIdFor(doc: Pick<ProjectDocument, 'nodes' | 'cables'>, kind: NodeKind | 'cable'): Id {
  return nextId(ID_PREFIX[kind], documentIds(doc));
}
