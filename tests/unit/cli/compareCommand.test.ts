/**
 * `dropline compare` in-process: FILE against each of its alternatives, `--with NAME`, two files,
 * `--json`, `--data`, and the exit 2 cases with their messages.
 *
 * The fixture (tests/fixtures/cli-pass.json) is one 2.5 mm² copper flat twin-and-earth radial, 70 °C,
 * to a 2.3 kW load at unity power factor (I = 2300 / 230 = 10 A). By hand, as in cli.test.ts:
 *   r = 7.41 Ω/km (IEC 60228:2004 Table 2, 2.5 mm² Cu) × (1 + 0.00393 × 50) = 8.866 mΩ/m
 *   Vd = 2 × I × L × r;  20 m: 3.546 V = 1.54 % of 230 V;  70 m: 12.41 V = 5.40 % of 230 V.
 * The limit is 5 % (IEC 60364-5-52:2009 Table G.52.1, type A, other uses): 20 m clear, 70 m over.
 * The alternatives (invented for the test) lengthen the run to 70 m and put it in 4 mm²
 * (4.61 Ω/km, IEC 60228:2004 Table 2): 2 × 10 × 20 × 4.61e-3 × 1.1965 = 2.206 V = 0.96 %.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { parseArgs } from '../../../src/cli/args.ts';
import { runCli } from '../../../src/cli/run.ts';
import { CAUTIONS } from '../../../src/model/cautions.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import type { Alternative, ProjectDocument } from '../../../src/model/types.ts';
import type { DesignComparison } from '../../../src/solver/compare/compareDesigns.ts';
import { memoryIo, runInMemory } from '../../fixtures/memoryIo.ts';

function fixture(): ProjectDocument {
  const parsed = parseDocument(readFileSync('tests/fixtures/cli-pass.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

/** The fixture's design with its one cable changed, kept as an alternative. */
function alternative(
  name: string,
  note: string,
  change: Partial<ProjectDocument['cables'][number]>,
): Alternative {
  const doc = fixture();
  return {
    name,
    note,
    keptAt: '2026-02-01T09:00:00.000Z',
    settings: doc.settings,
    nodes: doc.nodes,
    cables: doc.cables.map((c) => ({ ...c, ...change })),
  };
}

const withAlternatives: ProjectDocument = {
  ...fixture(),
  alternatives: [
    alternative('Longer run', 'Heater moved to the far wall', { lengthM: 70 }),
    alternative('Radial in 4 mm²', '', { sizeMm2: 4 }),
  ],
};
const longer: ProjectDocument = {
  ...fixture(),
  cables: fixture().cables.map((c) => ({ ...c, lengthM: 70 })),
};

const files: Record<string, string> = {
  'site.json': serializeDocument(withAlternatives),
  'plain.json': readFileSync('tests/fixtures/cli-pass.json', 'utf8'),
  'longer.json': serializeDocument(longer),
  'invalid.json': readFileSync('tests/fixtures/cli-invalid.json', 'utf8'),
  'island.json': readFileSync('tests/fixtures/cli-island.json', 'utf8'),
  'table.csv': readFileSync('tests/fixtures/cli-data-4d5.csv', 'utf8'),
};
const run = (...argv: string[]) => runInMemory(files, argv);
const flat = (s: string) => s.replace(/\s+/g, ' ');

interface CompareJsonShape {
  tool: string;
  command: string;
  outputVersion: number;
  file: string;
  otherFile: string | null;
  cautions: string[];
  method: string;
  designs: {
    label: string;
    file: string;
    alternative: string | null;
    note: string;
    dataSet: { id: string };
  }[];
  comparisons: DesignComparison[];
}

describe('arguments', () => {
  test('the three forms and their options', () => {
    expect(parseArgs(['compare', 'site.json'])).toEqual({
      command: 'compare',
      file: 'site.json',
      otherFile: null,
      withName: null,
      json: false,
      dataFile: null,
    });
    expect(parseArgs(['compare', 'site.json', '--with', 'Longer run', '--json'])).toMatchObject({
      withName: 'Longer run',
      json: true,
    });
    expect(parseArgs(['compare', 'a.json', 'b.json', '--data=t.csv'])).toMatchObject({
      otherFile: 'b.json',
      dataFile: 't.csv',
    });
  });

  test('mistakes are named with the fix', () => {
    expect(parseArgs(['compare'])).toMatchObject({ message: expect.stringMatching(/name the project file/) });
    expect(parseArgs(['compare', 'a.json', '--with'])).toMatchObject({
      message: expect.stringMatching(/--with needs the name of an alternative/),
    });
    expect(parseArgs(['compare', 'a.json', 'b.json', '--with', 'X'])).toMatchObject({
      message: expect.stringMatching(/choose --with NAME .* or a second file, not both/),
    });
    expect(parseArgs(['compare', 'a', 'b', 'c'])).toMatchObject({
      message: expect.stringMatching(/one file .* or two files; got 3/),
    });
    expect(parseArgs(['compare', 'a.json', '--pdf', 'x.pdf'])).toMatchObject({
      message: expect.stringMatching(/unknown option "--pdf" for compare/),
    });
  });
});

describe('dropline compare FILE', () => {
  test('the current design against each alternative in turn, with the cautions and the data used', () => {
    const r = run('compare', 'site.json');
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^DROPLINE COMPARE\n {2}Project {7}CLI fixture/);
    expect(r.out).toContain('Compared      the current design with each of its 2 alternatives, in turn');
    for (const c of CAUTIONS) expect(flat(r.out)).toContain(flat(c));
    expect(r.out).toMatch(/Conductor data: .*\(builtin-iec60228\)/);
    expect(r.out).toMatch(/Limit profile: IEC 60364-5-52 Annex G/);
    expect(flat(r.out)).toContain('copper 8.89 g/cm³ (IEC 60028)');
    expect(r.out).toContain('==== 1 of 2: Current design against Longer run ====');
    expect(r.out).toContain('==== 2 of 2: Current design against Radial in 4 mm² ====');
    expect(flat(r.out)).toContain(
      'B Longer run: an alternative kept in site.json on 2026-02-01. Note: Heater moved',
    );
    // 20 m → 70 m: 1.54 % → 5.40 % of a 5 % limit (hand calculation above), clear → over.
    expect(r.out).toMatch(/\n {2}L1 +Heater +1\.54 +5\.40 +\+3\.85 +5\.00 +✓ clear +✕ over\n/);
    // C1 is L1's whole path, so its own drop is L1's: 1.54 % → 5.40 % of U0.
    expect(r.out).toMatch(/\n {2}C1 +Heater radial +length 20 → 70 m +1\.54 → 5\.40 % of U0 +\+/);
    // 2.5 mm² → 4 mm²: 1.54 % → 0.96 %, the same status.
    expect(r.out).toMatch(
      /LOADS WHOSE DROP MOVED\n(?:.*\n)*? {2}L1 +Heater +1\.54 +0\.96 +-0\.58 +5\.00 +✓ clear +✓ clear/,
    );
    expect(r.out).toContain('CONDUCTOR METAL: WORKING');
    // Wide tables wrap their widest columns: every line reads in a 100-column terminal.
    for (const line of r.out.split('\n')) expect([...line].length).toBeLessThanOrEqual(100);
    expect(r.out).toMatch(/ρ Cu = 8890 kg\/m³ \(IEC 60028/);
  });

  test('--with NAME compares with that alternative only (the name in any case)', () => {
    const r = run('compare', 'site.json', '--with', 'radial in 4 MM²');
    expect(r.code).toBe(0);
    expect(r.out).toContain('==== Current design against Radial in 4 mm² ====');
    expect(r.out).not.toContain('Longer run');
    expect(r.out).toMatch(/C1 +Heater radial +size 2\.5 → 4 mm²/);
  });

  test('two files: the current design of each, headed by the file names', () => {
    const r = run('compare', 'plain.json', 'longer.json');
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toContain('  Other file    longer.json');
    expect(r.out).toContain('==== plain.json against longer.json ====');
    expect(r.out).toMatch(/L1 +Heater +1\.54 +5\.40 +\+3\.85 +5\.00 +✓ clear +✕ over/);
    for (const c of CAUTIONS) expect(flat(r.out)).toContain(flat(c));
  });

  test('--json prints every comparison as JSON, unsolved figures as null', () => {
    const r = run('compare', 'site.json', '--json');
    expect(r.code).toBe(0);
    const json = JSON.parse(r.out) as CompareJsonShape;
    expect(json).toMatchObject({ tool: 'dropline', command: 'compare', outputVersion: 1, file: 'site.json' });
    expect(json.cautions).toEqual(CAUTIONS);
    expect(json.method).toMatch(/IEC 60889/);
    expect(json.designs.map((d) => [d.label, d.alternative])).toEqual([
      ['Current design', null],
      ['Longer run', 'Longer run'],
      ['Radial in 4 mm²', 'Radial in 4 mm²'],
    ]);
    expect(json.comparisons).toHaveLength(2);
    const [first] = json.comparisons;
    expect(first!.a.label).toBe('Current design');
    const l1 = first!.loads.find((l) => l.id === 'L1')!;
    expect(l1).toMatchObject({ statusChanged: true, direction: 'worse' });
    // 50 m more: 2 × 10 A × 50 m × 8.866 mΩ/m = 8.866 V = 3.855 points (hand calculation above).
    expect(l1.dropChangePct).toBeCloseTo(3.855, 3);
    expect(first!.cables[0]!.changes).toEqual([{ field: 'lengthM', label: 'length', a: '20 m', b: '70 m' }]);
    expect(first!.a.metal.working.inputs[0]!.source).toMatch(/IEC 60028/);

    const two = JSON.parse(run('compare', 'plain.json', 'longer.json', '--json').out) as CompareJsonShape;
    expect(two.otherFile).toBe('longer.json');
    expect(two.designs.map((d) => d.file)).toEqual(['plain.json', 'longer.json']);

    // cli-island.json adds a lamp no supply feeds: it has no drop, written as null.
    const island = run('compare', 'plain.json', 'island.json', '--json');
    expect(island.code).toBe(0);
    expect(island.out).not.toMatch(/NaN|Infinity/);
    const lamp = (JSON.parse(island.out) as CompareJsonShape).comparisons[0]!.loads.find(
      (l) => l.id === 'L2',
    )!;
    expect(lamp.a).toBeNull();
    expect(lamp.b).toMatchObject({ status: 'unsolved', cumulativePct: null });
  });

  test('--data solves both designs with the data set and names it', () => {
    const r = run('compare', 'site.json', '--with', 'Longer run', '--data', 'table.csv', '--json');
    expect(r.code).toBe(0);
    const json = JSON.parse(r.out) as CompareJsonShape;
    expect(json.designs.map((d) => d.dataSet.id)).toEqual(['test-bs7671-4d5', 'test-bs7671-4d5']);
    // BS 7671 Table 4D5: 2.5 mm² twin-and-earth 18 mV/A/m (from memory, as in dataOption.test.ts):
    // 18 × 10 A × 20 m = 3.6 V = 1.565 %; × 70 m = 12.6 V = 5.478 %.
    const l1 = json.comparisons[0]!.loads.find((l) => l.id === 'L1')!;
    expect(l1.a!.cumulativePct).toBeCloseTo((3.6 / 230) * 100, 6);
    expect(l1.b!.cumulativePct).toBeCloseTo((12.6 / 230) * 100, 6);
  });
});

describe('exit 2, with a message naming the file or name and the fix', () => {
  test('an unknown alternative lists the names the file keeps', () => {
    const r = run('compare', 'site.json', '--with', 'Bigger board');
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toBe(
      'dropline: site.json has no alternative called "Bigger board"; the alternatives it keeps are "Longer run", "Radial in 4 mm²"\n',
    );
  });

  test('a file with no alternatives says how to keep one or to compare two files', () => {
    const r = run('compare', 'plain.json');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/plain\.json keeps no alternatives to compare with its current design/);
    expect(r.err).toMatch(/Keep one in the editor/);
    expect(r.err).toMatch(/dropline compare plain\.json OTHER\.json/);
    expect(run('compare', 'plain.json', '--with', 'X').err).toMatch(/plain\.json keeps no alternatives/);
  });

  test('an unreadable or invalid file is named, whichever of the two it is', () => {
    const missing = run('compare', 'plain.json', 'nowhere.json');
    expect(missing.code).toBe(2);
    expect(missing.err).toBe('dropline: cannot read nowhere.json: there is no such file\n');
    const invalid = run('compare', 'invalid.json', 'plain.json');
    expect(invalid.code).toBe(2);
    expect(invalid.err).toMatch(/^dropline: invalid\.json is not a valid project file:\n {2}- cable C1/);
    expect(run('compare', 'site.json', '--data', 'nope.csv').err).toMatch(/cannot read nope\.csv/);
    const usage = run('compare');
    expect(usage.code).toBe(2);
    expect(usage.err).toMatch(/usage: dropline check FILE[\s\S]*dropline compare FILE/);
  });

  test('an internal error while solving exits 3 and names the design', () => {
    const m = memoryIo(files);
    let calls = 0;
    const code = runCli(['compare', 'site.json', '--with', 'Longer run'], m.io, () => {
      if (++calls === 2) throw new Error('boom');
      return {} as never;
    });
    expect(code).toBe(3);
    expect(m.err()).toMatch(
      /internal error while solving alternative "Longer run" in site\.json: Error: boom/,
    );
  });
});
