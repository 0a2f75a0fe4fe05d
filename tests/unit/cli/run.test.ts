// The CLI logic in-process: argument handling, read errors, and the exit status rules.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { parseArgs } from '../../../src/cli/args.ts';
import { nodeIo, runCli } from '../../../src/cli/run.ts';
import { summarise } from '../../../src/cli/summary.ts';
import { STATUS_TEXT } from '../../../src/cli/report.ts';
import { memoryIo } from '../../fixtures/memoryIo.ts';
import { STATUS_LOOK } from '../../../src/export/statusLook.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { newProject } from '../../../src/model/defaults.ts';
import type { Results } from '../../../src/solver/results.ts';

describe('arguments', () => {
  test('check with options', () => {
    expect(parseArgs(['check', 'a.json', '--json'])).toEqual({
      command: 'check',
      file: 'a.json',
      json: true,
      workingId: null,
      dataFile: null,
      schedule: null,
      pdfFile: null,
      svgFile: null,
    });
    expect(parseArgs(['check', '--working=C3', 'a.json'])).toMatchObject({ workingId: 'C3' });
    expect(parseArgs([])).toEqual({ command: 'help' });
  });

  test('mistakes are named', () => {
    expect(parseArgs(['check'])).toMatchObject({
      command: 'error',
      message: expect.stringMatching(/name the project file/),
    });
    expect(parseArgs(['check', 'a.json', '--working'])).toMatchObject({
      message: expect.stringMatching(/needs an element id/),
    });
    expect(parseArgs(['check', 'a', 'b'])).toMatchObject({ message: 'one file at a time; got "a" and "b"' });
    expect(parseArgs(['solve', 'a'])).toMatchObject({
      message: expect.stringMatching(/unknown command "solve"/),
    });
  });
});

describe('runCli', () => {
  test('a directory is reported as unreadable (exit 2)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'dropline-cli-'));
    const err: string[] = [];
    const code = runCli(['check', dir], { ...nodeIo, stderr: (t) => err.push(t), stdout: () => {} });
    expect(code).toBe(2);
    expect(err.join('')).toMatch(/it is a directory, not a file/);
  });

  test('an internal error while solving exits 3 and says so', () => {
    const m = memoryIo({ 'p.json': serializeDocument(newProject()) });
    const code = runCli(['check', 'p.json'], m.io, () => {
      throw new Error('boom');
    });
    expect(code).toBe(3);
    expect(m.err()).toMatch(/internal error while solving p\.json: Error: boom/);
    expect(m.out()).toBe('');
  });

  test('file warnings go to stderr, the report to stdout', () => {
    const m = memoryIo({ 'p.json': `\uFEFF${serializeDocument(newProject())}` });
    runCli(['check', 'p.json'], m.io);
    expect(m.err()).toBe('dropline: note: the file starts with a byte-order mark; it was ignored\n');
    expect(m.out()).toMatch(/^DROPLINE CHECK/);
  });
});

describe('exit status rules', () => {
  const base = (over: Partial<Results>): Results =>
    ({ cables: {}, nodes: {}, loads: {}, findings: [], references: [], ...over }) as unknown as Results;
  const load = (status: 'within' | 'close' | 'over' | null) =>
    ({ status }) as unknown as Results['loads'][string];

  test('within and close pass; over, an error finding or a failed check fail', () => {
    expect(summarise(base({ loads: { A: load('within'), B: load('close') } })).exitCode).toBe(0);
    expect(summarise(base({ loads: { A: load('over') } })).exitCode).toBe(1);
    expect(summarise(base({ findings: [{ code: 'zs', severity: 'error', message: 'x' }] })).exitCode).toBe(1);
    expect(
      summarise(base({ findings: [{ code: 'closeToLimit', severity: 'warning', message: 'x' }] })).exitCode,
    ).toBe(0);
    const withChecks = base({
      protection: { failedChecks: 2, unassessedChecks: 0 } as Results['protection'],
    });
    expect(summarise(withChecks)).toMatchObject({ failedChecks: 2, exitCode: 1 });
    expect(summarise(base({ loads: { A: load(null) } }))).toMatchObject({ unsolved: 1, exitCode: 0 });
  });
});

test('the report uses the same status words and glyphs as the editor', () => {
  for (const s of ['within', 'close', 'over', 'none'] as const) {
    expect(STATUS_TEXT[s]).toBe(`${STATUS_LOOK[s].glyph} ${STATUS_LOOK[s].word}`);
  }
});

test('the working names a status with the word the report and the editor show', async () => {
  const { readFileSync } = await import('node:fs');
  const { parseDocument } = await import('../../../src/model/parseDocument.ts');
  const { solve } = await import('../../../src/solver/solve.ts');
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const results = solve(parsed.doc);
  for (const [id, load] of Object.entries(results.loads)) {
    if (load.status === null) continue;
    const record = results.loads[id]!.working.find((w) => w.key === 'status')!;
    expect(record.result.value).toBe(STATUS_LOOK[load.status].word);
    expect(STATUS_TEXT[load.status]).toContain(String(record.result.value));
    expect(record.formula).toMatch(/^over when .*; tight when .*; else clear /);
  }
});
