/**
 * Revision labels. A design is issued as A, B, C … or P01, P02 … or 1, 2 …: the next label follows
 * the same pattern (common practice for drawing and calculation revisions).
 */

/**
 * The revision after `current`: its trailing number plus one (keeping its width), or the next
 * letter (Z → AA), or A when there is none yet.
 * @example nextRevision('P03') // 'P04'
 * @example nextRevision('C') // 'D'
 */
export function nextRevision(current: string): string {
  const text = current.trim();
  if (text === '') return 'A';
  const numbered = /^(.*?)(\d+)$/.exec(text);
  if (numbered) {
    const digits = numbered[2]!;
    return `${numbered[1]}${String(Number(digits) + 1).padStart(digits.length, '0')}`;
  }
  const letters = /^(.*?)([A-Z]+|[a-z]+)$/.exec(text);
  if (letters) {
    const word = letters[2]!;
    const upper = word === word.toUpperCase();
    const a = upper ? 65 : 97;
    const codes = [...word].map((c) => c.charCodeAt(0) - a);
    let k = codes.length - 1;
    while (k >= 0 && codes[k] === 25) codes[k--] = 0;
    if (k < 0) codes.unshift(0);
    else codes[k]!++;
    return `${letters[1]}${String.fromCharCode(...codes.map((c) => c + a))}`;
  }
  return `${text}.1`;
}
