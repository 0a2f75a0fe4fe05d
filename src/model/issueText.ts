/**
 * Turns validator issues into messages a designer can act on: which element (kind, id and name),
 * which field, what it must be, and what the file had.
 *
 * @example
 *   // cable C7 "Yard lighting": lengthM must be a one-way route length in metres, 0 or more; got -4
 */
import type * as z from 'zod';
import { idProblem } from './ids.ts';

/** What each field holds, in words, keyed by the field's own name. */
const FIELD_TEXT: Readonly<Record<string, string>> = {
  id: 'an id',
  from: 'the id of the upstream node',
  to: 'the id of the downstream node',
  name: 'a name (text)',
  x: 'a drawing position (number)',
  y: 'a drawing position (number)',
  phases: 'the number of phases, 1 or 3',
  phase: 'the phase a single-phase load is on',
  u0V: 'the line-to-neutral voltage U0 in volts',
  uLlV: 'the line-to-line voltage in volts',
  zeOhm: 'Ze in ohms',
  pfcKa: 'the prospective fault current at the origin in kA',
  raOhm: 'the earth electrode resistance RA in ohms',
  kva: 'the transformer rating in kVA',
  impedancePct: 'the transformer impedance uk in percent',
  xOverR: 'the X/R ratio',
  diversity: 'a diversity factor (1 = none)',
  value: 'the demand in the unit given',
  powerFactor: 'a power factor',
  demandFactor: 'a demand factor (share of the connected demand, 1 = all of it)',
  startMultiple: 'the starting current as a multiple of full-load current',
  startPowerFactor: 'the power factor while starting',
  dipLimitPct: 'the largest acceptable starting dip, percent of nominal voltage',
  lengthM: 'a one-way route length in metres',
  sizeMm2: 'a cross-section in mm²',
  parallel: 'a whole number of cables in parallel',
  ratingA: 'the device rating In in amperes',
  breakingKa: 'the breaking capacity in kA',
  irMultiple: 'the long-time setting Ir as a multiple of In',
  imMultiple: 'the instantaneous setting Im as a multiple of Ir',
  idnMa: 'the RCD rated residual current in mA',
  ambientC: 'the ambient temperature in °C',
  groupedCircuits: 'a whole number of grouped circuits (this one included)',
  insulationFactor: 'a thermal insulation factor (1 = none)',
  lightingPct: 'a lighting drop limit in percent',
  otherPct: 'a drop limit for other loads in percent',
  closeThreshold: 'the share of the drop budget at which a load counts as close (e.g. 0.8)',
  dataSet: 'the id of a conductor data set',
  details: 'the project details (title, client, site, reference, revision, author, date, notes)',
  settings: 'the settings (voltages, limit profile, cable defaults and so on)',
  nodes: 'the list of nodes (supply, boards, junctions, loads)',
  cables: 'the list of cables',
  alternatives: 'the list of named alternatives (other designs kept beside this one)',
  keptAt: 'the date and time it was kept (ISO 8601 text)',
  plan: 'a place on the site plan {"xM", "yM"} (or, for the project, the site plan {"image", "widthM"})',
  xM: 'metres from the left of the site plan',
  yM: 'metres from the top of the site plan',
  widthM: 'the metres the site plan spans across',
  image: 'the site plan picture as a PNG, JPEG or SVG data URL',
  route: 'the plan measurement {"allowanceM"}',
  allowanceM: 'the metres added to the length measured on the plan',
  position: 'a drawing position {"x": number, "y": number}',
  demand: 'the demand {"value": number, "unit": "W" | "kW" | "kVA" | "A"}',
  cpc: 'the cpc {"kind", "sizeMm2", "material"}',
  customLimits: 'the custom limits {"lightingPct", "otherPct"}',
  cableDefaults: 'the defaults for new cables',
  longRunAllowance: 'true or false',
  title: 'text',
  client: 'text',
  site: 'text',
  reference: 'text',
  revision: 'text',
  author: 'text',
  date: 'a date as text (YYYY-MM-DD)',
  notes: 'text',
};

const EXPECTED_TEXT: Readonly<Record<string, string>> = {
  number: 'a finite number',
  int: 'a whole number',
  string: 'text',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list',
};

/** Reads a value from the raw (unvalidated) file by a validator path; never throws. */
export function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const key of path) {
    if (v === null || typeof v !== 'object') return undefined;
    if (!Object.prototype.hasOwnProperty.call(v, key)) return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

/** The name an alternative goes by in messages: its own name, or its place in the list. */
function alternativeLabel(root: unknown, index: number): string {
  const name = valueAt(root, ['alternatives', index, 'name']);
  return typeof name === 'string' && name.trim() !== ''
    ? `alternative "${name.slice(0, 60)}"`
    : `alternative #${index + 1}`;
}

/**
 * "cable C7 "Yard lighting"", "load L3", "settings, cable defaults", "project details"; inside a
 * named alternative, "alternative "Board moved": cable C7".
 */
export function describeElement(root: unknown, path: readonly PropertyKey[]): string {
  if (path[0] === 'alternatives' && typeof path[1] === 'number') {
    const label = alternativeLabel(root, path[1]);
    if (path.length <= 3) return label;
    return `${label}: ${describeElement(valueAt(root, ['alternatives', path[1]]), path.slice(2))}`;
  }
  const [top, index] = path;
  if ((top === 'nodes' || top === 'cables') && typeof index === 'number') {
    const el = valueAt(root, [top, index]);
    const kindValue = valueAt(el, ['kind']);
    const kind =
      top === 'cables'
        ? 'cable'
        : typeof kindValue === 'string' && ['supply', 'board', 'junction', 'load'].includes(kindValue)
          ? kindValue
          : 'node';
    const id = valueAt(el, ['id']);
    const name = valueAt(el, ['name']);
    const idText = typeof id === 'string' && id !== '' ? ` ${id.slice(0, 64)}` : ` #${index + 1} in ${top}`;
    const nameText = typeof name === 'string' && name !== '' && name !== id ? ` "${name.slice(0, 60)}"` : '';
    return `${kind}${idText}${nameText}`;
  }
  if (top === 'details') return 'project details';
  if (top === 'plan') return 'site plan';
  if (top === 'settings' && path[1] === 'cableDefaults') return 'settings, cable defaults';
  if (top === 'settings') return 'settings';
  return 'project file';
}

/** The field part of a path, below the element: "lengthM", "device.ratingA", "demand.value". */
export function describeField(path: readonly PropertyKey[]): string {
  if (path[0] === 'alternatives' && typeof path[1] === 'number')
    return path.length > 3 ? describeField(path.slice(2)) : String(path[2] ?? 'alternative');
  const skip =
    path[0] === 'nodes' || path[0] === 'cables'
      ? 2
      : path[0] === 'settings' && path[1] === 'cableDefaults'
        ? 2
        : 1;
  const rest = path.slice(skip).map(String);
  return rest.length > 0 ? rest.join('.') : String(path[path.length - 1] ?? 'file');
}

/** How a raw value reads in a message. */
export function describeValue(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (typeof v === 'string') return `the text ${JSON.stringify(v.length > 40 ? `${v.slice(0, 40)}…` : v)}`;
  if (typeof v === 'number') {
    if (Number.isNaN(v)) return 'not a number';
    return Number.isFinite(v) ? String(v) : 'a number too large to represent';
  }
  if (typeof v === 'boolean') return String(v);
  if (Array.isArray(v)) return `a list of ${v.length}`;
  return 'an object';
}

function rangeText(issue: z.core.$ZodIssue): string {
  if (issue.code === 'too_small') {
    const m = Number(issue.minimum);
    if (issue.origin === 'string') return `at least ${m} characters long`;
    if (issue.origin === 'array') return `at least ${m} items`;
    return issue.inclusive ? `${m} or more` : `above ${m}`;
  }
  if (issue.code === 'too_big') {
    const m = Number(issue.maximum);
    if (issue.origin === 'string') return `at most ${m} characters long`;
    if (issue.origin === 'array') return `at most ${m} items`;
    return issue.inclusive ? `at most ${m}` : `below ${m}`;
  }
  return '';
}

function listValues(values: readonly unknown[]): string {
  return values.map((v) => JSON.stringify(v)).join(', ');
}

/** Values a union of literals accepts (e.g. phases 1 | 3), or null for other unions. */
function unionLiterals(issue: z.core.$ZodIssue): unknown[] | null {
  if (issue.code !== 'invalid_union' || issue.errors.length === 0) return null;
  const values: unknown[] = [];
  for (const branch of issue.errors) {
    if (branch.length !== 1 || branch[0]!.code !== 'invalid_value') return null;
    values.push(...branch[0]!.values);
  }
  return values;
}

/** One validator issue as a message naming the element, the field, the rule and the value. */
export function issueMessage(root: unknown, issue: z.core.$ZodIssue): string {
  const path = issue.path;
  const where = describeElement(root, path);
  const field = describeField(path);
  const key = String(path[path.length - 1] ?? '');
  const what = FIELD_TEXT[key] ?? 'a valid value';
  const raw = valueAt(root, path);
  const got = describeValue(raw);

  switch (issue.code) {
    case 'invalid_type':
      if (raw === undefined) return `${where}: ${field} is missing; add ${what}`;
      return `${where}: ${field} must be ${what} (${EXPECTED_TEXT[issue.expected] ?? `a ${issue.expected}`}); got ${got}`;
    case 'too_small':
    case 'too_big':
      return `${where}: ${field} must be ${what}, ${rangeText(issue)}; got ${got}`;
    case 'invalid_value':
      if (raw === undefined) return `${where}: ${field} is missing; use one of ${listValues(issue.values)}`;
      return `${where}: ${field} must be one of ${listValues(issue.values)}; got ${got}`;
    case 'invalid_union': {
      const literals = unionLiterals(issue);
      if (literals && raw === undefined)
        return `${where}: ${field} is missing; use one of ${listValues(literals)}`;
      if (literals) return `${where}: ${field} must be one of ${listValues(literals)}; got ${got}`;
      const options = (issue as { options?: unknown }).options;
      if ('discriminator' in issue && Array.isArray(options)) {
        return `${where}: kind must be one of ${listValues(options)}; got ${got}`;
      }
      return `${where}: ${field} is not valid; got ${got}`;
    }
    case 'invalid_format':
    case 'custom':
      if (key === 'id' || key === 'from' || key === 'to') {
        const why = typeof raw === 'string' ? idProblem(raw) : null;
        return `${where}: ${field} ${why ?? 'is not a valid id'}; got ${got}`;
      }
      return `${where}: ${field} is not valid (${issue.message}); got ${got}`;
    case 'not_multiple_of':
      return `${where}: ${field} must be ${what}, a whole number; got ${got}`;
    case 'unrecognized_keys':
      return `${where}: unknown field${issue.keys.length > 1 ? 's' : ''} ${listValues(issue.keys)}`;
    default:
      return `${where}: ${field} is not valid (${issue.message}); got ${got}`;
  }
}
