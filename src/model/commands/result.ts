import type { Id, ProjectDocument } from '../types.ts';

export type CommandResult =
  | {
      ok: true;
      doc: ProjectDocument;
      /** Ids of elements the command created (the store selects them). */
      created: Id[];
    }
  | { ok: false; error: string };

export function ok(doc: ProjectDocument, created: Id[] = []): CommandResult {
  return { ok: true, doc, created };
}

export function fail(error: string): CommandResult {
  return { ok: false, error };
}
