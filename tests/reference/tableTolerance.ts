/**
 * How a derived value is compared with a printed table value (check-values.md "General cautions"):
 * within ±1 in the last printed digit once rounded to the printed precision, or within ±2 % at
 * 25 mm² and above.
 */
export function decimalsOf(printed: string): number {
  const dot = printed.indexOf('.');
  return dot < 0 ? 0 : printed.length - dot - 1;
}

export function agreesWithTable(derived: number, printed: string, sizeMm2: number, relTol = 0.02): boolean {
  const value = Number(printed);
  const d = decimalsOf(printed);
  const unit = 10 ** -d;
  const rounded = Math.round(derived / unit) * unit;
  if (Math.abs(rounded - value) <= unit * 1.0000001) return true;
  return sizeMm2 >= 25 && Math.abs(derived - value) <= relTol * value;
}
