import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('moveNodes', () => {
  test('moves only the named nodes and keeps the others identical', () => {
    const doc = smallNetwork();
    const out = applyCommand(doc, { type: 'moveNodes', moves: [{ id: 'DB1', position: { x: 48, y: 192 } }] });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.doc.nodes.find((n) => n.id === 'DB1')?.position).toEqual({ x: 48, y: 192 });
    expect(out.doc.nodes[0]).toBe(doc.nodes[0]);
  });

  test('refuses unknown ids and non-finite positions', () => {
    expect(
      applyCommand(smallNetwork(), { type: 'moveNodes', moves: [{ id: 'Q', position: { x: 0, y: 0 } }] }).ok,
    ).toBe(false);
    expect(
      applyCommand(smallNetwork(), {
        type: 'moveNodes',
        moves: [{ id: 'L1', position: { x: Infinity, y: 0 } }],
      }).ok,
    ).toBe(false);
  });

  test('a whole drag is one undo step and the transient positions never enter history', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    const resultsBefore = store.getState().results;
    for (let i = 1; i <= 20; i++) store.getState().setDragPositions({ DB1: { x: i * 4, y: 160 } });
    // During the drag the document (and so the solve) is untouched.
    expect(store.getState().doc).toBe(doc);
    expect(store.getState().results).toBe(resultsBefore);
    store.getState().commitDrag();
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().doc.nodes.find((n) => n.id === 'DB1')?.position).toEqual({ x: 80, y: 160 });
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
