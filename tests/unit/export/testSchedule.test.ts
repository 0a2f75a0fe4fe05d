/**
 * The expected test values sheet, against a hand calculation for an invented circuit: a board fed
 * by a 20 m 16 mm² sub-main, and a final circuit in two cables joined at a junction.
 *
 * Conductor resistances at 20 °C from IEC 60228:2004 Table 2 (plain copper, class 2), Ω/km:
 * 1.5 mm² 12.1, 2.5 mm² 7.41, 4 mm² 4.61, 16 mm² 1.15.
 *   Sub-main SM, 16 mm² with a 16 mm² cpc core, 20 m: R1 + R2 = 20 × 2.30e-3 = 0.0460 Ω.
 *   Final circuit C1 (4 / 2.5 mm², 15 m) then C2 (2.5 / 1.5 mm², 10 m):
 *     R1 + R2 = 15 × (4.61 + 7.41)e-3 + 10 × (7.41 + 12.1)e-3 = 0.1803 + 0.1951 = 0.3754 Ω.
 *   Zs with conductors at 20 °C at L1 = Ze 0.35 + 0.0460 + 0.3754 = 0.7714 Ω (the source taken
 *   as its declared Ze, resistive for this check to 3 decimals).
 * Maximum Zs for a type B 20 A breaker, 0.4 s: Cmin × U0 / (5 × In) = 0.95 × 230 / 100 = 2.185 Ω
 * (IEC 60364-4-41 disconnection with Cmin 0.95, as BS 7671:2018 Table 41.3 tabulates it), and the
 * largest value to accept when testing cold is 0.8 × 2.185 = 1.748 Ω (common practice).
 */
import { describe, expect, test } from 'vitest';
import { solve } from '../../../src/solver/solve.ts';
import { SCHEDULE_SHEETS, testSchedule } from '../../../src/export/schedules.ts';
import { scheduleCsv } from '../../../src/export/scheduleCsv.ts';
import { network } from '../../fixtures/build.ts';

const doc = network()
  .supply('S', { zeOhm: 0.35 })
  .board('DB', { name: 'Garage board' })
  .cable('SM', 'S', 'DB', {
    lengthM: 20,
    sizeMm2: 16,
    phases: 3,
    cpc: { kind: 'core', sizeMm2: 16, material: 'Cu' },
    device: { type: 'fuseGG', ratingA: 63, breakingKa: 80 },
  })
  .junction('J')
  .load('L1', { amps: 12, name: 'Workbench sockets' })
  .cable('C1', 'DB', 'J', {
    lengthM: 15,
    sizeMm2: 4,
    cpc: { kind: 'core', sizeMm2: 2.5, material: 'Cu' },
    device: { type: 'mcb', curve: 'B', ratingA: 20, breakingKa: 10 },
  })
  .cable('C2', 'J', 'L1', { lengthM: 10, sizeMm2: 2.5, cpc: { kind: 'core', sizeMm2: 1.5, material: 'Cu' } })
  .doc();
const results = solve(doc);
const schedule = testSchedule(doc, results);
const cells = (id: string) =>
  Object.fromEntries(
    Object.entries(schedule.rows.find((r) => r.id === id)!.cells).map(([k, c]) => [k, c.text]),
  );

describe('expected test values', () => {
  test('one row per circuit end, grouped by the board it starts from; junctions join cables of one circuit', () => {
    expect(schedule.rows.map((r) => r.id)).toEqual(['DB', 'L1']);
    expect(cells('L1')).toMatchObject({
      to: 'Workbench sockets',
      board: 'Garage board',
      cables: 'C1 → C2',
      device: 'MCB B 20 A',
      size: '4 / 2.5 → 2.5 / 1.5',
      length: '25.0',
    });
  });

  test('R1 + R2 and Zs at 20 °C, and the largest Zs to accept when testing cold, as worked by hand', () => {
    const l1 = schedule.rows.find((r) => r.id === 'L1')!.cells;
    expect(l1.r1r2!.sort).toBeCloseTo(0.3754, 4);
    expect(l1.zsCold!.sort).toBeCloseTo(0.7714, 3);
    expect(l1.zsTest!.sort).toBeCloseTo(1.748, 3);
    const db = schedule.rows.find((r) => r.id === 'DB')!.cells;
    expect(db.r1r2!.sort).toBeCloseTo(0.046, 4);
    // The sheet reads the solver's own figures: Zs cold at the load is its result.
    expect(l1.zsCold!.sort).toBe(results.loads.L1!.protection!.zsColdOhm);
  });

  test('a circuit with an RCD gives its IΔn and the general-type time limits (IEC 61008-1, from memory)', () => {
    expect(cells('L1')).toMatchObject({ rcd: '–', rcdLimit: '–' });
    const withRcd = structuredClone(doc);
    const c1 = withRcd.cables.find((c) => c.id === 'C1')!;
    c1.device = { ...c1.device!, type: 'rcbo', rcd: { type: 'A', idnMa: 30 } };
    const row = testSchedule(withRcd, solve(withRcd)).rows.find((r) => r.id === 'L1')!;
    expect(row.cells.rcd!.text).toBe('30 mA type A');
    expect(row.cells.rcdLimit!.text).toBe('300; 40 at 5 IΔn');
    expect(row.cells.device!.text).toBe('RCBO B 20 A');
  });

  test('the columns for measured values are empty and marked to be filled in on site', () => {
    const site = schedule.columns.filter((c) => c.onSite).map((c) => c.id);
    expect(site).toEqual(['r1r2Measured', 'zsMeasured', 'irMeasured', 'rcdMeasured', 'polarity']);
    for (const row of schedule.rows) for (const id of site) expect(row.cells[id]!.text).toBe('');
  });

  test('a failed check of the circuit marks the row over; the CSV carries the note and the empty columns', () => {
    const long = structuredClone(doc);
    long.cables.find((c) => c.id === 'C2')!.lengthM = 200; // Zs far above 2.185 Ω
    const t = testSchedule(long, solve(long));
    expect(t.rows.find((r) => r.id === 'L1')!.status).toBe('over');
    expect(t.rows.find((r) => r.id === 'DB')!.status).toBe('within');
    const sheet = SCHEDULE_SHEETS.tests;
    const csv = scheduleCsv(sheet.title, schedule, doc, results, sheet.statusLabel, sheet.note);
    expect(csv).toContain('Note,"Expected values from the design');
    expect(csv).toMatch(/\r\nL1,clear,Workbench sockets,Garage board,C1 → C2,MCB B 20 A,.*,,,,,\r\n/);
  });
});
