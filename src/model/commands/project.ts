import type { ProjectDetails, ProjectDocument, Settings } from '../types.ts';
import { FORMAT_ID } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';
import { MAX_REVISIONS } from '../schema.ts';

const REVISION_FIELDS = ['revision', 'date', 'description', 'by', 'checked'] as const;

/** What is wrong with a revision table, or null. */
function revisionsProblem(rows: unknown): string | null {
  if (!Array.isArray(rows)) return 'Project details: revisions must be a list of revision rows.';
  if (rows.length > MAX_REVISIONS)
    return `Project details: at most ${MAX_REVISIONS} revision rows; got ${rows.length}. Remove the oldest.`;
  for (const [k, row] of rows.entries()) {
    const r = row as Record<string, unknown>;
    const field = REVISION_FIELDS.find((f) => typeof r?.[f] !== 'string');
    if (field) return `Revision row ${k + 1}: ${field} must be text.`;
    const extra = Object.keys(r).find((f) => !(REVISION_FIELDS as readonly string[]).includes(f));
    if (extra) return `Revision row ${k + 1} has no field "${extra}".`;
  }
  return null;
}

/** Merges a patch into the project details; `revisions` replaces the whole revision table. */
export function updateDetails(doc: ProjectDocument, patch: Partial<ProjectDetails>): CommandResult {
  for (const [key, value] of Object.entries(patch)) {
    if (key === 'revisions') {
      const problem = revisionsProblem(value);
      if (problem) return fail(problem);
      continue;
    }
    if (!(key in doc.details)) return fail(`Project details have no field "${key}".`);
    if (typeof value !== 'string') return fail(`Project details: ${key} must be text.`);
  }
  const details = { ...doc.details, ...patch };
  // An empty table is no table: the file keeps its shape from before revisions were kept.
  if (details.revisions?.length === 0) delete details.revisions;
  return ok({ ...doc, details });
}

export function updateSettings(doc: ProjectDocument, patch: Partial<Settings>): CommandResult {
  for (const key of Object.keys(patch)) {
    if (!(key in doc.settings)) return fail(`Settings have no field "${key}".`);
  }
  if (patch.closeThreshold !== undefined && !(patch.closeThreshold > 0 && patch.closeThreshold < 1)) {
    return fail(
      `Settings: the close-to-limit threshold is a share of the budget between 0 and 1, got ${patch.closeThreshold}.`,
    );
  }
  for (const key of ['u0V', 'uLlV'] as const) {
    const v = patch[key];
    if (v !== undefined && !(Number.isFinite(v) && v > 0))
      return fail(`Settings: ${key} must be a positive number of volts, got ${v}.`);
  }
  return ok({ ...doc, settings: { ...doc.settings, ...patch } });
}

/** Opening a file or starting a new project; the caller has validated the document already. */
export function replaceDocument(doc: ProjectDocument): CommandResult {
  if (!doc || doc.format !== FORMAT_ID || !Array.isArray(doc.nodes) || !Array.isArray(doc.cables)) {
    return fail('That is not a Dropline project document; nothing was changed.');
  }
  return ok(doc);
}
