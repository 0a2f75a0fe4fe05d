import { describe, expect, test } from 'vitest';
import { diffSizes, resized, withSizes } from '../../../src/solver/sizing/sizingCore.ts';
import { newCable } from '../../../src/model/defaults.ts';
import { smallNetwork } from '../commands/fixture.ts';
import type { Cable } from '../../../src/model/types.ts';

// Invented cables; what is checked is how a resize carries the cpc along, not published data.
function armoured(): Cable {
  return newCable('C9', 'DB1', 'L1', undefined, {
    construction: 'armouredMulticore',
    sizeMm2: 4,
    cpc: { kind: 'armour', sizeMm2: 35, material: 'steel' },
    phases: 3,
    lengthM: 20,
  });
}

describe('resizing a cable carries its cpc on the safe side', () => {
  test('flat twin-and-earth takes the pairing of the new size; a full-size core follows the line', () => {
    const te = newCable('C1', 'DB1', 'L1');
    expect(resized(te, 6).cpc.sizeMm2).toBe(2.5);
    const core = newCable('C1', 'DB1', 'L1', undefined, {
      construction: 'multicore',
      sizeMm2: 10,
      cpc: { kind: 'core', sizeMm2: 10, material: 'Cu' },
    });
    expect(resized(core, 16).cpc.sizeMm2).toBe(16);
  });

  test('armour shrinks in proportion when the cable gets smaller and stays as drawn when it gets larger', () => {
    const c = armoured();
    expect(resized(c, 2.5).cpc.sizeMm2).toBe(21.8); // 35 x 2.5 / 4 = 21.875, rounded down
    expect(resized(c, 10).cpc.sizeMm2).toBe(35);
  });

  test('resizing down then up again comes back to the armour as drawn, never compounding', () => {
    const c = armoured();
    const down = resized(resized(c, 1.5), 2.5);
    expect(down.cpc.sizeMm2).toBe(21.8);
    expect(resized(down, 4).cpc.sizeMm2).toBe(35);
    expect(resized(resized(down, 6), 16).cpc.sizeMm2).toBe(35);
  });

  test('the proposal says the armour was assumed and asks for the real one', () => {
    const doc = smallNetwork();
    doc.cables[1] = { ...armoured(), id: doc.cables[1]!.id, from: 'DB1', to: 'L1' };
    const id = doc.cables[1]!.id;
    const smaller = diffSizes(doc, withSizes(doc, new Map([[id, 2.5]])), () => 'test');
    expect(smaller.find((c) => c.field === 'cpc.sizeMm2')).toMatchObject({ from: 35, to: 21.8 });
    expect(smaller.find((c) => c.field === 'cpc.sizeMm2')!.reason).toMatch(/armour .* data sheet/);
    const larger = diffSizes(doc, withSizes(doc, new Map([[id, 10]])), () => 'test');
    expect(larger).toHaveLength(1);
    expect(larger[0]!.reason).toMatch(/armour kept at 35 mm² as drawn/);
  });
});
