// The `dropline` command as a user runs it: spawned through bin/dropline.mjs from another
// directory, on the fixture files tests/fixtures/cli-*.json, against the real solver.
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';

const bin = fileURLToPath(new URL('../../../bin/dropline.mjs', import.meta.url));
const fixture = (name: string) => fileURLToPath(new URL(`../../fixtures/cli-${name}.json`, import.meta.url));
const demo = fileURLToPath(new URL('../../../public/demo-project.json', import.meta.url));

function run(...args: string[]) {
  // From the temp directory, so the command works from any working directory.
  const r = spawnSync(process.execPath, [bin, ...args], { cwd: tmpdir(), encoding: 'utf8', timeout: 25_000 });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

// Hand calculation for the fixtures (one 2.5 mm² copper flat twin-and-earth radial, 70 °C, to a
// 2.3 kW load at unity power factor, so x plays no part and I = 2300 / 230 = 10 A):
//   r = 7.41 Ω/km (IEC 60228:2004 Table 2, 2.5 mm² Cu) × (1 + 0.00393 × (70 − 20)) = 8.866 mΩ/m
//   Vd = 2 × I × L × r;  20 m: 3.546 V = 1.54 % of 230 V;  70 m: 12.41 V = 5.40 % of 230 V.

describe('dropline check', () => {
  test('a passing file: report, cautions, data set, exit 0', () => {
    const r = run('check', fixture('pass'));
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^DROPLINE CHECK\n {2}Project {7}CLI fixture/);
    expect(r.out).toContain('CAUTIONS\n  ! Dropline is a design aid.');
    expect(r.out).toMatch(/competent person/);
    expect(r.out).toMatch(/Conductor data: .*\(builtin-iec60228\)/);
    expect(r.out).toMatch(/Limit profile: IEC 60364-5-52 Annex G/);
    expect(r.out).toMatch(/\n {2}L1 +Heater +other +1\.54 +5\.00 +31 % +✓ clear +Supply > Heater\n/);
    expect(r.out).toMatch(
      /\n {2}C1 +Heater radial +S1 > L1 +20\.0 +2\.5 Cu +L1 +10\.0 +3\.55 +1\.54 U0 +1\.54 /,
    );
    expect(r.out).toContain('PASS: every load is within its limit and there is no error finding');
  });

  test('a load over its limit: exit 1 and the finding is listed', () => {
    const r = run('check', fixture('over'));
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/\n {2}L1 +Heater +other +5\.40 +5\.00 +108 % +✕ over/);
    expect(r.out).toMatch(/ERROR \[overLimit\] L1:/);
    expect(r.out).toMatch(/FAIL: 1 load\(s\) over the limit/);
  });

  test('an error finding with every load within: exit 1', () => {
    const r = run('check', fixture('island'));
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/ERROR \[island\] L2/);
    expect(r.out).toMatch(/L2 +Unconnected lamp .*– no result +\(not fed\)/);
  });

  test('an invalid file: exit 2, the message names the cable and field, nothing on stdout', () => {
    const r = run('check', fixture('invalid'));
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toContain(
      'cable C1 "Heater radial": lengthM must be a one-way route length in metres, 0 or more; got -4',
    );
  });

  test('a file from a newer version: exit 2', () => {
    const r = run('check', fixture('newer'));
    expect(r.code).toBe(2);
    expect(r.err).toContain('made by a newer Dropline (version 3); this one reads up to 2');
  });

  test('a missing file: exit 2', () => {
    const r = run('check', 'no-such-file.json');
    expect(r.code).toBe(2);
    expect(r.err).toBe('dropline: cannot read no-such-file.json: there is no such file\n');
  });

  test('--json: elements by id, SI figures, percentages with their basis, findings with codes', () => {
    const r = run('check', fixture('over'), '--json');
    expect(r.code).toBe(1);
    const out = JSON.parse(r.out);
    expect(out).toMatchObject({ tool: 'dropline', outputVersion: 1, exitCode: 1 });
    expect(out.summary).toMatchObject({ loads: 1, over: 1, exitCode: 1 });
    const cable = out.results.cables.C1;
    expect(cable.ibA).toBeCloseTo(10, 6); // 2300 W / 230 V
    expect(cable.dropV).toBeCloseTo(12.412, 2); // hand calculation above
    expect(cable.dropPct).toMatchObject({ basis: 'U0', basisV: 230 });
    expect(out.results.loads.L1.cumulativePct.value).toBeCloseTo(5.397, 2);
    expect(out.results.loads.L1.status).toBe('over');
    expect(out.results.findings.some((f: { code: string }) => f.code === 'overLimit')).toBe(true);
    expect(cable.working.length).toBeGreaterThan(0);
    expect(out.cautions.length).toBeGreaterThan(0);
  });

  test('--working ID prints every record with formula, inputs and sources', () => {
    const r = run('check', fixture('pass'), '--working', 'C1');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^WORKING FOR cable C1 "Heater radial" \(S1 > L1\)/);
    expect(r.out).toMatch(/formula: /);
    expect(r.out).toMatch(/L = 20 m.*\(document: cable C1 lengthM\)/);
    expect(r.out).toMatch(/result: /);
  });

  test('--working shows what the details panel shows: capacity and R1 + R2, loop impedance and fault level', () => {
    const cable = run('check', demo, '--working', 'C27');
    expect(cable.out).toMatch(/Capacity and R1 \+ R2:\n {2}Current-carrying capacity Iz {2}\[iz\]/);
    expect(cable.out).toMatch(/\[r1r2\]/);
    // The check that points to the Iz working now has it printed above it.
    expect(cable.out.indexOf('[iz]')).toBeLessThan(cable.out.indexOf('see the Iz working'));
    const board = run('check', demo, '--working', 'DB4');
    expect(board.out).toMatch(/Loop impedance and fault level:\n/);
    expect(board.out).toMatch(/Protection checks:\n/);
  });

  test('--working with an unknown id: exit 2 with a suggestion', () => {
    const r = run('check', fixture('pass'), '--working', 'c1x');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/no element "c1x".*ids that look alike: C1/);
  });

  test('--help and a wrong command line', () => {
    const h = run('--help');
    expect(h.code).toBe(0);
    expect(h.out).toMatch(/^usage: dropline check FILE/);
    const bad = run('check', fixture('pass'), '--colour');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/unknown option "--colour"/);
  });

  test('the demo: a full report that fails on its over-limit loads', () => {
    const r = run('check', demo);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/29 loads: \d+ clear, [1-9]\d* tight, [1-9]\d* over/);
  });
});
