import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { newLoad } from '../../../src/model/defaults.ts';
import { smallNetwork } from './fixture.ts';

describe('connectCable', () => {
  test('adds a cable from the project defaults with the next free id', () => {
    const doc = smallNetwork();
    doc.nodes.push(newLoad('L3', { x: 0, y: 400 }, 'heating'));
    const out = applyCommand(doc, { type: 'connectCable', from: 'DB1', to: 'L3' });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const c = out.doc.cables.find((x) => x.id === 'C4');
    expect(c).toMatchObject({ from: 'DB1', to: 'L3', sizeMm2: doc.settings.cableDefaults.sizeMm2 });
    expect(out.created).toEqual(['C4']);
    expect(doc.cables).toHaveLength(3); // the input is untouched
  });

  test.each([
    ['L1', 'DB1', /is a load and feeds nothing/],
    ['DB1', 'S1', /is a supply and cannot be fed/],
    ['DB1', 'DB1', /to itself/],
    ['DB1', 'L1', /already joins DB1 and L1/],
    ['DB1', 'NOPE', /no element NOPE/],
  ])('refuses %s -> %s with a reason', (from, to, reason) => {
    const out = applyCommand(smallNetwork(), { type: 'connectCable', from, to });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error).toMatch(reason);
  });

  test('undo removes the cable and redo brings it back', () => {
    const doc = smallNetwork();
    doc.nodes.push(newLoad('L3', { x: 0, y: 400 }, 'heating'));
    const store = createEditorStore(doc);
    store.getState().dispatch({ type: 'connectCable', from: 'DB1', to: 'L3' });
    const after = store.getState().doc;
    expect(after.cables).toHaveLength(4);
    store.getState().undo();
    expect(store.getState().doc).toBe(doc);
    store.getState().redo();
    expect(store.getState().doc).toBe(after);
  });
});
