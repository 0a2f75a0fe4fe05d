import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { newProject } from '../../../src/model/defaults.ts';
import { smallNetwork } from './fixture.ts';

describe('replaceDocument', () => {
  test('refuses something that is not a project', () => {
    const out = applyCommand(smallNetwork(), { type: 'replaceDocument', doc: { format: 'other' } as never });
    expect(!out.ok && out.error).toMatch(/not a Dropline project/);
  });

  test('a new project is one undo step; undo brings the old one back', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().setSelection(['DB1']);
    const fresh = newProject();
    store.getState().dispatch({ type: 'replaceDocument', doc: fresh });
    expect(store.getState().doc).toBe(fresh);
    expect(store.getState().selection).toEqual([]);
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(fresh);
  });
});
