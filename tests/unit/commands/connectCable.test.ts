import { describe, expect, test } from 'vitest';
import { applyCommand } from '../../../src/model/commands.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import { newBoard, newLoad } from '../../../src/model/defaults.ts';
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

  test('takes its phases from the ends it joins: three-phase to a board on a three-phase supply and to a three-phase load, single-phase to a single-phase load', () => {
    const doc = smallNetwork(); // S1 is three-phase; C1 (S1 -> DB1) carries three phases
    doc.nodes.push(
      newBoard('DB2', { x: 200, y: 160 }),
      newLoad('M1', { x: 0, y: 400 }, 'motor', { phases: 3 }),
      newLoad('L3', { x: 100, y: 400 }, 'heating', { phases: 1 }),
    );
    const cable = (d: typeof doc, from: string, to: string) => {
      const out = applyCommand(d, { type: 'connectCable', from, to });
      if (!out.ok) throw new Error(out.error);
      return { doc: out.doc, cable: out.doc.cables.find((c) => c.from === from && c.to === to)! };
    };
    const toBoard = cable(doc, 'S1', 'DB2');
    expect(toBoard.cable.phases).toBe(3);
    // Flat twin-and-earth has two cores and cannot carry three phases.
    expect(toBoard.cable.construction).toBe('multicore');
    expect(toBoard.cable.cpc).toEqual({ kind: 'core', sizeMm2: toBoard.cable.sizeMm2, material: 'Cu' });
    expect(cable(toBoard.doc, 'DB1', 'M1').cable.phases).toBe(3);
    const single = cable(toBoard.doc, 'DB1', 'L3').cable;
    expect(single).toMatchObject({ phases: 1, construction: doc.settings.cableDefaults.construction });
  });

  test('a three-phase load on a single-phase board gets the single-phase cable there is', () => {
    const doc = smallNetwork();
    doc.cables[0]!.phases = 1;
    doc.nodes.push(newLoad('M1', { x: 0, y: 400 }, 'motor', { phases: 3 }));
    const out = applyCommand(doc, { type: 'connectCable', from: 'DB1', to: 'M1' });
    expect(out.ok && out.doc.cables.at(-1)!.phases).toBe(1);
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
