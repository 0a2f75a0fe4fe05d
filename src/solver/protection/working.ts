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

/** Rounds for display in messages only; results keep full precision. */
export function fmt(n: number, digits = 3): string {
  return Number.isFinite(n) ? String(Number(n.toPrecision(digits))) : String(n);
}
