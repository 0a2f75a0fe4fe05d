import { describe, expect, test } from 'vitest';
import { createEditorStore, HISTORY_LIMIT } from '../../../src/store/editorStore.ts';
import { solve } from '../../../src/solver/solve.ts';
import { smallNetwork } from '../commands/fixture.ts';

describe('editor store', () => {
  test('results are the solve of the document, recomputed after each change', () => {
    const store = createEditorStore(smallNetwork());
    store.getState().dispatch({ type: 'updateCable', id: 'C3', patch: { lengthM: 60 } });
    const { doc, results } = store.getState();
    expect(results.cables['C3']!.cumulativePct.value).toBeCloseTo(
      solve(doc).cables['C3']!.cumulativePct.value,
      12,
    );
  });

  test('selection and view changes never touch history, and do not clear the redo stack', () => {
    const store = createEditorStore(smallNetwork());
    store.getState().dispatch({ type: 'updateCable', id: 'C3', patch: { lengthM: 60 } });
    store.getState().undo();
    expect(store.getState().canRedo).toBe(true);
    store.getState().setSelection(['C3']);
    store.getState().reveal('L1');
    store.getState().setLabelMode('current');
    store.getState().openDrawer('schedules');
    store.getState().openDialog('help');
    expect(store.getState().past).toHaveLength(0);
    expect(store.getState().canRedo).toBe(true);
    expect(store.getState().selection).toEqual(['L1']);
    expect(store.getState().revealRequest?.id).toBe('L1');
  });

  test('a refused command is not an undo step', () => {
    const doc = smallNetwork();
    const store = createEditorStore(doc);
    const out = store.getState().dispatch({ type: 'connectCable', from: 'L1', to: 'L2' });
    expect(out.ok).toBe(false);
    expect(store.getState().doc).toBe(doc);
    expect(store.getState().canUndo).toBe(false);
  });

  test('history keeps the most recent steps up to its limit', () => {
    const store = createEditorStore(smallNetwork());
    for (let i = 1; i <= HISTORY_LIMIT + 5; i++) {
      store.getState().dispatch({ type: 'updateCable', id: 'C3', patch: { lengthM: i } });
    }
    expect(store.getState().past).toHaveLength(HISTORY_LIMIT);
    for (let i = 0; i < HISTORY_LIMIT; i++) store.getState().undo();
    expect(store.getState().canUndo).toBe(false);
    expect(store.getState().doc.cables.find((c) => c.id === 'C3')!.lengthM).toBe(5);
  });

  test('selection loses ids of elements that an undo removes', () => {
    const store = createEditorStore(smallNetwork());
    store.getState().dispatch({ type: 'connectCable', from: 'S1', to: 'L1' });
    expect(store.getState().selection).toEqual(['C4']);
    store.getState().undo();
    expect(store.getState().selection).toEqual([]);
  });

  test('resetDocument loads without history', () => {
    const store = createEditorStore(smallNetwork());
    store.getState().dispatch({ type: 'tidyLayout' });
    const fresh = smallNetwork();
    store.getState().resetDocument(fresh, 'site.json');
    expect(store.getState()).toMatchObject({
      doc: fresh,
      canUndo: false,
      canRedo: false,
      fileName: 'site.json',
    });
  });
});
