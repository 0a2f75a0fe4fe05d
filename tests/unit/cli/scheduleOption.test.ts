// `dropline check --schedule SHEET`: the schedule as the editor's Download CSV writes it.
import { readFileSync } from 'node:fs';
import { expect, test } from 'vitest';
import { parseArgs } from '../../../src/cli/args.ts';
import { runInMemory } from '../../fixtures/memoryIo.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { solve } from '../../../src/solver/solve.ts';
import { CAUTIONS } from '../../../src/model/cautions.ts';

const demoText = readFileSync('public/demo-project.json', 'utf8');

const run = (argv: string[]) => runInMemory({ 'demo.json': demoText }, argv);

test('--schedule takes one of cables, loads or boards, and not with --json or --working', () => {
  expect(parseArgs(['check', 'a.json', '--schedule', 'boards'])).toMatchObject({ schedule: 'boards' });
  expect(parseArgs(['check', 'a.json', '--schedule=loads'])).toMatchObject({ schedule: 'loads' });
  expect(parseArgs(['check', 'a.json', '--schedule', 'pipes'])).toMatchObject({
    command: 'error',
    message: expect.stringContaining('cables, loads, boards') as unknown,
  });
  expect(parseArgs(['check', 'a.json', '--schedule'])).toMatchObject({ command: 'error' });
  expect(parseArgs(['check', 'a.json', '--json', '--schedule', 'cables'])).toMatchObject({
    command: 'error',
    message: 'choose one of --json, --working and --schedule',
  });
});

test('the load schedule prints every load with the cautions, and the exit status is the check’s', () => {
  const parsed = parseDocument(demoText);
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const results = solve(parsed.doc);
  const r = run(['check', 'demo.json', '--schedule', 'loads']);
  // The demo has loads over their limit: the same exit status as the report.
  expect(r.code).toBe(1);
  expect(r.err).toBe('');
  const lines = r.out.replace(/^\uFEFF/, '').split('\r\n');
  expect(lines[0]).toBe('Dropline loads');
  for (const c of CAUTIONS) expect(r.out).toContain(c.slice(0, 40));
  const head = lines.findIndex((l) => l.startsWith('Id,Status,Load,'));
  const loads = parsed.doc.nodes.filter((n) => n.kind === 'load');
  const body = lines.slice(head + 1, head + 1 + loads.length);
  expect(body.map((l) => l.split(',')[0])).toEqual(loads.map((l) => l.id));
  const over = loads.find((l) => results.loads[l.id]?.status === 'over')!;
  expect(body.find((l) => l.startsWith(`${over.id},`))?.split(',')[1]).toBe('over');
});
