// `dropline check FILE --svg OUT.svg`: the single-line diagram written as SVG beside the usual report.
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { parseArgs } from '../../../src/cli/args.ts';
import { nodeIo, runCli } from '../../../src/cli/run.ts';
import { runInMemory } from '../../fixtures/memoryIo.ts';

const demoText = readFileSync('public/demo-project.json', 'utf8');

test('--svg takes a file to write and goes with any other option, --pdf included', () => {
  expect(parseArgs(['check', 'a.json', '--svg', 'out.svg'])).toMatchObject({ svgFile: 'out.svg' });
  expect(parseArgs(['check', 'a.json', '--svg=out.svg', '--pdf', 'p.pdf', '--json'])).toMatchObject({
    svgFile: 'out.svg',
    pdfFile: 'p.pdf',
    json: true,
  });
  expect(parseArgs(['check', 'a.json'])).toMatchObject({ svgFile: null });
  for (const argv of [['--svg'], ['--svg='], ['--svg', '--json']])
    expect(parseArgs(['check', 'a.json', ...argv])).toMatchObject({
      command: 'error',
      message: expect.stringContaining('--svg needs a file') as unknown,
    });
});

test('writes the drawing, still prints the report and keeps the check’s exit status', () => {
  const plain = runInMemory({ 'demo.json': demoText }, ['check', 'demo.json']);
  const r = runInMemory({ 'demo.json': demoText }, ['check', 'demo.json', '--svg', 'sld.svg']);
  expect(r.code).toBe(plain.code);
  expect(r.out).toBe(plain.out);
  const svg = new TextDecoder().decode(r.written.get('sld.svg'));
  expect(svg).toMatch(/^<\?xml [^>]*\?>\n<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
  expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
  expect(svg).toContain('>MB</text>');
  expect(r.err).toMatch(/single-line diagram written to sld\.svg/);
}, 60_000);

test('a path it cannot write is exit 2 with the path and the fix, and no report', () => {
  const r = runInMemory({ 'demo.json': demoText }, ['check', 'demo.json', '--svg', '/nowhere/sld.svg']);
  expect(r.code).toBe(2);
  expect(r.err).toContain(
    'cannot write /nowhere/sld.svg: its folder does not exist; choose another --svg path',
  );
  expect(r.out).toBe('');
}, 60_000);

test('on disk, a failed write leaves the earlier drawing as it was and no part file', () => {
  const dir = mkdtempSync(join(tmpdir(), 'dropline-cli-svg-'));
  const input = join(dir, 'demo.json');
  writeFileSync(input, demoText);
  const out = join(dir, 'sld.svg');
  const quiet = { ...nodeIo, stdout: () => {}, stderr: () => {} };
  expect(runCli(['check', input, '--svg', out], quiet)).toBeLessThan(2);
  const first = readFileSync(out);
  expect(first.toString('utf8')).toContain('</svg>');
  // The font cannot be read: the drawing cannot be made, and the file already there is left alone.
  const broken = {
    ...quiet,
    packFonts: () => {
      throw new Error('font missing');
    },
  };
  const messages: string[] = [];
  expect(runCli(['check', input, '--svg', out], { ...broken, stderr: (t) => messages.push(t) })).toBe(2);
  expect(messages.join('')).toContain('could not make the single-line diagram: font missing');
  expect(readFileSync(out).equals(first)).toBe(true);
  expect(existsSync(`${out}.${process.pid}.part`)).toBe(false);
}, 60_000);
