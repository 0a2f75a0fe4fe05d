import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { IdIndex } from '../../../src/solver/idIndex.ts';
import { IdList } from '../../../src/solver/idList.ts';

describe('IdIndex', () => {
  it('keeps the first holder of an id and reads like a map', () => {
    const ids = new IdList(4);
    const index = new IdIndex(ids, 4);
    expect(index.claim('B1', 0)).toBe(0);
    expect(index.claim('L2', 1)).toBe(1);
    expect(index.claim('B1', 2)).toBe(0);
    expect(index.claim('__proto__', 3)).toBe(3);
    expect(index.get('B1')).toBe(0);
    expect(index.get('B9')).toBeUndefined();
    expect(index.get(7)).toBeUndefined();
    expect(index.has('__proto__')).toBe(true);
    expect(index.size).toBe(3);
    expect([...index]).toEqual([
      ['B1', 0],
      ['L2', 1],
      ['__proto__', 3],
    ]);
  });

  it('moves to a plain map when the table is too crowded, losing nothing', () => {
    const n = 300;
    const ids = new IdList(n);
    // A capacity hint far too small fills the table and forces the fallback.
    const index = new IdIndex(ids, 1);
    for (let i = 0; i < n; i++) expect(index.claim(`C${i % 200}`, i)).toBe(i % 200);
    for (let i = 0; i < 200; i++) expect(index.get(`C${i}`)).toBe(i);
    expect(index.get('C200')).toBeUndefined();
    expect(index.size).toBe(200);
  });

  it('the id list keeps every position across its blocks and reads out of range as no id', () => {
    const n = 10_000; // crosses two block boundaries (4,096 each)
    const ids = new IdList(n);
    expect(ids.length).toBe(n);
    for (let i = 0; i < n; i += 3) ids.set(i, `E${i}`);
    for (let i = 0; i < n; i++) expect(ids.at(i)).toBe(i % 3 === 0 ? `E${i}` : '');
    expect(ids.at(-1)).toBe('');
    expect(ids.at(n)).toBe('');
    expect(new IdList(0).at(0)).toBe('');
    const index = new IdIndex(ids, n);
    expect(index.claim('E4095', 4095)).toBe(4095);
    expect(index.claim('E4095', 4097)).toBe(4095);
    expect(index.get('E4095')).toBe(4095);
  });

  /** Claims `list` in order and counts every holder and lookup that differs from a Map's answer. */
  function claimAll(list: readonly string[]): { index: IdIndex; wrong: number } {
    const ids = new IdList(list.length);
    const index = new IdIndex(ids, list.length);
    const first = new Map<string, number>();
    let wrong = 0;
    list.forEach((id, i) => {
      if (!first.has(id)) first.set(id, i);
      if (index.claim(id, i) !== first.get(id)) wrong++;
    });
    for (const [id, i] of first) if (index.get(id) !== i) wrong++;
    if (index.size !== first.size) wrong++;
    return { index, wrong };
  }

  it('keeps its table for the id schemes documents use: numbered runs, shared numbers, leading zeros, plain names', () => {
    // Runs of numbered ids land together (idIndex.ts); these check that no usual scheme crowds
    // the table into the fallback map, and that every id is still found.
    const schemes: string[][] = [
      Array.from({ length: 100_000 }, (_, i) => `C${i}`),
      // One counter shared by several prefixes, as the editor's ids of a busy drawing.
      Array.from({ length: 60_000 }, (_, i) => `${'BLLLLLJ'[i % 7]}${i}`),
      // Many rooms, each with circuits 1 to 3: every number shared by thousands of prefixes.
      Array.from({ length: 6_000 }, (_, i) => `Room ${Math.floor(i / 3)} circuit ${(i % 3) + 1}`),
      Array.from({ length: 5_000 }, (_, i) => `L${String(i % 2500).padStart(i < 2500 ? 1 : 4, '0')}`),
      Array.from({ length: 20_000 }, (_, i) => `pump-${i.toString(36)}-east`),
    ];
    for (const list of schemes) {
      const { index, wrong } = claimAll(list);
      expect([list[0], wrong, index.crowded]).toEqual([list[0], 0, false]);
    }
    // "L7" and "L0007" are different ids, though their numbers are the same.
    const { index } = claimAll(['L7', 'L0007', 'L07']);
    expect([index.get('L7'), index.get('L0007'), index.get('L07')]).toEqual([0, 1, 2]);
  });

  it('answers like a Map for any list of ids, repeats included', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.oneof(
            fc.string({ maxLength: 6 }),
            fc.nat(300).map((k) => `C${k}`),
          ),
          { maxLength: 400 },
        ),
        (list) => claimAll(list).wrong === 0,
      ),
      { numRuns: 200 },
    );
  });
});
