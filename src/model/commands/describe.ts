import type { Cable, NodeElement } from '../types.ts';

/** How messages name an element: its id and, when it has one, its name. */
export function describeNode(n: NodeElement): string {
  return n.name && n.name !== n.id ? `${n.kind} ${n.id} "${n.name}"` : `${n.kind} ${n.id}`;
}

export function describeCable(c: Cable): string {
  return c.name && c.name !== c.id ? `cable ${c.id} "${c.name}"` : `cable ${c.id}`;
}
