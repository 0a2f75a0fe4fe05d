import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('deleteElements', () => {
  test('deleting a board takes every cable that hangs on it', () => {
    const out = applyCommand(smallNetwork(), { type: 'deleteElements', ids: ['DB1'] });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.doc.nodes.map((n) => n.id)).toEqual(['S1', 'L1', 'L2']);
    expect(out.doc.cables).toEqual([]);
  });

  test('deleting a cable leaves its ends', () => {
    const out = applyCommand(smallNetwork(), { type: 'deleteElements', ids: ['C2'] });
    expect(out.ok && out.doc.cables.map((c) => c.id)).toEqual(['C1', 'C3']);
    expect(out.ok && out.doc.nodes).toHaveLength(4);
  });

  test('ids that do not exist are refused with their names', () => {
    const out = applyCommand(smallNetwork(), { type: 'deleteElements', ids: ['X9'] });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error).toMatch(/X9/);
  });

  test('undo restores board and cables; redo removes them again', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().setSelection(['DB1']);
    store.getState().dispatch({ type: 'deleteElements', ids: ['DB1'] });
    expect(store.getState().selection).toEqual([]);
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
