import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('pasteElements', () => {
  test('copies get fresh ids, are offset, and keep only the cables between copied nodes', () => {
    const doc = smallNetwork();
    const nodes = doc.nodes.filter((n) => n.id === 'DB1' || n.id === 'L1');
    const cables = doc.cables; // C1 (S1->DB1) and C3 (DB1->L2) reach outside the copy
    const out = applyCommand(doc, { type: 'pasteElements', nodes, cables, offset: { x: 32, y: 32 } });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.created).toEqual(['DB2', 'L3', 'C4']);
    const c4 = out.doc.cables.find((c) => c.id === 'C4');
    expect(c4).toMatchObject({ from: 'DB2', to: 'L3' });
    expect(out.doc.nodes.find((n) => n.id === 'DB2')?.position).toEqual({ x: 32, y: 192 });
  });

  test('nothing to paste is refused', () => {
    expect(
      applyCommand(smallNetwork(), { type: 'pasteElements', nodes: [], cables: [], offset: { x: 0, y: 0 } })
        .ok,
    ).toBe(false);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store
      .getState()
      .dispatch({ type: 'pasteElements', nodes: [doc.nodes[1]!], cables: [], offset: { x: 16, y: 0 } });
    const after = store.getState().doc;
    expect(store.getState().selection).toEqual(['DB2']);
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
