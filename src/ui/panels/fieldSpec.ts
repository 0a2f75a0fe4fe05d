/**
 * Field descriptions for the details forms: what a field is called, its unit, how to read it from
 * an element, how a valid value becomes a patch, and which values are acceptable. Plain data and
 * functions, so validation is tested without rendering anything.
 */

export interface NumberRule {
  min?: number;
  max?: number;
  /** The value must be strictly greater than `min` (a length or a power factor cannot be 0). */
  minExclusive?: boolean;
  integer?: boolean;
}

interface Base<E> {
  key: string;
  label: string;
  /** Shown under the field: what the value means, where it usually comes from. */
  hint?: string;
  /** Only shown when it applies, e.g. the phase of a single-phase load. */
  shown?: (el: E) => boolean;
}

export interface NumberField<E, P> extends Base<E> {
  kind: 'number';
  unit: string;
  rule: NumberRule;
  /** Where 0 means "not entered yet" (a new cable's length): shown empty, with this prompt. */
  unsetPrompt?: string;
  get: (el: E) => number | undefined;
  set: (el: E, value: number) => P;
}

export interface TextField<E, P> extends Base<E> {
  kind: 'text';
  /** Empty text is refused where the element needs a name to be found again. */
  required?: boolean;
  /** A further check on the text, e.g. a calendar date; returns the reason it is refused. */
  check?: (value: string) => string | null;
  get: (el: E) => string;
  set: (el: E, value: string) => P;
}

export interface Option {
  value: string;
  label: string;
}

export interface ChoiceField<E, P> extends Base<E> {
  kind: 'choice';
  /** Fixed, or worked out from the element (the sizes on offer depend on the material). */
  options: readonly Option[] | ((el: E) => readonly Option[]);
  get: (el: E) => string;
  set: (el: E, value: string) => P;
}

export interface ToggleField<E, P> extends Base<E> {
  kind: 'toggle';
  get: (el: E) => boolean;
  set: (el: E, on: boolean) => P;
}

export type FieldSpec<E, P> = NumberField<E, P> | TextField<E, P> | ChoiceField<E, P> | ToggleField<E, P>;

export interface FieldGroup<E, P> {
  title: string;
  shown?: (el: E) => boolean;
  fields: FieldSpec<E, P>[];
}

export function optionsOf<E, P>(field: ChoiceField<E, P>, el: E): readonly Option[] {
  return typeof field.options === 'function' ? field.options(el) : field.options;
}

export type Parsed<T> = { ok: true; value: T } | { ok: false; reason: string };

function describeRange(rule: NumberRule, unit: string): string {
  const u = unit ? ` ${unit}` : '';
  const lo =
    rule.min === undefined ? undefined : `${rule.minExclusive ? 'greater than' : 'at least'} ${rule.min}${u}`;
  const hi = rule.max === undefined ? undefined : `at most ${rule.max}${u}`;
  const whole = rule.integer ? 'a whole number' : 'a number';
  if (lo && hi) return `${whole} ${lo} and ${hi}`;
  if (lo) return `${whole} ${lo}`;
  if (hi) return `${whole} ${hi}`;
  return whole;
}

/**
 * Reads what the user typed into a number field. A trailing unit that matches the field's own
 * (e.g. "25 m" in a metres field) and a decimal comma are accepted; anything else is refused with
 * a reason that names the element, the field and what to type instead.
 */
export function parseNumber(
  text: string,
  label: string,
  unit: string,
  rule: NumberRule,
  owner: string,
): Parsed<number> {
  let t = text.trim();
  if (unit && t.toLowerCase().endsWith(unit.toLowerCase())) t = t.slice(0, -unit.length).trim();
  t = t.replace(/(\d),(\d)/, '$1.$2');
  const expect = describeRange(rule, unit);
  const where = `${label} of ${owner}`;
  if (t === '') return { ok: false, reason: `${where} is empty: type ${expect}.` };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) {
    return { ok: false, reason: `${where}: "${text.trim()}" is not a number; type ${expect}.` };
  }
  const value = Number(t);
  if (!Number.isFinite(value)) return { ok: false, reason: `${where} is too large; type ${expect}.` };
  const low = rule.min !== undefined && (rule.minExclusive ? value <= rule.min : value < rule.min);
  const high = rule.max !== undefined && value > rule.max;
  const frac = rule.integer === true && !Number.isInteger(value);
  if (low || high || frac) return { ok: false, reason: `${where} must be ${expect}; ${value} is not.` };
  return { ok: true, value };
}

export function parseText(
  text: string,
  label: string,
  required: boolean | undefined,
  owner: string,
  check?: (value: string) => string | null,
): Parsed<string> {
  const value = text.trim();
  if (required && value === '')
    return { ok: false, reason: `${label} of ${owner} cannot be empty; type a name.` };
  const problem = check?.(value);
  if (problem) return { ok: false, reason: problem };
  return { ok: true, value };
}

/** The text a number field starts with: the stored value, without float noise. */
export function formatNumber(value: number | undefined): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  return String(Number(value.toPrecision(12)));
}
