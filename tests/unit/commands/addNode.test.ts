import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { newBoard, newLoad } from '../../../src/model/defaults.ts';
import { smallNetwork } from './fixture.ts';

describe('addNode', () => {
  test('adds the node and, with feedFrom, the cable feeding it, as one step', () => {
    const out = applyCommand(smallNetwork(), {
      type: 'addNode',
      node: newLoad('L3', { x: 0, y: 400 }),
      feedFrom: 'DB1',
    });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.doc.nodes.map((n) => n.id)).toContain('L3');
    expect(out.doc.cables.find((c) => c.to === 'L3')?.from).toBe('DB1');
    expect(out.created).toEqual(['L3', 'C4']);
  });

  test('refuses a duplicate id or a position that is not finite, naming the element', () => {
    const dup = applyCommand(smallNetwork(), { type: 'addNode', node: newBoard('DB1', { x: 0, y: 0 }) });
    expect(dup.ok).toBe(false);
    if (!dup.ok) expect(dup.error).toMatch(/DB1 is already used/);
    const nan = applyCommand(smallNetwork(), { type: 'addNode', node: newBoard('DB2', { x: NaN, y: 0 }) });
    expect(nan.ok).toBe(false);
    if (!nan.ok) expect(nan.error).toMatch(/board DB2.*finite/);
  });

  test('a refused feed leaves nothing behind', () => {
    const before = smallNetwork();
    const out = applyCommand(before, {
      type: 'addNode',
      node: newLoad('L3', { x: 0, y: 400 }),
      feedFrom: 'L1',
    });
    expect(out.ok).toBe(false);
    expect(before.nodes).toHaveLength(4);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'addNode', node: newLoad('L3', { x: 0, y: 400 }), feedFrom: 'DB1' });
    expect(store.getState().selection).toEqual(['L3', 'C4']);
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    expect(store.getState().selection).toEqual([]);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
