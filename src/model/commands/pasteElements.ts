import type { Cable, Id, NodeElement, Position, ProjectDocument } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';
import { ID_PREFIX, documentIds, nextId } from '../ids.ts';

/**
 * Adds copies of nodes and the cables between them with fresh ids. A cable whose ends are not both
 * among the pasted nodes is left out, because it would join the copy to the original's network.
 */
export function pasteElements(
  doc: ProjectDocument,
  nodes: NodeElement[],
  cables: Cable[],
  offset: Position,
): CommandResult {
  if (nodes.length === 0) return fail('Nothing to paste: copy some elements first.');
  if (!Number.isFinite(offset.x) || !Number.isFinite(offset.y))
    return fail('Paste offset must be two finite numbers.');
  const taken = new Set(documentIds(doc));
  const renamed = new Map<Id, Id>();
  const newNodes = nodes.map((n) => {
    const id = nextId(ID_PREFIX[n.kind], taken);
    taken.add(id);
    renamed.set(n.id, id);
    const name = n.name === n.id ? id : `${n.name} (copy)`;
    return {
      ...structuredClone(n),
      id,
      name,
      position: { x: n.position.x + offset.x, y: n.position.y + offset.y },
    };
  });
  const newCables: Cable[] = [];
  for (const c of cables) {
    const from = renamed.get(c.from);
    const to = renamed.get(c.to);
    if (!from || !to) continue;
    const id = nextId(ID_PREFIX.cable, taken);
    taken.add(id);
    newCables.push({ ...structuredClone(c), id, name: c.name === c.id ? id : `${c.name} (copy)`, from, to });
  }
  const created = [...newNodes.map((n) => n.id), ...newCables.map((c) => c.id)];
  return ok({ ...doc, nodes: [...doc.nodes, ...newNodes], cables: [...doc.cables, ...newCables] }, created);
}
