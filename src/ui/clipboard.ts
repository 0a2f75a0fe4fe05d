/**
 * Copy and paste within the editor. The clipboard holds plain copies of elements; a copy made in
 * one project can be pasted into another opened later in the same tab.
 */
import type { Cable, Id, NodeElement, ProjectDocument } from '../model/types.ts';

export interface Clip {
  nodes: NodeElement[];
  cables: Cable[];
}

let clip: Clip | null = null;
let pasteCount = 0;

/** Copies the selected nodes and the cables between them (and selected cables with both ends selected). */
export function copySelection(doc: ProjectDocument, selection: Id[]): number {
  const ids = new Set(selection);
  const nodes = doc.nodes.filter((n) => ids.has(n.id));
  const nodeIds = new Set(nodes.map((n) => n.id));
  const cables = doc.cables.filter((c) => nodeIds.has(c.from) && nodeIds.has(c.to));
  if (nodes.length === 0) return 0;
  clip = structuredClone({ nodes, cables });
  pasteCount = 0;
  return nodes.length;
}

export function takeClip(): (Clip & { step: number }) | null {
  if (!clip) return null;
  pasteCount++;
  return { ...clip, step: pasteCount };
}
