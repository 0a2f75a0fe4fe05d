import { newBoard, newCable, newLoad, newProject } from '../../../src/model/defaults.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';

/** Supply S1 -> board DB1 -> loads L1 and L2 (a small radial network, invented for the tests). */
export function smallNetwork(): ProjectDocument {
  const doc = newProject({ date: '2025-01-01' });
  const d = doc.settings.cableDefaults;
  doc.nodes.push(
    newBoard('DB1', { x: 0, y: 160 }, { name: 'Board 1' }),
    newLoad('L1', { x: -80, y: 320 }, 'lighting'),
    newLoad('L2', { x: 80, y: 320 }, 'sockets'),
  );
  doc.cables.push(
    newCable('C1', 'S1', 'DB1', d, { lengthM: 25, sizeMm2: 16, phases: 3 }),
    newCable('C2', 'DB1', 'L1', d, { lengthM: 30, sizeMm2: 1.5 }),
    newCable('C3', 'DB1', 'L2', d, { lengthM: 40 }),
  );
  return doc;
}
