import type { Id, ProjectDocument } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';

/** Removes nodes and cables by id; the cables that hang on a removed node go with it. */
export function deleteElements(doc: ProjectDocument, ids: Id[]): CommandResult {
  const gone = new Set(ids);
  const known = new Set([...doc.nodes.map((n) => n.id), ...doc.cables.map((c) => c.id)]);
  const unknown = ids.filter((id) => !known.has(id));
  if (unknown.length === ids.length && ids.length > 0)
    return fail(`Nothing to delete: no element ${unknown.join(', ')}.`);
  const nodes = doc.nodes.filter((n) => !gone.has(n.id));
  const left = new Set(nodes.map((n) => n.id));
  const cables = doc.cables.filter((c) => !gone.has(c.id) && left.has(c.from) && left.has(c.to));
  if (nodes.length === doc.nodes.length && cables.length === doc.cables.length) return ok(doc);
  return ok({ ...doc, nodes, cables });
}
