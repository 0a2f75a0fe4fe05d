import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { smallNetwork } from './fixture.ts';

describe('updateNode', () => {
  test('merges a patch into the node', () => {
    const out = applyCommand(smallNetwork(), {
      type: 'updateNode',
      id: 'L2',
      patch: { demand: { value: 16, unit: 'A' } },
    });
    expect(out.ok && out.doc.nodes.find((n) => n.id === 'L2')).toMatchObject({
      demand: { value: 16, unit: 'A' },
    });
  });

  test('undefined removes an optional field', () => {
    const doc = smallNetwork();
    const m = applyCommand(doc, {
      type: 'updateNode',
      id: 'L1',
      patch: { motor: { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 10 } },
    });
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    const cleared = applyCommand(m.doc, { type: 'updateNode', id: 'L1', patch: { motor: undefined } });
    expect(cleared.ok && 'motor' in (cleared.doc.nodes.find((n) => n.id === 'L1') ?? {})).toBe(false);
  });

  test('refuses a field the kind does not have, an id change and an empty name, naming the element', () => {
    const a = applyCommand(smallNetwork(), { type: 'updateNode', id: 'DB1', patch: { powerFactor: 0.9 } });
    expect(!a.ok && a.error).toMatch(/board DB1 "Board 1": a board has no field "powerFactor"/);
    const b = applyCommand(smallNetwork(), { type: 'updateNode', id: 'DB1', patch: { id: 'X' } as never });
    expect(!b.ok && b.error).toMatch(/cannot be changed/);
    const c = applyCommand(smallNetwork(), { type: 'updateNode', id: 'DB1', patch: { name: '  ' } });
    expect(!c.ok && c.error).toMatch(/name cannot be empty/);
  });

  test('undo and redo', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'updateNode', id: 'DB1', patch: { diversity: 0.8 } });
    const after = store.getState().doc;
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
