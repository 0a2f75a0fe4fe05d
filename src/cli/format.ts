/** Plain-text helpers for the report: fixed decimals and aligned columns. */

/** A number with fixed decimals, or a dash when there is none to show. */
export function fixed(v: number | null | undefined, decimals: number): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '-';
  const s = v.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s;
}

export type Align = 'left' | 'right';

/** Narrowest a text column is squeezed to when a table is too wide. */
const MIN_WRAPPED = 12;

/** `text` in lines of at most `width` characters, broken between words (a longer word is cut). */
function cellLines(text: string, width: number): string[] {
  if (text.length <= width) return [text];
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(' ')) {
    let w = word;
    while (w.length > width) {
      if (current) lines.push(current);
      lines.push(w.slice(0, width));
      w = w.slice(width);
      current = '';
    }
    if (!current) current = w;
    else if (current.length + 1 + w.length <= width) current += ` ${w}`;
    else {
      lines.push(current);
      current = w;
    }
  }
  if (current) lines.push(current);
  return lines;
}

/**
 * Columns padded to their widest cell; numbers are best right-aligned. With `maxWidth`, a table
 * wider than that has its widest columns wrapped, one at a time (a row then takes several lines),
 * so it reads in a terminal of that width.
 */
export function table(
  header: string[],
  rows: string[][],
  align: Align[],
  indent = '  ',
  maxWidth = Infinity,
): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const total = () => indent.length + widths.reduce((a, w) => a + w, 0) + 2 * (widths.length - 1);
  while (total() > maxWidth) {
    let widest = -1;
    widths.forEach((w, i) => {
      if (w > MIN_WRAPPED && (widest < 0 || w > widths[widest]!)) widest = i;
    });
    if (widest < 0) break;
    // A character at a time from the widest, so the squeezed columns end up alike.
    widths[widest] = widths[widest]! - 1;
  }
  const line = (cells: string[]) => {
    const wrapped = cells.map((c, i) => cellLines(c, widths[i]!));
    const height = Math.max(1, ...wrapped.map((w) => w.length));
    const out: string[] = [];
    for (let k = 0; k < height; k++)
      out.push(
        (
          indent +
          wrapped
            .map((w, i) => {
              const c = w[k] ?? '';
              return align[i] === 'right' ? c.padStart(widths[i]!) : c.padEnd(widths[i]!);
            })
            .join('  ')
        ).trimEnd(),
      );
    return out.join('\n');
  };
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
