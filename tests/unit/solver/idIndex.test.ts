import { describe, expect, it } from 'vitest';
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
});
