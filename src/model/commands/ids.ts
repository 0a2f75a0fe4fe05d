import type { Id, ProjectDocument } from '../types.ts';

/** Prefix used for new ids of each element family, so a schedule reads "B2", "C14", "L7". */
export const ID_PREFIX = {
  supply: 'S',
  board: 'B',
  junction: 'J',
  load: 'L',
  cable: 'C',
} as const;

export function usedIds(doc: ProjectDocument): Set<Id> {
  const ids = new Set<Id>();
  for (const n of doc.nodes) ids.add(n.id);
  for (const c of doc.cables) ids.add(c.id);
  return ids;
}

/**
 * The next free id with a prefix: one above the highest number already used with it, so ids are
 * deterministic for a given document (commands stay pure and replayable).
 */
export function nextId(prefix: string, taken: Set<Id>): Id {
  let max = 0;
  const re = new RegExp(`^${prefix}(\\d+)$`);
  for (const id of taken) {
    const m = re.exec(id);
    if (m) max = Math.max(max, Number(m[1]));
  }
  let n = max + 1;
  while (taken.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}
