/**
 * The designs a comparison can pick from: the one on the canvas and each named alternative, each
 * solved once and remembered while its objects stay the same (an alternative never changes in
 * place, so its results hold until it is replaced).
 */
import type { Alternative, ProjectDocument } from '../../model/types.ts';
import { alternativeDocument } from '../../model/commands/alternatives.ts';
import type { Results } from '../../solver/results.ts';
import { safeSolve } from '../../store/safeSolve.ts';
import type { DesignSide } from '../../solver/compare/compareDesigns.ts';

/** '' is the design on the canvas; otherwise an alternative's name. */
export type DesignKey = string;
export const CANVAS: DesignKey = '';
export const CANVAS_LABEL = 'On the canvas';

const solved = new WeakMap<Alternative, Results>();

export function alternativeSide(doc: ProjectDocument, alt: Alternative): DesignSide {
  const altDoc = alternativeDocument(doc, alt);
  let results = solved.get(alt);
  if (!results) {
    results = safeSolve(altDoc);
    solved.set(alt, results);
  }
  return { label: alt.name, doc: altDoc, results };
}

export function designSide(doc: ProjectDocument, results: Results, key: DesignKey): DesignSide | null {
  if (key === CANVAS) return { label: CANVAS_LABEL, doc, results };
  const alt = doc.alternatives.find((a) => a.name === key);
  return alt ? alternativeSide(doc, alt) : null;
}

/**
 * The alternative that holds exactly the design on the canvas (so opening another loses nothing),
 * or null.
 */
export function keptAs(doc: ProjectDocument): string | null {
  const text = JSON.stringify([doc.settings, doc.nodes, doc.cables]);
  return doc.alternatives.find((a) => JSON.stringify([a.settings, a.nodes, a.cables]) === text)?.name ?? null;
}

/** A free name such as "Option 3". */
export function suggestedName(doc: ProjectDocument, stem = 'Option'): string {
  const taken = new Set(doc.alternatives.map((a) => a.name.toLowerCase()));
  for (let k = doc.alternatives.length + 1; ; k++) {
    const name = `${stem} ${k}`;
    if (!taken.has(name.toLowerCase())) return name;
  }
}

/** "3 Feb 2025, 09:30" in the user's locale, or the text as kept when it is not a date. */
export function keptText(keptAt: string): string {
  const t = Date.parse(keptAt);
  if (!Number.isFinite(t)) return keptAt;
  return new Date(t).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}
