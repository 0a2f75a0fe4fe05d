/**
 * Reading a project file: text in, a valid document (with warnings) or messages out.
 *
 * Pure and total: it never throws and never touches anything already open, so a bad file
 * costs the user nothing. The steps, in order: safe JSON (size, depth, prototype keys, list
 * lengths), format and version (newer refused, older migrated by named steps), the schema
 * (unknown fields are dropped with a warning), then checks across elements (duplicate ids,
 * cables naming a missing node, a cable from a node to itself).
 */
import type { Alternative, Cable, NodeElement, ProjectDocument } from './types.ts';
import { FORMAT_ID } from './types.ts';
import { safeJsonParse } from './safeJson.ts';
import { migrate } from './migrations.ts';
import { measureOnPlan } from './planLengths.ts';
import { runCounts, runKey } from './runs.ts';
import type * as z from 'zod';
import { alternativeSchema, alternativesListSchema, documentSchema, MAX_ELEMENTS } from './schema.ts';
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

  let parsed = validate(obj);
  if (!parsed.success) {
    // Unknown fields (perhaps from a later minor edit or a hand edit) are dropped, not fatal.
    const unknown = parsed.issues.filter((i) => i.code === 'unrecognized_keys');
    if (unknown.length > 0) {
      for (const issue of unknown) {
        const holder = valueAt(obj, issue.path);
        if (holder && typeof holder === 'object' && issue.code === 'unrecognized_keys') {
          for (const key of issue.keys) delete (holder as Record<string, unknown>)[key];
          warnings.push(`${issueMessage(obj, issue)} ignored`);
        }
      }
      parsed = validate(obj);
    }
  }
  if (!parsed.success) return fail(parsed.issues.map((i) => issueMessage(obj, i)));

  const doc = parsed.doc;
  const crossErrors = crossCheck(doc, obj);
  if (crossErrors.length > 0) return fail(crossErrors);
  warnings.push(...softChecks(doc));
  return { ok: true, doc, warnings };
}

type Validated = { success: true; doc: ProjectDocument } | { success: false; issues: z.core.$ZodIssue[] };

/**
 * The schema, applied to the current design and then to each alternative on its own. One pass
 * over the whole file would gather an alternative's issues level by level into one call's
 * arguments, which a list of 100,000 bad elements overflows.
 */
function validate(obj: Record<string, unknown>): Validated {
  const { alternatives, ...rest } = obj;
  const top = documentSchema.safeParse({ ...rest, alternatives: [] });
  const issues: z.core.$ZodIssue[] = top.success ? [] : [...top.error.issues];
  const list = alternativesListSchema.safeParse(alternatives);
  const kept: Alternative[] = [];
  if (!list.success) {
    for (const issue of list.error.issues) issues.push({ ...issue, path: ['alternatives', ...issue.path] });
  } else {
    list.data.forEach((alt, k) => {
      const one = alternativeSchema.safeParse(alt);
      if (one.success) kept.push(one.data as Alternative);
      else
        for (const issue of one.error.issues)
          issues.push({ ...issue, path: ['alternatives', k, ...issue.path] });
    });
  }
  if (!top.success || issues.length > 0) return { success: false, issues };
  return { success: true, doc: { ...(top.data as ProjectDocument), alternatives: kept } };
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

function listLength(v: unknown): number {
  return Array.isArray(v) ? v.length : 0;
}

/** Nodes and cables in the file, its alternatives' included. */
function countElements(obj: Record<string, unknown>): string | null {
  let total = listLength(obj.nodes) + listLength(obj.cables);
  const alternatives = Array.isArray(obj.alternatives) ? obj.alternatives : [];
  // Only the first few alternatives are counted here; a longer list is the schema's message.
  for (const alt of alternatives.slice(0, 64)) {
    if (alt !== null && typeof alt === 'object' && !Array.isArray(alt)) {
      const a = alt as Record<string, unknown>;
      total += listLength(a.nodes) + listLength(a.cables);
    }
  }
  if (total > MAX_ELEMENTS) {
    return `project file: ${total} elements (nodes and cables${alternatives.length > 0 ? ', its alternatives included' : ''}); the most Dropline opens is ${MAX_ELEMENTS}`;
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
  const errors = designErrors(doc, raw, []);
  const names = new Map<string, number>();
  doc.alternatives.forEach((alt, k) => {
    errors.push(...designErrors(alt, raw, ['alternatives', k]));
    const key = alt.name.toLowerCase();
    const first = names.get(key);
    if (first !== undefined)
      errors.push(
        `${describeElement(raw, ['alternatives', k])}: the name is already used by alternative #${first + 1}; give each alternative its own name`,
      );
    else names.set(key, k);
  });
  return errors;
}

/** Ids unique and every cable joining two existing, different nodes, in one design. */
function designErrors(
  doc: { nodes: NodeElement[]; cables: Cable[] },
  raw: unknown,
  at: readonly PropertyKey[],
): string[] {
  const errors: string[] = [];
  const seen = new Map<string, string>();
  doc.nodes.forEach((n, i) => {
    const where = describeElement(raw, [...at, 'nodes', i]);
    const first = seen.get(n.id);
    if (first) errors.push(`${where}: id ${n.id} is already used by ${first}; give each element its own id`);
    else seen.set(n.id, where);
  });
  doc.cables.forEach((c, i) => {
    const where = describeElement(raw, [...at, 'cables', i]);
    const first = seen.get(c.id);
    if (first) errors.push(`${where}: id ${c.id} is already used by ${first}; give each element its own id`);
    else seen.set(c.id, where);
  });
  const nodeIds = new Set(doc.nodes.map((n) => n.id));
  doc.cables.forEach((c, i) => {
    const where = describeElement(raw, [...at, 'cables', i]);
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
  // A length measured on the plan that no longer matches it (a hand edit): read as written, said.
  const byId = new Map(doc.nodes.map((n) => [n.id, n]));
  for (const c of doc.cables) {
    const m = measureOnPlan(c, byId);
    if (m && Math.abs(m.lengthM - c.lengthM) > 0.05)
      warnings.push(
        `cable ${c.id}: lengthM is ${c.lengthM} m but its route on the site plan measures ${m.lengthM} m (${m.distanceM} m + ${m.allowanceM} m allowance); the file's length is used until the cable is edited or an end moved on the plan`,
      );
  }
  // A grouped count that no longer matches its shared run (a hand edit): read as written, said.
  const counts = runCounts(doc.cables);
  for (const c of doc.cables) {
    const inst = c.installation;
    if (inst?.run === undefined) continue;
    const n = counts.get(runKey(inst.run)) ?? 1;
    if (inst.groupedCircuits !== n)
      warnings.push(
        `cable ${c.id}: installation.groupedCircuits is ${inst.groupedCircuits} but run "${inst.run}" holds ${n} circuits; the file's count is used until a cable of the run is edited`,
      );
  }
  return warnings;
}
