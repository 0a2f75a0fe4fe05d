import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { NODE_SIZE } from '../../../src/model/layout.ts';
import { smallNetwork } from './fixture.ts';

describe('tidyLayout', () => {
  test('lays the network out in layers from the supply down, without overlaps', () => {
    const doc = smallNetwork();
    doc.nodes.forEach((n) => (n.position = { x: 0, y: 0 }));
    const out = applyCommand(doc, { type: 'tidyLayout' });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const y = (id: string) => out.doc.nodes.find((n) => n.id === id)!.position.y;
    expect(y('S1')).toBeLessThan(y('DB1'));
    expect(y('DB1')).toBeLessThan(y('L1'));
    expect(y('L1')).toBe(y('L2'));
    const l1 = out.doc.nodes.find((n) => n.id === 'L1')!.position;
    const l2 = out.doc.nodes.find((n) => n.id === 'L2')!.position;
    expect(Math.abs(l1.x - l2.x)).toBeGreaterThanOrEqual(NODE_SIZE.load.width);
  });

  test('an empty diagram is refused', () => {
    const doc = smallNetwork();
    expect(applyCommand({ ...doc, nodes: [], cables: [] }, { type: 'tidyLayout' }).ok).toBe(false);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'tidyLayout' });
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
