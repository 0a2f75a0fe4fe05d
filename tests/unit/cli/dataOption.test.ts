// `dropline check --data TABLE`: the user's own conductor data set replaces the built-in one, and
// the report names it.
import { readFileSync } from 'node:fs';
import { expect, test } from 'vitest';
import { parseArgs } from '../../../src/cli/args.ts';
import { runInMemory } from '../../fixtures/memoryIo.ts';

const files: Record<string, string> = {
  'site.json': readFileSync('tests/fixtures/cli-pass.json', 'utf8'),
  'table.csv': readFileSync('tests/fixtures/cli-data-4d5.csv', 'utf8'),
  'broken.csv': 'material,insulation,construction,sizeMm2,mvPerAm1phR\nCu,hot,flatTwinEarth,2.5,18\n',
};

const run = (argv: string[]) => runInMemory(files, argv);

test('--data is parsed with its file', () => {
  expect(parseArgs(['check', 'a.json', '--data', 't.csv'])).toMatchObject({ dataFile: 't.csv' });
  expect(parseArgs(['check', 'a.json', '--data'])).toMatchObject({ command: 'error' });
});

test('a tabulated data set drives the drop and is named in the report', () => {
  const r = run(['check', 'site.json', '--data', 'table.csv', '--json']);
  expect(r.code).toBe(0);
  const json = JSON.parse(r.out) as {
    results: { dataSet: { id: string }; cables: Record<string, { dropV: number }> };
  };
  expect(json.results.dataSet.id).toBe('test-bs7671-4d5');
  // BS 7671 Table 4D5: 2.5 mm² twin-and-earth 18 mV/A/m (from memory, = check-values §2.1 C [S17]).
  // 2.3 kW at unity power factor on 230 V is 10 A; Vd = 18 × 10 × 20 / 1000 = 3.6 V.
  expect(json.results.cables['C1']!.dropV).toBeCloseTo(3.6, 6);
  const text = run(['check', 'site.json', '--data', 'table.csv']);
  expect(text.out).toContain('Flat twin-and-earth 70 °C, tabulated mV/A/m (test set)');
});

test('a broken data set is refused with the row and column, exit 2', () => {
  const r = run(['check', 'site.json', '--data', 'broken.csv']);
  expect(r.code).toBe(2);
  expect(r.err).toMatch(/broken\.csv is not a valid conductor data set/);
  expect(r.err).toMatch(/line 2, column insulation/);
  const missing = run(['check', 'site.json', '--data', 'nope.csv']);
  expect(missing.code).toBe(2);
  expect(missing.err).toMatch(/cannot read nope\.csv/);
});

test('--json carries per cable device, iz and checks, and per node zs and pfc', () => {
  const demo = readFileSync('public/demo-project.json', 'utf8');
  files['demo.json'] = demo;
  const r = run(['check', 'demo.json', '--json']);
  const json = JSON.parse(r.out) as {
    checks: {
      cables: Record<string, { device: unknown; iz: number | null; checks: { key: string }[] }>;
      nodes: Record<string, { kind: string; zs: { ohm: number } | null; pfc: { maxA: number } | null }>;
    };
    results: { nodes: Record<string, { protection?: { zsOhm: number } }> };
  };
  const cables = Object.values(json.checks.cables);
  expect(cables.length).toBeGreaterThan(20);
  expect(cables.every((c) => 'device' in c && 'iz' in c)).toBe(true);
  expect(cables.some((c) => c.checks.some((k) => k.key === 'inIz'))).toBe(true);
  const boards = Object.entries(json.checks.nodes).filter(([, n]) => n.kind === 'board');
  expect(boards.length).toBeGreaterThan(2);
  for (const [id, b] of boards) {
    // The flat figure is the solver's own, not a second computation.
    expect(b.zs?.ohm).toBe(json.results.nodes[id]!.protection!.zsOhm);
    expect(b.pfc?.maxA).toBeGreaterThan(0);
  }
});
