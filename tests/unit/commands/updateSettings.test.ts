import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('updateSettings', () => {
  test('sets the limit profile and refuses a threshold outside 0..1', () => {
    const out = applyCommand(smallNetwork(), {
      type: 'updateSettings',
      patch: { limitProfile: 'iecPrivate' },
    });
    expect(out.ok && out.doc.settings.limitProfile).toBe('iecPrivate');
    const bad = applyCommand(smallNetwork(), { type: 'updateSettings', patch: { closeThreshold: 80 } });
    expect(!bad.ok && bad.error).toMatch(/between 0 and 1, got 80/);
  });

  test('a change of settings re-solves', () => {
    const store = createEditorStore(smallNetwork());
    const before = store.getState().results;
    store.getState().dispatch({ type: 'updateSettings', patch: { limitProfile: 'iecPrivate' } });
    expect(store.getState().results).not.toBe(before);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'updateSettings', patch: { closeThreshold: 0.7 } });
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
