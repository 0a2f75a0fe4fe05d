/** Plain-text helpers for the report: fixed decimals and aligned columns. */

/** A number with fixed decimals, or a dash when there is none to show. */
export function fixed(v: number | null | undefined, decimals: number): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '-';
  const s = v.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s;
}

export type Align = 'left' | 'right';

/** Columns padded to their widest cell; numbers are best right-aligned. */
export function table(header: string[], rows: string[][], align: Align[], indent = '  '): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: string[]) =>
    indent +
    cells
      .map((c, i) => (align[i] === 'right' ? c.padStart(widths[i]!) : c.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  return [line(header), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

/** Wraps text to a width, keeping an indent on every line. */
export function wrap(text: string, width: number, indent: string, firstIndent = indent): string {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let current = firstIndent;
  let empty = true;
  for (const w of words) {
    if (!empty && current.length + 1 + w.length > width) {
      lines.push(current);
      current = indent + w;
    } else {
      current += (empty ? '' : ' ') + w;
    }
    empty = false;
  }
  lines.push(current);
  return lines.join('\n');
}
