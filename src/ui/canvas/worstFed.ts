/**
 * Which load sets the status a board, junction or sub-main shows in the drop views. Their glyph and
 * colour are those of the worst load they feed, while their own figure is their own (small) drop
 * from the origin; naming the load beside it keeps "✕ Σ 0.10 %" from reading as "0.10 % is over".
 */
import type { Id, ProjectDocument } from '../../model/types.ts';
import type { LoadResult, Results } from '../../solver/results.ts';

export interface WorstFed {
  loadId: Id;
  load: LoadResult;
}

/**
 * For every node upstream of a load that is close to or over its limit, that load (the one using
 * the largest share of its budget). Loads within their limit mark nothing: the status then needs
 * no explaining. Cost: the paths of the close and over loads only.
 */
export function worstLoadsFed(doc: ProjectDocument, results: Results): Map<Id, WorstFed> {
  const out = new Map<Id, WorstFed>();
  // Built at the first close or over load: a redraw of a design within its limits skips them.
  let farEnd: Map<Id, Id> | undefined;
  let origin: Id | undefined;
  for (const [loadId, load] of Object.entries(results.loads)) {
    if (load.status !== 'close' && load.status !== 'over') continue;
    if (!farEnd) {
      farEnd = new Map(doc.cables.map((c) => [c.id, c.to]));
      origin = doc.nodes.find((n) => n.kind === 'supply')?.id;
    }
    const upstream = [origin, ...load.path.map((c) => farEnd!.get(c))];
    for (const id of upstream) {
      if (id === undefined || id === loadId) continue;
      const held = out.get(id);
      if (!held || load.budgetUsed > held.load.budgetUsed) out.set(id, { loadId, load });
    }
  }
  return out;
}
