/**
 * Shared containment runs. A cable whose installation names a `run` (a tray, trunking, duct or
 * trench, by name) is grouped with every other cable in the same run: its `groupedCircuits` is the
 * number of circuits the run holds, so the grouping factor Cg follows when a circuit joins or
 * leaves it. Names match ignoring case and spaces at either end. A cable of n in parallel counts
 * as n circuits (common practice: each cable of the group heats the others; check against the
 * notes of the licensed grouping table).
 *
 * Every command keeps the counts (applyCommand), as it keeps lengths measured on the site plan,
 * so the solver reads `groupedCircuits` as typed and every export shows the same figure.
 */
import type { Cable, ProjectDocument } from './types.ts';

/** The key a run name is matched by. */
export function runKey(name: string): string {
  return name.trim().toLowerCase();
}

/** Circuits in each run of `cables`, by run key. */
export function runCounts(cables: readonly Cable[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const c of cables) {
    const run = c.installation?.run;
    if (run === undefined) continue;
    const key = runKey(run);
    counts.set(key, (counts.get(key) ?? 0) + Math.max(1, Math.floor(c.parallel) || 1));
  }
  return counts;
}

/** The ids of the cables in the run named `name`, in document order. */
export function runMembers(cables: readonly Cable[], name: string): string[] {
  const key = runKey(name);
  return cables
    .filter((c) => c.installation?.run !== undefined && runKey(c.installation.run) === key)
    .map((c) => c.id);
}

/**
 * The document with every run member's `groupedCircuits` set to its run's count. Returns the same
 * document when nothing changes (most documents have no run at all).
 */
export function withRunCounts(doc: ProjectDocument): ProjectDocument {
  if (!doc.cables.some((c) => c.installation?.run !== undefined)) return doc;
  const counts = runCounts(doc.cables);
  let cables: Cable[] | null = null;
  doc.cables.forEach((c, k) => {
    const inst = c.installation;
    if (inst?.run === undefined) return;
    const n = counts.get(runKey(inst.run)) ?? 1;
    if (inst.groupedCircuits === n) return;
    cables ??= doc.cables.slice();
    cables[k] = { ...c, installation: { ...inst, groupedCircuits: n } };
  });
  return cables ? { ...doc, cables } : doc;
}
