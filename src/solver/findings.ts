/**
 * Stable finding codes of the drop solver. Views and tests match on `code`; messages name the
 * element, the field and the fix, and may be reworded.
 */
import type { Finding } from './results.ts';

export const FINDING_CODES = [
  'malformedDocument',
  'malformedElement',
  'duplicateId',
  'noSupply',
  'manySupplies',
  'unknownEnd',
  'loop',
  'island',
  'fedTwice',
  'feedsSupply',
  'fromLoad',
  'phaseMismatch',
  'mixedPhases',
  'phaseIgnored',
  'badPhases',
  'badLength',
  'unknownSize',
  'unknownConductor',
  'badParallel',
  'badDemand',
  'badPowerFactor',
  'badDemandFactor',
  'badDiversity',
  'badSpareCapacity',
  'badCategory',
  'badVoltage',
  'voltageMismatch',
  'dataSetMismatch',
  'notJudged',
  'overLimit',
  'closeToLimit',
] as const;

export type FindingCode = (typeof FINDING_CODES)[number];

export interface DropFinding extends Finding {
  code: FindingCode;
}

/** Printable form of any value a user typed, for "got ..." in messages. */
export function shown(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  return typeof value === 'object' ? 'an object' : String(value);
}

/** Written so reading the first character is not optimised away. */
let _firstChars = 0;

/**
 * Makes each message from `from` on one flat string. A message put together from many parts
 * (template literals, figures) is held by V8 as a tree of those parts until it is read; reading
 * one character joins it, after which a finding holds about half the memory, and a large solve
 * hands the garbage collector correspondingly less to copy. The text is unchanged.
 */
export function flattenMessages(findings: readonly Finding[], from = 0): void {
  for (let k = from; k < findings.length; k++) {
    const f = findings[k]!;
    // A lazy finding has no message yet; reading it here would make it.
    if (!(f instanceof LazyFinding)) _firstChars ^= f.message.charCodeAt(0);
  }
}

/**
 * A finding whose message is put together when first read, by `make` from `args`: a large solve
 * with thousands of failed checks then makes no text until someone reads it, and holds a few
 * references instead of a string meanwhile. `message` reads like a plain property and JSON carries
 * it (toJSON).
 * @example new LazyFinding('ibOverIn', 'error', 'C1', (a: number) => `Ib ${a} A`, [40]).message // 'Ib 40 A'
 */
export class LazyFinding<A extends unknown[] = unknown[], C extends string = string> implements Finding {
  readonly code: C;
  readonly severity: Finding['severity'];
  readonly elementId: string;
  #make: ((...args: A) => string) | undefined;
  #args: A | undefined;
  #text = '';

  constructor(
    code: C,
    severity: Finding['severity'],
    elementId: string,
    make: (...args: A) => string,
    args: A,
  ) {
    this.code = code;
    this.severity = severity;
    this.elementId = elementId;
    this.#make = make;
    this.#args = args;
  }

  get message(): string {
    if (this.#make) {
      this.#text = this.#make(...(this.#args as A));
      this.#make = undefined;
      this.#args = undefined;
    }
    return this.#text;
  }

  toJSON(): Finding {
    return { code: this.code, severity: this.severity, elementId: this.elementId, message: this.message };
  }
}
