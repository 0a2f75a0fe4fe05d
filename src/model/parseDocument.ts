/**
 * Reading a project file: text in, a valid document (with warnings) or messages out.
 *
 * Pure and total: it never throws and never touches anything already open, so a bad file
 * costs the user nothing. The steps, in order: safe JSON (size, depth, prototype keys, list
 * lengths), format and version (newer refused, older migrated by named steps), the schema
 * (unknown fields are dropped with a warning), then checks across elements (duplicate ids,
 * cables naming a missing node, a cable from a node to itself).
 */
import type { ProjectDocument } from './types.ts';
import { FORMAT_ID } from './types.ts';
import { safeJsonParse } from './safeJson.ts';
import { migrate } from './migrations.ts';
import { documentSchema, MAX_ELEMENTS } from './schema.ts';
import { describeElement, issueMessage, valueAt } from './issueText.ts';

export type ParseResult =
  { ok: true; doc: ProjectDocument; warnings: string[] } | { ok: false; errors: string[] };

/** Beyond this many, messages are summarised: nobody reads the 51st. */
const MAX_MESSAGES = 50;

/**
 * Reads and validates a project file.
 *
 * @example
 *   const r = parseDocument(text);
 *   if (r.ok) open(r.doc); else show(r.errors); // e.g. "cable C7: lengthM must be ..., 0 or more; got -4"
 */
export function parseDocument(text: string): ParseResult {
  try {
    return parseUnsafe(text);
  } catch (e) {
    // Only a defect in this module can land here; the user still gets a message, not a crash.
    return {
      ok: false,
      errors: [`the file could not be read (internal error: ${e instanceof Error ? e.message : String(e)})`],
    };
  }
}

function parseUnsafe(text: string): ParseResult {
  const json = safeJsonParse(text);
  if (!json.ok) return json;
  const warnings = [...json.warnings];
  const raw = json.value;

  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    return fail([
      'project file: the file must hold one JSON object (a Dropline project), not a list or a single value',
    ]);
  }
  const obj = raw as Record<string, unknown>;
  if (obj.format !== FORMAT_ID) {
    const got = obj.format === undefined ? 'no format field' : `format ${JSON.stringify(obj.format)}`;
    return fail([`project file: this is not a Dropline project (${got}; expected format "${FORMAT_ID}")`]);
  }
  const migrated = migrate(obj);
  if (!migrated.ok) return migrated;
  warnings.push(...migrated.warnings);

  const counted = countElements(obj);
  if (counted) return fail([counted]);

  let parsed = documentSchema.safeParse(obj);
  if (!parsed.success) {
    // Unknown fields (perhaps from a later minor edit or a hand edit) are dropped, not fatal.
    const unknown = parsed.error.issues.filter((i) => i.code === 'unrecognized_keys');
    if (unknown.length > 0) {
      for (const issue of unknown) {
        const holder = valueAt(obj, issue.path);
        if (holder && typeof holder === 'object' && issue.code === 'unrecognized_keys') {
          for (const key of issue.keys) delete (holder as Record<string, unknown>)[key];
          warnings.push(`${issueMessage(obj, issue)} ignored`);
        }
      }
      parsed = documentSchema.safeParse(obj);
    }
  }
  if (!parsed.success) return fail(parsed.error.issues.map((i) => issueMessage(obj, i)));

  const doc = parsed.data as ProjectDocument;
  const crossErrors = crossCheck(doc, obj);
  if (crossErrors.length > 0) return fail(crossErrors);
  warnings.push(...softChecks(doc));
  return { ok: true, doc, warnings };
}

function fail(errors: string[]): ParseResult {
  if (errors.length <= MAX_MESSAGES) return { ok: false, errors };
  return {
    ok: false,
    errors: [
      ...errors.slice(0, MAX_MESSAGES),
      `… and ${errors.length - MAX_MESSAGES} more problems of the same kinds`,
    ],
  };
}

function countElements(obj: Record<string, unknown>): string | null {
  const nodes = Array.isArray(obj.nodes) ? obj.nodes.length : 0;
  const cables = Array.isArray(obj.cables) ? obj.cables.length : 0;
  if (nodes + cables > MAX_ELEMENTS) {
    return `project file: ${nodes + cables} elements (nodes and cables); the most Dropline opens is ${MAX_ELEMENTS}`;
  }
  return null;
}

/**
 * File errors across elements. A cable naming a missing node is refused here rather than left to
 * the solver: the drawing could not show it and nothing downstream of it could be trusted, so the
 * file is inconsistent, not merely a poor design. Loops, islands and double feeds are designs the
 * editor can show and the user can fix; the solver reports them.
 */
function crossCheck(doc: ProjectDocument, raw: unknown): string[] {
  const errors: string[] = [];
  const seen = new Map<string, string>();
  doc.nodes.forEach((n, i) => {
    const where = describeElement(raw, ['nodes', i]);
    const first = seen.get(n.id);
    if (first) errors.push(`${where}: id ${n.id} is already used by ${first}; give each element its own id`);
    else seen.set(n.id, where);
  });
  doc.cables.forEach((c, i) => {
    const where = describeElement(raw, ['cables', i]);
    const first = seen.get(c.id);
    if (first) errors.push(`${where}: id ${c.id} is already used by ${first}; give each element its own id`);
    else seen.set(c.id, where);
  });
  const nodeIds = new Set(doc.nodes.map((n) => n.id));
  doc.cables.forEach((c, i) => {
    const where = describeElement(raw, ['cables', i]);
    for (const end of ['from', 'to'] as const) {
      if (!nodeIds.has(c[end])) {
        errors.push(
          `${where}: ${end} names ${c[end]}, which is not a node in this file; connect it to an existing node or delete the cable`,
        );
      }
    }
    if (c.from === c.to)
      errors.push(`${where}: from and to are both ${c.from}; a cable must join two different nodes`);
  });
  return errors;
}

/** Things worth saying that do not stop the file opening. */
function softChecks(doc: ProjectDocument): string[] {
  const warnings: string[] = [];
  for (const c of doc.cables) {
    if (c.lengthM === 0) warnings.push(`cable ${c.id}: lengthM is 0; enter the route length in metres`);
  }
  return warnings;
}
