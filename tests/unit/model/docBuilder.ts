// A small valid document for model tests: supply -> board -> two loads.
import type { ProjectDocument } from '../../../src/model/types.ts';
import { newBoard, newCable, newLoad, newProject } from '../../../src/model/defaults.ts';

export function smallDoc(): ProjectDocument {
  const doc = newProject({ date: '2025-01-01' });
  doc.nodes.push(
    newBoard('DB1', { x: 0, y: 150 }, { name: 'Main board' }),
    newLoad('L1', { x: -100, y: 300 }, 'lighting', { name: 'Office lights' }),
    newLoad('L2', { x: 100, y: 300 }, 'motor', { name: 'Saw' }),
  );
  doc.cables.push(
    newCable('C1', 'S1', 'DB1', undefined, {
      lengthM: 20,
      construction: 'armouredMulticore',
      insulation: 'thermosetting90',
      sizeMm2: 25,
      cpc: { kind: 'armour', sizeMm2: 46, material: 'steel' },
      phases: 3,
    }),
    newCable('C7', 'DB1', 'L1', undefined, { lengthM: 18, name: 'Office lighting radial' }),
    newCable('C3', 'DB1', 'L2', undefined, {
      lengthM: 12,
      construction: 'multicore',
      sizeMm2: 4,
      cpc: { kind: 'core', sizeMm2: 4, material: 'Cu' },
      phases: 3,
      device: { type: 'mcb', curve: 'C', ratingA: 16, breakingKa: 10 },
    }),
  );
  return doc;
}

/** The document as JSON text with a change applied to a plain copy. */
// The copy is untyped on purpose: tests write wrong types into it.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function textWith(change: (raw: Record<string, any>) => void): string {
  const raw = JSON.parse(JSON.stringify(smallDoc()));
  change(raw);
  return JSON.stringify(raw);
}
