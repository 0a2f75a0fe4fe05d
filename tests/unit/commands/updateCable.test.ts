import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('updateCable', () => {
  test('changes a length', () => {
    const out = applyCommand(smallNetwork(), { type: 'updateCable', id: 'C3', patch: { lengthM: 55 } });
    expect(out.ok && out.doc.cables.find((c) => c.id === 'C3')?.lengthM).toBe(55);
  });

  test.each([
    [{ lengthM: -4 }, /cable C3: length must be a positive number of metres, got -4/],
    [{ sizeMm2: 0 }, /size must be a positive cross-section/],
    [{ parallel: 1.5 }, /parallel must be a whole number/],
    [{ to: 'S1' }, /is a supply and cannot be fed/],
    [{ colour: 'red' }, /a cable has no field "colour"/],
  ])('refuses %o with a message naming the cable and the field', (patch, reason) => {
    const out = applyCommand(smallNetwork(), { type: 'updateCable', id: 'C3', patch: patch as never });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error).toMatch(reason);
  });

  test('the store refuses a bad value, keeps the document and says why', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'updateCable', id: 'C3', patch: { lengthM: -1 } });
    expect(store.getState().doc).toBe(doc);
    expect(store.getState().canUndo).toBe(false);
    expect(store.getState().notice?.text).toMatch(/length must be a positive number/);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'updateCable', id: 'C3', patch: { lengthM: 55 } });
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
