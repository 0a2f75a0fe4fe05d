/**
 * Id → position index of the document's nodes or cables, the first holder of an id keeping it.
 * An open-addressing table over an Int32Array: about twice as fast to build and to ask as a Map
 * at 100,000 ids, and it allocates nothing per id. It reads as a ReadonlyMap, so code that asks
 * `index.get(id)` works unchanged. Should ids collide too often (a hostile file), it moves
 * everything into a plain Map and carries on, so the cost stays linear.
 *
 * Ids that end in a number (C1, C2, … DB3, L17: what the editor makes) land in neighbouring slots
 * when their numbers are neighbours, in runs of 16 (one 64-byte line of the table); the runs are
 * spread over the table at random. Claiming a document's ids in order then writes the table about
 * a line per 16 ids instead of one random line per id. Measured on the benchmark machine, the
 * topology's node loop took about 1 ms less at 100,000 elements with these homes and no longer at
 * 10,000; filling a table of that size on its own cost the same either way, so where the time
 * went is not certain (the runs also keep the table's lines in cache beside the document's).
 */
import type { IdList } from './idList.ts';

const MAX_PROBE = 48;
/**
 * A slot holds position + 1 in its low 24 bits and 8 bits of the id's own hash above them, so a
 * probe passes over another id's slot without reading that id (a cache miss at 100,000 ids) in
 * all but 1 case in 256.
 */
const TAG_BITS = 0xff000000 | 0;
const POSITION_BITS = 0x00ffffff;
/** Neighbouring numbers share a run of this many slots (16 four-byte slots: one cache line). */
const RUN = 16;
/**
 * Probe step. Odd, so in a power-of-two table a probe can reach every slot; one more than a run,
 * so a run that meets another moves to the next line in one step and stays together.
 */
const STEP = RUN + 1;

/** The tag of the id last given to homeOf (set there, so the id is read in one pass). */
let tagOfLast = 0;

/** A 32-bit finaliser: every input bit moves every output bit. */
function mix(h: number): number {
  h ^= h >>> 15;
  h = Math.imul(h, 0x2c1b3c6d);
  h ^= h >>> 13;
  h = Math.imul(h, 0x297a2d39);
  return h ^ (h >>> 16);
}

/**
 * The home slot of `id` (before the table's mask), its tag left in `tagOfLast`. One pass over the
 * UTF-16 code units: FNV-1a of the whole id gives the tag; the id's trailing decimal digits (its
 * number) and the FNV-1a of what comes before them (its prefix) give the home. Numbers that follow
 * each other under one prefix get homes that follow each other within a run; where the run lies
 * is a mix of the prefix and the run's number, so runs and prefixes spread over the table.
 */
function homeOf(id: string): number {
  let h = 0x811c9dc5;
  let prefix = h;
  let num = 0;
  for (let k = 0; k < id.length; k++) {
    const c = id.charCodeAt(k);
    h = Math.imul(h ^ c, 0x01000193);
    if (c >= 48 && c <= 57) num = (Math.imul(num, 10) + (c - 48)) | 0;
    else {
      num = 0;
      prefix = h;
    }
  }
  tagOfLast = mix(h) & TAG_BITS;
  // The prefix also shifts where a run starts, so ids that differ only in their prefix
  // ("Pump 1", "Fan 1") do not all take the same place within their runs.
  const q = (num + prefix) | 0;
  return (mix(prefix ^ Math.imul(q >>> 4, 0x9e3779b1)) & ~(RUN - 1)) | (q & (RUN - 1));
}

export class IdIndex implements ReadonlyMap<string, number> {
  private readonly slots: Int32Array;
  private readonly mask: number;
  private fallback: Map<string, number> | undefined;
  private count = 0;

  /** `ids` is the state's id list ('' where an element has no id of its own); claims write it. */
  constructor(
    private readonly ids: IdList,
    capacity: number,
  ) {
    let size = 2 * RUN;
    while (size < capacity * 2) size *= 2;
    this.slots = new Int32Array(size);
    this.mask = size - 1;
    // Positions beyond what a slot can hold: a plain map from the start.
    if (capacity >= POSITION_BITS) this.fallback = new Map();
  }

  /**
   * Gives `id` to position `i` unless an earlier position holds it; returns the holder (`i` when
   * the id is new). Positions must be claimed in increasing order.
   */
  claim(id: string, i: number): number {
    if (this.fallback) {
      const held = this.fallback.get(id);
      if (held !== undefined) return held;
      this.fallback.set(id, i);
      this.ids.set(i, id);
      this.count++;
      return i;
    }
    const { slots, mask, ids } = this;
    let at = homeOf(id) & mask;
    const tag = tagOfLast;
    for (let probe = 0; probe < MAX_PROBE; probe++) {
      const entry = slots[at] as number;
      if (entry === 0) {
        slots[at] = (i + 1) | tag;
        ids.set(i, id);
        this.count++;
        return i;
      }
      const held = (entry & POSITION_BITS) - 1;
      if ((entry & TAG_BITS) === tag && ids.at(held) === id) return held;
      at = (at + STEP) & mask;
    }
    this.fallback = new Map();
    for (let k = 0; k < i; k++) {
      const held = ids.at(k);
      if (held !== '') this.fallback.set(held, k);
    }
    return this.claim(id, i);
  }

  get(id: unknown): number | undefined {
    if (typeof id !== 'string') return undefined;
    if (this.fallback) return this.fallback.get(id);
    const { slots, mask, ids } = this;
    let at = homeOf(id) & mask;
    const tag = tagOfLast;
    for (let probe = 0; probe < MAX_PROBE; probe++) {
      const entry = slots[at] as number;
      if (entry === 0) return undefined;
      const held = (entry & POSITION_BITS) - 1;
      if ((entry & TAG_BITS) === tag && ids.at(held) === id) return held;
      at = (at + STEP) & mask;
    }
    return undefined;
  }

  has(id: unknown): boolean {
    return this.get(id) !== undefined;
  }

  /** True once the table has given way to a plain Map (ids collided too often). */
  get crowded(): boolean {
    return this.fallback !== undefined;
  }

  get size(): number {
    return this.count;
  }

  *entries(): MapIterator<[string, number]> {
    for (let k = 0; k < this.ids.length; k++) {
      const id = this.ids.at(k);
      if (id !== '') yield [id, k];
    }
  }

  *keys(): MapIterator<string> {
    for (const [id] of this.entries()) yield id;
  }

  *values(): MapIterator<number> {
    for (const [, k] of this.entries()) yield k;
  }

  [Symbol.iterator](): MapIterator<[string, number]> {
    return this.entries();
  }

  forEach(callback: (value: number, key: string, map: ReadonlyMap<string, number>) => void): void {
    for (const [id, k] of this.entries()) callback(k, id, this);
  }
}
