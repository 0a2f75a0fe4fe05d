import type { ProjectDocument } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';
import { updateCable, type CablePatch } from './cables.ts';
import { updateNode, type NodePatch } from './nodes.ts';

/** One accepted change from a proposal list (cable sizing, phase balancing). */
export type ProposedChange =
  { target: 'cable'; id: string; patch: CablePatch } | { target: 'node'; id: string; patch: NodePatch };

/** Applies every change or none: one refused change refuses the lot and says which. */
export function applyProposals(doc: ProjectDocument, changes: ProposedChange[]): CommandResult {
  if (changes.length === 0) return fail('No changes were accepted; tick at least one proposal.');
  let current = doc;
  for (const change of changes) {
    const out =
      change.target === 'cable'
        ? updateCable(current, change.id, change.patch)
        : updateNode(current, change.id, change.patch);
    if (!out.ok) return fail(`Proposal for ${change.id} not applied, so none were: ${out.error}`);
    current = out.doc;
  }
  return ok(current);
}
