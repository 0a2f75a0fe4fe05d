// The demo project (our own invented scenario) opens cleanly and shows what it is meant to show.
import { readFileSync } from 'node:fs';
import { expect, test } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import { solve } from '../../../src/solver/solve.ts';

const text = readFileSync(new URL('../../../public/demo-project.json', import.meta.url), 'utf8');

function open(): ProjectDocument {
  const r = parseDocument(text);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  expect(r.warnings).toEqual([]);
  return r.doc;
}

test('the demo opens without warnings and is saved in the stable form', () => {
  const doc = open();
  expect(serializeDocument(doc)).toBe(text);
});

test('the demo has the scenario the brief asks for', () => {
  const doc = open();
  const loads = doc.nodes.filter((n) => n.kind === 'load');
  const boards = doc.nodes.filter((n) => n.kind === 'board');
  const supply = doc.nodes.find((n) => n.kind === 'supply');
  expect(loads.length).toBeGreaterThanOrEqual(20);
  expect(loads.length).toBeLessThanOrEqual(40);
  expect(boards.length - 1).toBeGreaterThanOrEqual(2); // sub-boards besides the main board
  expect(boards.length - 1).toBeLessThanOrEqual(3);
  expect(supply).toMatchObject({ phases: 3, earthing: 'TN-C-S', zeOhm: 0.35, ownership: 'public' });
  expect(new Set(loads.map((l) => l.phases))).toEqual(new Set([1, 3]));
  expect(new Set(loads.filter((l) => l.phases === 1).map((l) => l.phase))).toEqual(
    new Set(['L1', 'L2', 'L3']),
  );
  expect(new Set(loads.map((l) => l.loadKind))).toEqual(
    new Set(['lighting', 'sockets', 'heating', 'waterHeating', 'motor', 'evCharging', 'hvac', 'other']),
  );
  // The sub-main to the outbuilding, through its junction, is 80-120 m long.
  const toStore = doc.cables.filter((c) => c.to === 'J1' || c.to === 'DB4');
  const length = toStore.reduce((sum, c) => sum + c.lengthM, 0);
  expect(length).toBeGreaterThanOrEqual(80);
  expect(length).toBeLessThanOrEqual(120);
  expect(doc.cables.every((c) => c.device !== undefined || c.from === 'J1')).toBe(true);
});

test('the drawing reads top-down: every cable runs downwards from the supply', () => {
  const doc = open();
  const y = new Map(doc.nodes.map((n) => [n.id, n.position.y]));
  for (const c of doc.cables) expect(y.get(c.to)!).toBeGreaterThan(y.get(c.from)!);
  const positions = new Set(doc.nodes.map((n) => `${n.position.x},${n.position.y}`));
  expect(positions.size).toBe(doc.nodes.length);
});

test('solved, at least one load is close to its limit and one is over it', () => {
  const results = solve(open());
  const statuses = Object.values(results.loads).map((l) => l.status);
  expect(statuses).toContain('close');
  expect(statuses).toContain('over');
  expect(statuses.filter((s) => s === 'within').length).toBeGreaterThan(statuses.length / 2);
});
