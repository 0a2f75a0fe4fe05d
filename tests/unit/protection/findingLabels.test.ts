/** Protection messages name the element by id, and by name where it has one (as the drop findings do). */
import { describe, expect, it } from 'vitest';
import { newCable, newJunction, newLoad, newProject } from '../../../src/model/defaults.ts';
import { solve } from '../../../src/solver/solve.ts';
import { elementLabel } from '../../../src/solver/elementLabel.ts';
import { clipped } from './workedDoc.ts';

function overloaded(name: string) {
  const doc = newProject();
  doc.nodes.push(newJunction('J1', { x: 0, y: 0 }), newLoad('L1', { x: 0, y: 0 }, 'sockets'));
  doc.cables.push(
    newCable('C1', 'S1', 'J1', undefined, {
      name,
      lengthM: 10,
      // 32 A on 2.5 mm² clipped direct: In > Iz whatever the table's exact cell.
      device: { type: 'mcb', curve: 'B', ratingA: 32, breakingKa: 10 },
      installation: clipped,
    }),
    newCable('C2', 'J1', 'L1', undefined, { name: '', lengthM: 10, installation: clipped }),
  );
  return doc;
}

describe('protection finding labels', () => {
  it('an unnamed cable is named by its id, never as a bare "cable :"', () => {
    const res = solve(overloaded(''));
    const f = res.findings.find((x) => x.code === 'overCapacity' && x.elementId === 'C1');
    expect(f?.message.startsWith('cable C1: In 32 A exceeds Iz')).toBe(true);
    for (const x of res.findings) expect(x.message).not.toMatch(/^(cable|board|load|junction) :/);
  });
  it('a named cable gives its id and its name', () => {
    const res = solve(overloaded('Sub-main to the yard'));
    const f = res.findings.find((x) => x.code === 'overCapacity' && x.elementId === 'C1');
    expect(f?.message.startsWith('cable C1 (Sub-main to the yard): In 32 A')).toBe(true);
  });
  it('the label leaves out a name that is blank or repeats the id', () => {
    expect(elementLabel('board', 'DB2', 'Offices')).toBe('board DB2 (Offices)');
    expect(elementLabel('board', 'DB2', '')).toBe('board DB2');
    expect(elementLabel('board', 'DB2', 'DB2')).toBe('board DB2');
    // Brackets within brackets read badly: such a name is quoted.
    expect(elementLabel('load', 'L29', 'Yard floodlights (rear)')).toBe('load L29 “Yard floodlights (rear)”');
    expect(elementLabel('board', 'DB2', undefined)).toBe('board DB2');
  });
});
