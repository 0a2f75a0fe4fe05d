import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { solve } from '../../../src/solver/solve.ts';
import type { Device } from '../../../src/model/types.ts';
import { smallNetwork } from './fixture.ts';

const DEVICE: Device = { type: 'mcb', curve: 'B', ratingA: 10, breakingKa: 6 };

function withDevice() {
  const doc = smallNetwork();
  doc.cables = doc.cables.map((c) => (c.id === 'C2' ? { ...c, name: 'Lights', device: DEVICE } : c));
  return doc;
}

describe('splitCable', () => {
  test('halves the cable through a new junction; the upstream part keeps id, name and device', () => {
    const doc = withDevice();
    const out = applyCommand(doc, { type: 'splitCable', id: 'C2' });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const j = out.doc.nodes.find((n) => n.id === 'J1');
    expect(j).toMatchObject({ kind: 'junction' });
    const up = out.doc.cables.find((c) => c.id === 'C2')!;
    const onward = out.doc.cables.find((c) => c.id === 'C4')!;
    expect(up).toMatchObject({ from: 'DB1', to: 'J1', lengthM: 15, name: 'Lights', device: DEVICE });
    expect(onward).toMatchObject({
      from: 'J1',
      to: 'L1',
      lengthM: 15,
      sizeMm2: 1.5,
      name: 'Lights (beyond J1)',
    });
    expect(onward.device).toBeUndefined();
    const original = doc.cables.find((c) => c.id === 'C2')!;
    for (const key of ['material', 'insulation', 'construction', 'cpc', 'phases', 'parallel'] as const) {
      expect(onward[key]).toEqual(original[key]);
    }
    expect(out.created).toEqual(['J1', 'C4']);
    expect(doc.cables).toHaveLength(3); // the input is untouched
  });

  test('splits at a ratio, to the centimetre, and the two parts add up to the whole', () => {
    const out = applyCommand(smallNetwork(), { type: 'splitCable', id: 'C3', ratio: 1 / 3 });
    if (!out.ok) throw new Error(out.error);
    const up = out.doc.cables.find((c) => c.id === 'C3')!;
    const onward = out.doc.cables.find((c) => c.from === 'J1')!;
    expect(up.lengthM).toBe(13.33);
    expect(onward.lengthM).toBe(26.67);
    expect(up.lengthM + onward.lengthM).toBeCloseTo(40, 9);
  });

  test('the load sees the same drop: equal conductors in series add (Ohm’s law)', () => {
    const doc = smallNetwork();
    const before = solve(doc).nodes.L1!.cumulativePct.value;
    const out = applyCommand(doc, { type: 'splitCable', id: 'C2', ratio: 0.4 });
    if (!out.ok) throw new Error(out.error);
    const after = solve(out.doc);
    expect(after.nodes.L1!.cumulativePct.value).toBeCloseTo(before, 9);
    expect(after.nodes.L1!.path).toHaveLength(3);
  });

  test.each([
    [{ id: 'NOPE' }, /No cable with id NOPE/],
    [{ id: 'C2', ratio: 0 }, /between 0 and 1/],
    [{ id: 'C2', ratio: 1 }, /between 0 and 1/],
    [{ id: 'C2', ratio: Number.NaN }, /between 0 and 1/],
  ])('refuses %o with a reason', (args, reason) => {
    const out = applyCommand(smallNetwork(), { type: 'splitCable', ...args });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error).toMatch(reason);
  });

  test('refuses a cable too short to split at that point', () => {
    const doc = smallNetwork();
    doc.cables[1] = { ...doc.cables[1]!, lengthM: 0.01 };
    const out = applyCommand(doc, { type: 'splitCable', id: 'C2' });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error).toMatch(/too short to split/);
  });

  test('undo brings the single cable back and redo splits it again, in one step each', () => {
    const doc = withDevice();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'splitCable', id: 'C2' });
    const after = store.getState().doc;
    expect(after.cables).toHaveLength(4);
    expect(after.nodes).toHaveLength(doc.nodes.length + 1);
    expect(store.getState().selection).toEqual(['J1', 'C4']);
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    expect(store.getState().canUndo).toBe(false);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
