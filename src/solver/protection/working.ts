import type { Working, WorkingInput } from '../results.ts';

/** Builds a Working record; inputs are [name, value, unit, source] tuples to keep call sites short. */
export function working(
  key: string,
  title: string,
  formula: string,
  inputs: readonly (readonly [string, number | string, string, string])[],
  value: number | string,
  unit: string,
  note?: string,
): Working {
  const list: WorkingInput[] = inputs.map(([name, v, u, source]) => ({ name, value: v, unit: u, source }));
  const w: Working = { key, title, formula, inputs: list, result: { value, unit } };
  if (note) w.note = note;
  return w;
}

/** Exact powers of ten, 10^0 to 10^22 (every one is a double). */
const POW10 = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
/** Three significant digits 100..999 as written without trailing zeros ('1', '12', '123'). */
const DIGITS = Array.from({ length: 900 }, (_, k) => String(k + 100).replace(/0+$/, ''));

/**
 * fmt(n, 3) without toPrecision's text round trip, for the magnitudes messages carry; undefined
 * where it cannot be sure of giving the same text (near a rounding tie, or outside 1e-6..1e15),
 * and fmt then takes the long way. n = r x 10^(e-2) with r the three significant digits.
 */
function threeDigits(n: number): string | undefined {
  const a = n < 0 ? -n : n;
  if (!(a >= 1e-6 && a < 1e15)) return undefined;
  let e = Math.floor(Math.log10(a));
  // One rounding either way (the powers are exact): far from a tie the digits come out right.
  let scaled = e >= 2 ? a / POW10[e - 2]! : a * POW10[2 - e]!;
  if (scaled < 100) {
    e--;
    scaled = e >= 2 ? a / POW10[e - 2]! : a * POW10[2 - e]!;
  } else if (scaled >= 1000) {
    e++;
    scaled = e >= 2 ? a / POW10[e - 2]! : a * POW10[2 - e]!;
  }
  if (!(scaled >= 100 && scaled < 1000)) return undefined;
  const whole = Math.floor(scaled);
  const frac = scaled - whole;
  if (frac > 0.5 - 1e-9 && frac < 0.5 + 1e-9) return undefined;
  let r = frac > 0.5 ? whole + 1 : whole;
  if (r === 1000) {
    r = 100;
    e++;
  }
  // Where the point goes, as Number#toString writes it; the usual places are written once.
  const point = e + 1;
  let text: string;
  if (point >= -3 && point <= 3) {
    const at = (r - 100) * 7 + point + 3;
    text = WRITTEN[at] ??= write(r, point);
  } else text = write(r, point);
  return n < 0 ? `-${text}` : text;
}

/** r x 10^(point - 3) in Number#toString's fixed notation. */
function write(r: number, point: number): string {
  const digits = DIGITS[r - 100]!;
  const k = digits.length;
  return point >= k
    ? digits + '0'.repeat(point - k)
    : point > 0
      ? `${digits.slice(0, point)}.${digits.slice(point)}`
      : `0.${'0'.repeat(-point)}${digits}`;
}

/** Texts already written, by digits and point position (-3 to 3): most message figures repeat. */
const WRITTEN: (string | undefined)[] = new Array<string | undefined>(900 * 7);

/**
 * Rounds for display in messages only; results keep full precision.
 * @example fmt(0.0123456) // '0.0123'
 */
export function fmt(n: number, digits = 3): string {
  if (digits === 3) {
    const quick = threeDigits(n);
    if (quick !== undefined) return quick;
  }
  return Number.isFinite(n) ? String(Number(n.toPrecision(digits))) : String(n);
}
