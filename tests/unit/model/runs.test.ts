/**
 * Shared containment runs: cables given the same run are grouped, and the grouping factor follows
 * the number of circuits in the run as circuits join or leave it. The factor itself is the
 * solver's (IEC 60364-5-52 Table B.52.17, bunched: 1 circuit 1.00, 2 → 0.80, 3 → 0.70, 4 → 0.65;
 * as in check-values §7.8); the check here is that the run sets the count it is read with.
 */
import { describe, expect, test } from 'vitest';
import { applyCommand, type Command } from '../../../src/model/commands.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { runMembers } from '../../../src/model/runs.ts';
import { solve } from '../../../src/solver/solve.ts';
import { cableSchedule } from '../../../src/export/schedules.ts';
import type { Installation, ProjectDocument } from '../../../src/model/types.ts';
import { network } from '../../fixtures/build.ts';

const clipped: Installation = {
  method: 'clippedDirect',
  ambientC: 30,
  groupedCircuits: 1,
  groupArrangement: 'bunched',
  insulationFactor: 1,
};

/** A board with four socket circuits in 2.5 mm² multicore, clipped direct, not grouped yet. */
function board(): ProjectDocument {
  const b = network().supply('S').board('DB');
  b.cable('SM', 'S', 'DB', { sizeMm2: 25, phases: 3, cpc: { kind: 'core', sizeMm2: 16, material: 'Cu' } });
  for (const k of [1, 2, 3, 4])
    b.load(`L${k}`, { amps: 16 }).cable(`C${k}`, 'DB', `L${k}`, {
      lengthM: 20,
      installation: { ...clipped },
    });
  return b.doc();
}

function run(doc: ProjectDocument, c: Command): ProjectDocument {
  const out = applyCommand(doc, c);
  if (!out.ok) throw new Error(out.error);
  return out.doc;
}
const join = (doc: ProjectDocument, id: string, name: string | undefined, parallel?: number) =>
  run(doc, {
    type: 'updateCable',
    id,
    patch: {
      installation: { ...doc.cables.find((c) => c.id === id)!.installation!, ...(name ? { run: name } : {}) },
      ...(parallel ? { parallel } : {}),
    },
  });
const grouped = (doc: ProjectDocument, id: string) =>
  doc.cables.find((c) => c.id === id)!.installation!.groupedCircuits;

describe('shared runs', () => {
  test('every cable in a run is grouped with the circuits the run holds, as they join and leave', () => {
    let doc = join(board(), 'C1', 'Tray T1');
    expect(grouped(doc, 'C1')).toBe(1);
    doc = join(doc, 'C2', 'tray t1 '); // the same run, whatever the case and spaces
    doc = join(doc, 'C3', 'Tray T1');
    expect(['C1', 'C2', 'C3'].map((id) => grouped(doc, id))).toEqual([3, 3, 3]);
    expect(grouped(doc, 'C4')).toBe(1);
    expect(runMembers(doc.cables, 'TRAY T1')).toEqual(['C1', 'C2', 'C3']);
    // Two cables in parallel count as two circuits (common practice).
    doc = join(doc, 'C4', 'Tray T1', 2);
    expect(['C1', 'C4'].map((id) => grouped(doc, id))).toEqual([5, 5]);
    // Deleting a circuit takes it out of the count; so does taking a cable out of the run.
    doc = run(doc, { type: 'deleteElements', ids: ['L4'] });
    expect(grouped(doc, 'C1')).toBe(3);
    const { run: _gone, ...alone } = doc.cables.find((c) => c.id === 'C3')!.installation!;
    doc = run(doc, { type: 'updateCable', id: 'C3', patch: { installation: alone } });
    expect(['C1', 'C2'].map((id) => grouped(doc, id))).toEqual([2, 2]);
  });

  test('the solver reads the count the run gives: Cg and Iz as for the same count typed, and the working says why', () => {
    let doc = board();
    for (const id of ['C1', 'C2', 'C3']) doc = join(doc, id, 'Tray T1');
    const typed = board();
    for (const c of typed.cables) if (['C1', 'C2', 'C3'].includes(c.id)) c.installation!.groupedCircuits = 3;
    const a = solve(doc).cables.C1!.protection!;
    const b = solve(typed).cables.C1!.protection!;
    expect(a.factors!.cg).toBe(0.7); // Table B.52.17, bunched, 3 circuits
    expect(a.izA).toBe(b.izA);
    const iz = a.working.find((w) => w.key === 'iz')!;
    expect(iz.inputs.find((i) => i.name === 'Cg')!.source).toMatch(/3 circuits \(.*run "Tray T1"\)/);
    const schedule = cableSchedule(doc, solve(doc));
    expect(schedule.rows.find((r) => r.id === 'C1')!.cells.run!.text).toBe('Tray T1 (3)');
    expect(schedule.rows.find((r) => r.id === 'C4')!.cells.run!.text).toBe('–');
  });

  test('a file whose count disagrees with its run opens as written, with a warning; bad run names are refused', () => {
    let doc = board();
    for (const id of ['C1', 'C2']) doc = join(doc, id, 'Tray T1');
    const file = JSON.parse(serializeDocument(doc));
    file.cables.find((c: { id: string }) => c.id === 'C1').installation.groupedCircuits = 6;
    const opened = parseDocument(JSON.stringify(file));
    if (!opened.ok) throw new Error(opened.errors.join('\n'));
    expect(grouped(opened.doc, 'C1')).toBe(6);
    expect(opened.warnings).toContain(
      'cable C1: installation.groupedCircuits is 6 but run "Tray T1" holds 2 circuits; the file\'s count is used until a cable of the run is edited',
    );
    file.cables[1].installation.run = '';
    const bad = parseDocument(JSON.stringify(file));
    expect(bad.ok).toBe(false);
    expect(bad.ok ? '' : bad.errors.join('\n')).toMatch(/installation\.run/);
  });
});
