// Shared set-up for the panel component tests: a small network of our own, loaded into the app's
// store with the solver's results, and a reset between tests.
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';
import { editorStore } from '../../../../src/store/editorStore.ts';
import { safeSolve } from '../../../../src/store/safeSolve.ts';
import { newBoard, newCable, newLoad, newProject, newSupply } from '../../../../src/model/defaults.ts';
import type { Id, ProjectDocument } from '../../../../src/model/types.ts';

afterEach(() => cleanup());

/**
 * Supply -> sub-main (16 mm², 30 m, three-phase) -> board DB1 -> 2.5 mm² flat twin-and-earth final
 * circuits: a 20 A heater at 20 m and a lighting circuit at 35 m.
 */
export function smallNetwork(): ProjectDocument {
  const doc = newProject({ date: '2025-01-01', withSupply: false });
  doc.nodes = [
    newSupply('S1', { x: 0, y: 0 }),
    newBoard('DB1', { x: 0, y: 160 }, { name: 'Workshop board' }),
    newLoad('L1', { x: -100, y: 320 }, 'heating', {
      name: 'Heater',
      demand: { value: 20, unit: 'A' },
      powerFactor: 1,
    }),
    newLoad('L2', { x: 100, y: 320 }, 'lighting', {
      name: 'Bench lights',
      demand: { value: 6, unit: 'A' },
      powerFactor: 1,
    }),
  ];
  doc.cables = [
    newCable('C1', 'S1', 'DB1', doc.settings.cableDefaults, {
      name: 'Sub-main',
      lengthM: 30,
      sizeMm2: 16,
      construction: 'multicore',
      cpc: { kind: 'core', sizeMm2: 16, material: 'Cu' },
      phases: 3,
    }),
    newCable('C2', 'DB1', 'L1', doc.settings.cableDefaults, { name: 'Heater radial', lengthM: 20 }),
    newCable('C3', 'DB1', 'L2', doc.settings.cableDefaults, { name: 'Lights', lengthM: 35 }),
  ];
  return doc;
}

export function loadIntoStore(doc: ProjectDocument, selection: Id[] = []): void {
  editorStore.setState({
    doc,
    results: safeSolve(doc),
    past: [],
    future: [],
    canUndo: false,
    canRedo: false,
    selection,
    view: { labelMode: 'drop', showLabels: true, drawer: null, dialog: null, canvas: 'diagram' },
    cautionsAcknowledged: true,
  });
}
