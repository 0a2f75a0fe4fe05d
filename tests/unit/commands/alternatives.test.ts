import { describe, expect, test } from 'vitest';
import { applyCommand, type Command } from '../../../src/model/commands.ts';
import { alternativeDocument } from '../../../src/model/commands/alternatives.ts';
import { MAX_ALTERNATIVES } from '../../../src/model/schema.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import { smallNetwork } from './fixture.ts';

const AT = '2025-02-03T09:30:00.000Z';

function run(doc: ProjectDocument, command: Command): ProjectDocument {
  const out = applyCommand(doc, command);
  if (!out.ok) throw new Error(out.error);
  return out.doc;
}

describe('keepAlternative', () => {
  test('keeps a copy of the elements and settings; later edits do not reach it', () => {
    const doc = smallNetwork();
    const kept = run(doc, { type: 'keepAlternative', name: 'As drawn', note: 'first issue', keptAt: AT });
    expect(kept.alternatives).toHaveLength(1);
    const alt = kept.alternatives[0]!;
    expect(alt).toMatchObject({ name: 'As drawn', note: 'first issue', keptAt: AT });
    expect(alt.nodes).toEqual(doc.nodes);
    expect(alt.cables).toEqual(doc.cables);
    expect(alt.settings).toEqual(doc.settings);
    const edited = run(kept, { type: 'updateCable', id: 'C1', patch: { sizeMm2: 25 } });
    expect(edited.alternatives[0]!.cables.find((c) => c.id === 'C1')!.sizeMm2).toBe(16);
    // The current design is untouched by keeping.
    expect(kept.nodes).toBe(doc.nodes);
  });

  test('refuses an empty, padded, too long or taken name, naming the fix', () => {
    const doc = run(smallNetwork(), { type: 'keepAlternative', name: 'Option A', note: '', keptAt: AT });
    const error = (name: string) => {
      const out = applyCommand(doc, { type: 'keepAlternative', name, note: '', keptAt: AT });
      return out.ok ? '' : out.error;
    };
    expect(error('')).toMatch(/needs a name/);
    expect(error(' Option B')).toMatch(/cannot start or end with a space/);
    expect(error('x'.repeat(81))).toMatch(/at most 80 characters/);
    expect(error('option a')).toMatch(/already an alternative called "option a"/);
  });

  test(`keeps at most ${MAX_ALTERNATIVES}`, () => {
    let doc = smallNetwork();
    for (let k = 0; k < MAX_ALTERNATIVES; k++)
      doc = run(doc, { type: 'keepAlternative', name: `Option ${k}`, note: '', keptAt: AT });
    const out = applyCommand(doc, { type: 'keepAlternative', name: 'One more', note: '', keptAt: AT });
    expect(!out.ok && out.error).toMatch(/at most 20 alternatives; delete one/);
  });

  test('replace overwrites the named alternative with the current design and keeps its note', () => {
    let doc = run(smallNetwork(), { type: 'keepAlternative', name: 'Option A', note: 'why', keptAt: AT });
    doc = run(doc, { type: 'updateCable', id: 'C2', patch: { lengthM: 55 } });
    doc = run(doc, { type: 'keepAlternative', name: 'Option A', note: '', keptAt: AT, replace: true });
    expect(doc.alternatives).toHaveLength(1);
    expect(doc.alternatives[0]!.note).toBe('why');
    expect(doc.alternatives[0]!.cables.find((c) => c.id === 'C2')!.lengthM).toBe(55);
  });
});

describe('openAlternative', () => {
  test('puts the alternative on the canvas and leaves it in the list', () => {
    let doc = run(smallNetwork(), { type: 'keepAlternative', name: 'Short run', note: '', keptAt: AT });
    doc = run(doc, { type: 'updateCable', id: 'C2', patch: { lengthM: 80 } });
    const opened = run(doc, { type: 'openAlternative', name: 'Short run', keptAt: AT });
    expect(opened.cables.find((c) => c.id === 'C2')!.lengthM).toBe(30);
    expect(opened.alternatives.map((a) => a.name)).toEqual(['Short run']);
    // The opened design is a copy: editing it does not change the kept alternative.
    expect(opened.cables).not.toBe(opened.alternatives[0]!.cables);
  });

  test('keepCurrentAs keeps the design on the canvas first', () => {
    let doc = run(smallNetwork(), { type: 'keepAlternative', name: 'Short run', note: '', keptAt: AT });
    doc = run(doc, { type: 'updateCable', id: 'C2', patch: { lengthM: 80 } });
    const opened = run(doc, {
      type: 'openAlternative',
      name: 'Short run',
      keepCurrentAs: 'Long run',
      keptAt: AT,
    });
    expect(opened.alternatives.map((a) => a.name)).toEqual(['Short run', 'Long run']);
    expect(opened.alternatives[1]!.cables.find((c) => c.id === 'C2')!.lengthM).toBe(80);
    const clash = applyCommand(doc, {
      type: 'openAlternative',
      name: 'Short run',
      keepCurrentAs: 'Short run',
      keptAt: AT,
    });
    expect(!clash.ok && clash.error).toMatch(/already an alternative/);
  });

  test('an unknown name is refused', () => {
    const out = applyCommand(smallNetwork(), { type: 'openAlternative', name: 'Nope', keptAt: AT });
    expect(!out.ok && out.error).toBe('There is no alternative called "Nope".');
  });
});

describe('updateAlternative and deleteAlternative', () => {
  test('rename, note, delete', () => {
    let doc = run(smallNetwork(), { type: 'keepAlternative', name: 'A', note: '', keptAt: AT });
    doc = run(doc, { type: 'keepAlternative', name: 'B', note: '', keptAt: AT });
    const clash = applyCommand(doc, { type: 'updateAlternative', name: 'A', patch: { name: 'b' } });
    expect(!clash.ok && clash.error).toMatch(/already an alternative called "b"/);
    doc = run(doc, {
      type: 'updateAlternative',
      name: 'A',
      patch: { name: 'Cheaper', note: 'smaller sub-main' },
    });
    expect(doc.alternatives.map((a) => [a.name, a.note])).toEqual([
      ['Cheaper', 'smaller sub-main'],
      ['B', ''],
    ]);
    doc = run(doc, { type: 'deleteAlternative', name: 'Cheaper' });
    expect(doc.alternatives.map((a) => a.name)).toEqual(['B']);
  });
});

test('alternativeDocument is the alternative as a project of its own', () => {
  const doc = run(smallNetwork(), { type: 'keepAlternative', name: 'A', note: '', keptAt: AT });
  const alt = alternativeDocument(doc, doc.alternatives[0]!);
  expect(alt).toMatchObject({
    format: 'dropline-project',
    version: 2,
    details: doc.details,
    alternatives: [],
  });
  expect(alt.cables).toEqual(doc.cables);
});

test('undo and redo: open an alternative, then come back', () => {
  const doc = run(smallNetwork(), { type: 'keepAlternative', name: 'Short', note: '', keptAt: AT });
  const store = createEditorStore(run(doc, { type: 'updateCable', id: 'C2', patch: { lengthM: 80 } }));
  const before = store.getState().doc;
  store.getState().setSelection(['C2']);
  store.getState().dispatch({ type: 'openAlternative', name: 'Short', keptAt: AT });
  const after = store.getState().doc;
  expect(store.getState().selection).toEqual([]);
  expect(store.getState().results.cables.C2!.dropV).toBeLessThan(
    createEditorStore(before).getState().results.cables.C2!.dropV,
  );
  store.getState().undo();
  expect(store.getState().doc).toBe(before);
  store.getState().redo();
  expect(store.getState().doc).toBe(after);
});

test('keeping, renaming or deleting an alternative does not solve again', () => {
  const store = createEditorStore(smallNetwork());
  const results = store.getState().results;
  store.getState().dispatch({ type: 'keepAlternative', name: 'A', note: '', keptAt: AT });
  store.getState().dispatch({ type: 'updateAlternative', name: 'A', patch: { note: 'n' } });
  store.getState().dispatch({ type: 'deleteAlternative', name: 'A' });
  expect(store.getState().results).toBe(results);
  expect(store.getState().past).toHaveLength(3);
});
