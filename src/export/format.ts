/** Display formatting only: how many digits a figure shows. No electrical arithmetic here. */
import type { Percent } from '../solver/results.ts';

/** A figure to three significant digits, or two decimals under 10, without float noise. */
export function fmt(value: number | null | undefined, digits?: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  if (digits !== undefined) return value.toFixed(digits);
  const abs = Math.abs(value);
  if (abs >= 100) return value.toFixed(0);
  if (abs >= 10) return value.toFixed(1);
  if (abs >= 0.01 || abs === 0) return value.toFixed(2);
  return value.toPrecision(2);
}

/** A percentage with its basis, e.g. "3.12 % of U0". */
export function fmtPct(p: Percent | null | undefined): string {
  if (!p) return '–';
  return `${fmt(p.value, 2)} % of ${p.basis}`;
}

/** A working figure: four significant digits, so a coefficient like 0.00393 keeps its digits. */
export function fmtExact(value: number): string {
  if (!Number.isFinite(value)) return '–';
  return String(Number(value.toPrecision(4)));
}

export function fmtValue(value: number | string, unit: string): string {
  const v = typeof value === 'number' ? fmtExact(value) : value;
  return unit ? `${v} ${unit}` : v;
}
