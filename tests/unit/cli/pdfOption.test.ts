// `dropline check FILE --pdf OUT.pdf`: the tender pack written beside the usual report.
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test, vi } from 'vitest';
import { parseArgs } from '../../../src/cli/args.ts';
import { nodeIo, runCli } from '../../../src/cli/run.ts';
import { runInMemory } from '../../fixtures/memoryIo.ts';

const demoText = readFileSync('public/demo-project.json', 'utf8');

test('--pdf takes a file to write and goes with any other option', () => {
  expect(parseArgs(['check', 'a.json', '--pdf', 'out.pdf'])).toMatchObject({ pdfFile: 'out.pdf' });
  expect(parseArgs(['check', 'a.json', '--pdf=out.pdf', '--json'])).toMatchObject({
    pdfFile: 'out.pdf',
    json: true,
  });
  expect(parseArgs(['check', 'a.json'])).toMatchObject({ pdfFile: null });
  expect(parseArgs(['check', 'a.json', '--pdf'])).toMatchObject({
    command: 'error',
    message: expect.stringContaining('--pdf needs a file') as unknown,
  });
});

test('writes the pack, still prints the report and keeps the check’s exit status', () => {
  const plain = runInMemory({ 'demo.json': demoText }, ['check', 'demo.json']);
  const r = runInMemory({ 'demo.json': demoText }, ['check', 'demo.json', '--pdf', 'pack.pdf']);
  expect(r.code).toBe(plain.code);
  expect(r.out).toBe(plain.out);
  const pdf = r.written.get('pack.pdf');
  expect(pdf).toBeDefined();
  expect(new TextDecoder().decode(pdf!.subarray(0, 5))).toBe('%PDF-');
  expect(r.err).toMatch(/tender pack written to pack\.pdf/);
}, 60_000);

test('a path it cannot write is exit 2 with the path and the fix, and nothing else is lost', () => {
  const r = runInMemory({ 'demo.json': demoText }, ['check', 'demo.json', '--pdf', '/nowhere/pack.pdf']);
  expect(r.code).toBe(2);
  expect(r.err).toContain(
    'cannot write /nowhere/pack.pdf: its folder does not exist; choose another --pdf path',
  );
  expect(r.out).toBe('');
}, 60_000);

test('on disk, a failed write leaves the earlier pack as it was', () => {
  const dir = mkdtempSync(join(tmpdir(), 'dropline-cli-pdf-'));
  const input = join(dir, 'demo.json');
  writeFileSync(input, demoText);
  const out = join(dir, 'pack.pdf');
  const quiet = { ...nodeIo, stdout: () => {}, stderr: () => {} };
  runCli(['check', input, '--pdf', out], quiet);
  const first = readFileSync(out);
  expect(execFileSync('pdfinfo', [out], { encoding: 'utf8' })).toMatch(/Pages:\s+\d+/);
  // A pack that cannot be made (no font) must not touch the file already there.
  const broken = { ...quiet, packFonts: () => ({ regular: '', bold: '' }) };
  // jsPDF logs its own complaint about the empty font; the CLI's message is what counts here.
  const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
  const messages: string[] = [];
  expect(runCli(['check', input, '--pdf', out], { ...broken, stderr: (t) => messages.push(t) })).toBe(2);
  logged.mockRestore();
  expect(messages.join('')).toContain('could not make the tender pack');
  expect(readFileSync(out).equals(first)).toBe(true);
  expect(existsSync(`${out}.${process.pid}.part`)).toBe(false);
}, 60_000);
