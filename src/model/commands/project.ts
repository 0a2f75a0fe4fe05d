import type { ProjectDetails, ProjectDocument, Settings } from '../types.ts';
import { FORMAT_ID } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';

export function updateDetails(doc: ProjectDocument, patch: Partial<ProjectDetails>): CommandResult {
  for (const [key, value] of Object.entries(patch)) {
    if (!(key in doc.details)) return fail(`Project details have no field "${key}".`);
    if (typeof value !== 'string') return fail(`Project details: ${key} must be text.`);
  }
  return ok({ ...doc, details: { ...doc.details, ...patch } });
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
