import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('updateDetails', () => {
  test('sets project details and refuses unknown fields', () => {
    const out = applyCommand(smallNetwork(), {
      type: 'updateDetails',
      patch: { client: 'Test client', revision: 'B' },
    });
    expect(out.ok && out.doc.details).toMatchObject({ client: 'Test client', revision: 'B' });
    const bad = applyCommand(smallNetwork(), { type: 'updateDetails', patch: { colour: 'x' } as never });
    expect(!bad.ok && bad.error).toMatch(/no field "colour"/);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'updateDetails', patch: { title: 'Renamed' } });
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
