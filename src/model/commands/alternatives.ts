/**
 * Named alternatives: other designs for the same project, kept beside the current one so they
 * can be compared with it or opened in its place. Each keeps its own elements and settings; the
 * project details are shared. Every change here is one undo step, like any edit.
 */
import type { Alternative, ProjectDocument } from '../types.ts';
import { MAX_ALTERNATIVE_NAME, MAX_ALTERNATIVES, MAX_ELEMENTS } from '../schema.ts';
import { fail, ok, type CommandResult } from './result.ts';

/** Why `name` cannot name an alternative (other than `except`), or null when it can. */
export function alternativeNameProblem(doc: ProjectDocument, name: string, except?: string): string | null {
  if (typeof name !== 'string' || name.trim() === '')
    return 'An alternative needs a name, for example "Board moved to the store".';
  if (name.trim() !== name) return 'An alternative name cannot start or end with a space.';
  if (name.length > MAX_ALTERNATIVE_NAME)
    return `An alternative name is at most ${MAX_ALTERNATIVE_NAME} characters; this one has ${name.length}.`;
  const key = name.toLowerCase();
  const taken = doc.alternatives.some((a) => a.name.toLowerCase() === key && a.name !== except);
  return taken ? `There is already an alternative called "${name}"; choose another name.` : null;
}

function find(doc: ProjectDocument, name: string): number {
  return doc.alternatives.findIndex((a) => a.name === name);
}

function elementCount(d: { nodes: unknown[]; cables: unknown[] }): number {
  return d.nodes.length + d.cables.length;
}

/** The current design as an alternative called `name`. */
function snapshot(doc: ProjectDocument, name: string, note: string, keptAt: string): Alternative {
  return {
    name,
    note,
    keptAt,
    settings: structuredClone(doc.settings),
    nodes: structuredClone(doc.nodes),
    cables: structuredClone(doc.cables),
  };
}

/**
 * Keeps the current design as an alternative. With `replace`, an alternative of that name is
 * overwritten by the current design (its note kept unless a new one is given).
 */
export function keepAlternative(
  doc: ProjectDocument,
  name: string,
  note: string,
  keptAt: string,
  replace = false,
): CommandResult {
  const at = find(doc, name);
  if (replace && at >= 0) {
    const old = doc.alternatives[at] as Alternative;
    const alternatives = [...doc.alternatives];
    alternatives[at] = snapshot(doc, name, note === '' ? old.note : note, keptAt);
    const total = elementCount(doc) + alternatives.reduce((sum, a) => sum + elementCount(a), 0);
    if (total > MAX_ELEMENTS)
      return fail(`Keeping it would make the project ${total} elements; the most is ${MAX_ELEMENTS}.`);
    return ok({ ...doc, alternatives });
  }
  const problem = alternativeNameProblem(doc, name);
  if (problem) return fail(problem);
  if (doc.alternatives.length >= MAX_ALTERNATIVES)
    return fail(
      `A project keeps at most ${MAX_ALTERNATIVES} alternatives; delete one you no longer need first.`,
    );
  const total = 2 * elementCount(doc) + doc.alternatives.reduce((sum, a) => sum + elementCount(a), 0);
  if (total > MAX_ELEMENTS)
    return fail(
      `Keeping another copy would make the project ${total} elements; the most is ${MAX_ELEMENTS}. Delete an alternative first.`,
    );
  return ok({ ...doc, alternatives: [...doc.alternatives, snapshot(doc, name, note, keptAt)] });
}

/**
 * Puts the alternative's design on the canvas in place of the current one. The alternative stays
 * in the list. With `keepCurrentAs`, the current design is first kept under that name, so nothing
 * is lost; either way one undo brings the current design back.
 */
export function openAlternative(
  doc: ProjectDocument,
  name: string,
  keepCurrentAs: string | undefined,
  keptAt: string,
): CommandResult {
  const at = find(doc, name);
  if (at < 0) return fail(`There is no alternative called "${name}".`);
  let base = doc;
  if (keepCurrentAs !== undefined) {
    const kept = keepAlternative(doc, keepCurrentAs, '', keptAt);
    if (!kept.ok) return kept;
    base = kept.doc;
  }
  const alt = base.alternatives[at] as Alternative;
  return ok({
    ...base,
    settings: structuredClone(alt.settings),
    nodes: structuredClone(alt.nodes),
    cables: structuredClone(alt.cables),
  });
}

/** Renames an alternative or changes its note. */
export function updateAlternative(
  doc: ProjectDocument,
  name: string,
  patch: { name?: string; note?: string },
): CommandResult {
  const at = find(doc, name);
  if (at < 0) return fail(`There is no alternative called "${name}".`);
  if (patch.name !== undefined && patch.name !== name) {
    const problem = alternativeNameProblem(doc, patch.name, name);
    if (problem) return fail(problem);
  }
  if (patch.note !== undefined && typeof patch.note !== 'string')
    return fail('An alternative note must be text.');
  const alternatives = [...doc.alternatives];
  const old = alternatives[at] as Alternative;
  alternatives[at] = { ...old, name: patch.name ?? old.name, note: patch.note ?? old.note };
  return ok({ ...doc, alternatives });
}

export function deleteAlternative(doc: ProjectDocument, name: string): CommandResult {
  const at = find(doc, name);
  if (at < 0) return fail(`There is no alternative called "${name}".`);
  return ok({ ...doc, alternatives: doc.alternatives.filter((_, k) => k !== at) });
}

/**
 * An alternative as a project document of its own (the project's details, the alternative's
 * settings and elements, no alternatives), for solving, comparing and exporting it.
 */
export function alternativeDocument(doc: ProjectDocument, alt: Alternative): ProjectDocument {
  return {
    format: doc.format,
    version: doc.version,
    details: doc.details,
    settings: alt.settings,
    nodes: alt.nodes,
    cables: alt.cables,
    alternatives: [],
  };
}
