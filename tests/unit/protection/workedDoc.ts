/**
 * The hand-worked two-board example (figures traced in tests/reference/protectionWorkedExample.test.ts).
 * Supply -> C1 (16 mm² XLPE/SWA, gG 63 A) -> DB1; DB1 -> C2 (2.5/1.5 T&E, B20) -> L1 sockets;
 * DB1 -> C3 (10 mm² PVC multicore, C40) -> DB2; DB2 -> C4 (1.5/1.0 T&E, B6) -> L2 lighting.
 */
import { newBoard, newCable, newLoad, newProject } from '../../../src/model/defaults.ts';
import type { Installation, ProjectDocument } from '../../../src/model/types.ts';

export const clipped: Installation = {
  method: 'clippedDirect',
  ambientC: 30,
  groupedCircuits: 1,
  groupArrangement: 'bunched',
  insulationFactor: 1,
};

export function workedDoc(): ProjectDocument {
  const doc = newProject();
  doc.nodes.push(
    newBoard('DB1', { x: 0, y: 100 }),
    newBoard('DB2', { x: 0, y: 200 }),
    newLoad('L1', { x: 0, y: 300 }, 'sockets'),
    newLoad('L2', { x: 0, y: 300 }, 'lighting'),
  );
  doc.cables.push(
    newCable('C1', 'S1', 'DB1', undefined, {
      lengthM: 25,
      insulation: 'thermosetting90',
      construction: 'armouredMulticore',
      sizeMm2: 16,
      cpc: { kind: 'core', sizeMm2: 16, material: 'Cu' },
      phases: 3,
      device: { type: 'fuseGG', ratingA: 63, breakingKa: 80 },
      installation: clipped,
    }),
    newCable('C2', 'DB1', 'L1', undefined, {
      lengthM: 30,
      device: { type: 'mcb', curve: 'B', ratingA: 20, breakingKa: 6 },
      installation: clipped,
    }),
    newCable('C3', 'DB1', 'DB2', undefined, {
      lengthM: 20,
      construction: 'multicore',
      sizeMm2: 10,
      cpc: { kind: 'core', sizeMm2: 10, material: 'Cu' },
      phases: 3,
      device: { type: 'mcb', curve: 'C', ratingA: 40, breakingKa: 10 },
      installation: clipped,
    }),
    newCable('C4', 'DB2', 'L2', undefined, {
      lengthM: 25,
      sizeMm2: 1.5,
      cpc: { kind: 'core', sizeMm2: 1, material: 'Cu' },
      device: { type: 'mcb', curve: 'B', ratingA: 6, breakingKa: 6 },
      installation: clipped,
    }),
  );
  return doc;
}
