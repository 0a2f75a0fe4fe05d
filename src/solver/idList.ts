/**
 * Element ids by position, held in blocks of 4,096 instead of one array. A single JavaScript array
 * of 50,000 entries is a large object to V8: it gets pages of its own, freshly mapped and faulted in
 * on every solve (about a millisecond for each such array, measured on the benchmark machine),
 * where blocks of 32 kB come from the young generation at the cost of a pointer bump.
 */

/** What readers need: the id at a position, '' where the position holds no id of its own. */
export interface IdsByPosition {
  readonly length: number;
  /** @example ids.at(3) // 'C4', or '' for a malformed or duplicate element */
  at(i: number): string;
}

const SHIFT = 12;
const BLOCK = 1 << SHIFT;
const MASK = BLOCK - 1;

export class IdList implements IdsByPosition {
  readonly length: number;
  readonly #blocks: string[][];

  /** `length` positions, every one '' until `set`. */
  constructor(length: number) {
    this.length = length;
    const count = Math.ceil(length / BLOCK);
    this.#blocks = new Array<string[]>(count);
    for (let b = 0; b < count; b++)
      this.#blocks[b] = new Array<string>(Math.min(BLOCK, length - b * BLOCK)).fill('');
  }

  at(i: number): string {
    // Out of range reads as no id, as a hole of a plain array would.
    return (i >= 0 && i < this.length && this.#blocks[i >> SHIFT]![i & MASK]) || '';
  }

  set(i: number, id: string): void {
    this.#blocks[i >> SHIFT]![i & MASK] = id;
  }
}

/**
 * Any values by position, in blocks like IdList (a plain array this long would be a large object,
 * mapped afresh on every solve).
 */
export class ValueList {
  readonly #blocks: unknown[][];

  constructor(length: number) {
    const count = Math.ceil(length / BLOCK);
    this.#blocks = new Array<unknown[]>(count);
    for (let b = 0; b < count; b++)
      this.#blocks[b] = new Array<unknown>(Math.min(BLOCK, length - b * BLOCK)).fill(undefined);
  }

  /** The value at `i`; undefined where none was set. */
  at(i: number): unknown {
    return this.#blocks[i >> SHIFT]![i & MASK];
  }

  set(i: number, value: unknown): void {
    this.#blocks[i >> SHIFT]![i & MASK] = value;
  }
}
