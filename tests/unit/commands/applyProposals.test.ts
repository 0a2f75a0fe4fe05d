import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('applyProposals', () => {
  test('applies all accepted changes together', () => {
    const out = applyCommand(smallNetwork(), {
      type: 'applyProposals',
      changes: [
        { target: 'cable', id: 'C3', patch: { sizeMm2: 4 } },
        { target: 'node', id: 'L2', patch: { phase: 'L2' } },
      ],
    });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.doc.cables.find((c) => c.id === 'C3')?.sizeMm2).toBe(4);
    expect(out.doc.nodes.find((n) => n.id === 'L2')).toMatchObject({ phase: 'L2' });
  });

  test('one bad change refuses the lot and says which', () => {
    const doc = smallNetwork();
    const out = applyCommand(doc, {
      type: 'applyProposals',
      changes: [
        { target: 'cable', id: 'C3', patch: { sizeMm2: 4 } },
        { target: 'cable', id: 'C99', patch: { sizeMm2: 4 } },
      ],
    });
    expect(!out.ok && out.error).toMatch(/C99.*none were/);
  });

  test('undo and redo as one step', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({
      type: 'applyProposals',
      changes: [
        { target: 'cable', id: 'C2', patch: { sizeMm2: 2.5 } },
        { target: 'cable', id: 'C3', patch: { sizeMm2: 4 } },
      ],
    });
    expect(store.getState().past).toHaveLength(1);
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
