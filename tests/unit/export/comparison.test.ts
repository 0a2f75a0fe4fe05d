/**
 * The comparison tables the CLI's `compare` report and the tender pack share, from a hand-built
 * pair of designs (an outbuilding on a long single-phase sub-main, invented for the test) whose
 * drops and metal are worked out here by hand.
 *
 * Hand calculation of the drops (unity power factor, so reactance plays no part; single-phase, so
 * the loop is 2 × L):
 *   r at 70 °C = r20 × (1 + 0.00393 × 50), r20 from IEC 60228:2004 Table 2 (plain copper, class 2):
 *   1.5 mm² 12.1, 4 mm² 4.61, 6 mm² 3.08, 16 mm² 1.15 Ω/km; α20 0.00393/K from IEC 60228 Annex B.
 *   Sub-main SM, 60 m, carries L1 + L2 = 28 A:
 *     6 mm²:  2 × 28 × 60 × 3.08e-3 × 1.1965 = 12.382 V = 5.384 % of 230 V
 *     16 mm²: 2 × 28 × 60 × 1.15e-3 × 1.1965 =  4.623 V = 2.010 %
 *   C1 to L1 (25 A, 4 mm², 15 m): 4.137 V = 1.799 %;  C2 to L2 (3 A, 1.5 mm², 20 m): 1.737 V = 0.755 %.
 *   L1: 7.18 % → 3.81 % against 5 % (IEC 60364-5-52:2009 Table G.52.1, type A, other uses): over → clear.
 *   L2: 6.14 % → 2.77 % against 3 % (the same table, lighting): over → tight (92 % of the budget,
 *   above the 80 % close-to-limit share the test settings use).
 * Metal with the IEC 60028 density of annealed copper, 8.89 g/cm³ = 8.89e-3 kg per mm² per metre:
 *   SM 6 mm² with a 2.5 mm² cpc core: (2 × 6 + 2.5) × 60 × 8.89e-3 = 7.7343 kg; in 16 mm² with a
 *   16 mm² cpc: (2 × 16 + 16) × 60 × 8.89e-3 = 25.6032 kg; C1 (2 × 4 + 2.5) × 15 × 8.89e-3 =
 *   1.400175 kg; C2 (2 × 1.5 + 2.5) × 20 × 8.89e-3 = 0.9779 kg. Totals 10.112 and 27.981 kg.
 */
import { describe, expect, test } from 'vitest';
import { compareDesigns } from '../../../src/solver/compare/compareDesigns.ts';
import { solve } from '../../../src/solver/solve.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import {
  alternativeLabel,
  changeText,
  COMPARISON_METHOD,
  comparisonTables,
  headerLabel,
  metalWorking,
  signed,
  tableList,
} from '../../../src/export/comparison.ts';
import { network } from '../../fixtures/build.ts';

function outbuilding(subMainMm2: number, cpcMm2: number): ProjectDocument {
  return network()
    .supply('S')
    .board('DB', { name: 'Outbuilding board' })
    .cable('SM', 'S', 'DB', {
      name: 'Sub-main',
      lengthM: 60,
      sizeMm2: subMainMm2,
      cpc: { kind: 'core', sizeMm2: cpcMm2, material: 'Cu' },
    })
    .load('L1', { amps: 25, name: 'Heater' })
    .cable('C1', 'DB', 'L1', { lengthM: 15, sizeMm2: 4 })
    .load('L2', { amps: 3, category: 'lighting', loadKind: 'lighting' })
    .cable('C2', 'DB', 'L2', { lengthM: 20, sizeMm2: 1.5 })
    .doc();
}

const side = (label: string, doc: ProjectDocument) => ({ label, doc, results: solve(doc) });
const A = side('As drawn', outbuilding(6, 2.5));
const B = side('Sub-main in 16 mm²', outbuilding(16, 16));
const tables = comparisonTables(compareDesigns(A, B));
const row = (rows: string[][], first: string) => rows.find((r) => r[0] === first);

describe('comparison tables', () => {
  test('the summary sets the totals side by side with B − A', () => {
    const s = tables.summary;
    expect(s.headers).toEqual(['', 'As drawn', 'Sub-main in 16 mm²', 'Change (B − A)']);
    expect(row(s.rows, 'Loads clear')).toEqual(['Loads clear', '0', '1', '+1']);
    expect(row(s.rows, 'Loads tight')).toEqual(['Loads tight', '0', '1', '+1']);
    expect(row(s.rows, 'Loads over')).toEqual(['Loads over', '2', '0', '-2']);
    expect(row(s.rows, 'Loads with no result')).toEqual(['Loads with no result', '0', '0', 'no change']);
    // The worst load is L2 in both (hand calculation above): 6.14 % then 2.77 % of its 3 % limit.
    expect(row(s.rows, 'Worst load: drop % of its limit')).toEqual([
      'Worst load: drop % of its limit',
      'L2: 6.14 % of 3.00 %',
      'L2: 2.77 % of 3.00 %',
      '-3.37 points',
    ]);
    // Both loads over their limit are error findings (overLimit); none in B.
    expect(row(s.rows, 'Error findings')).toEqual(['Error findings', '2', '0', '-2']);
    expect(row(s.rows, 'Failed protection checks')?.slice(1)).toEqual(['0', '0', 'no change']);
    // 10.112375 kg → 27.981275 kg of copper (IEC 60028 density, by hand above).
    expect(row(s.rows, 'Copper in conductors, kg')).toEqual([
      'Copper in conductors, kg',
      '10.1',
      '28.0',
      '+17.9',
    ]);
    expect(row(s.rows, 'Aluminium in conductors, kg')?.slice(1)).toEqual(['0.00', '0.00', 'no change']);
    // 60 + 15 + 20 m of route in both.
    expect(row(s.rows, 'Cable route, total m')?.slice(1)).toEqual(['95.0', '95.0', 'no change']);
    expect(s.tones[s.rows.findIndex((r) => r[0] === 'Loads over')]).toBe('better');
  });

  test('loads that changed status come first, with their drops by hand, the change and the limit', () => {
    const t = tables.statusChanged;
    expect(t.headers).toEqual([
      'Id',
      'Load',
      'As drawn: drop %',
      'Sub-main in 16 mm²: drop %',
      'Change, points',
      'Limit %',
      'As drawn: status',
      'Sub-main in 16 mm²: status',
    ]);
    // The change is the sub-main's alone: 2.010 − 5.384 = −3.37 points for both loads.
    expect(t.rows).toEqual([
      ['L1', 'Heater', '7.18', '3.81', '-3.37', '5.00', '✕ over', '✓ clear'],
      ['L2', '', '6.14', '2.77', '-3.37', '3.00', '✕ over', '▲ tight'],
    ]);
    expect(t.tones).toEqual(['better', 'better']);
    // Every load changed status, so none is left for the second table.
    expect(tables.dropMoved.rows).toEqual([]);
    expect(tables.dropMoved.empty).toMatch(/No other load/);
  });

  test('a drop that moves without a change of status is listed in the second table', () => {
    // 25 mm² (0.727 Ω/km, IEC 60228:2004 Table 2): SM 2 × 28 × 60 × 0.727e-3 × 1.1965 = 2.923 V
    // = 1.271 % of 230 V; L1 1.271 + 1.799 = 3.07 %, L2 1.271 + 0.755 = 2.03 %.
    const c = comparisonTables(compareDesigns(B, side('Sub-main in 25 mm²', outbuilding(25, 16))));
    const l1 = row(c.dropMoved.rows, 'L1');
    // 16 mm² → 25 mm²: L1 3.81 % → 3.07 %, −0.74 points; both clear (under 80 % of 5 %).
    expect(l1).toEqual(['L1', 'Heater', '3.81', '3.07', '-0.74', '5.00', '✓ clear', '✓ clear']);
    // L2 was tight (92 % of 3 %) and is clear at 2.03 % (68 %): it changed status.
    expect(row(c.statusChanged.rows, 'L2')?.slice(6)).toEqual(['▲ tight', '✓ clear']);
  });

  test('cables changed say what changed in plain words and the copper it adds', () => {
    expect(tables.cables.headers).toEqual([
      'Id',
      'Cable',
      'What changed (A → B)',
      'Own drop (A → B)',
      'Copper, kg',
    ]);
    // Own drop 5.384 % → 2.010 % of U0 and 25.6032 − 7.7343 = 17.8689 kg (both by hand above).
    expect(tables.cables.rows).toEqual([
      ['SM', 'Sub-main', 'size 6 → 16 mm²; cpc size 2.5 → 16 mm²', '5.38 → 2.01 % of U0', '+17.9'],
    ]);
    expect(tables.changes.rows).toEqual([]);
    expect(tables.changes.empty).toMatch(/No setting, supply, board or load input changed/);
  });

  test('settings, boards and load inputs that differ, and elements in one design only', () => {
    const other = outbuilding(6, 2.5);
    other.settings.limitProfile = 'iecPrivate';
    other.settings.closeThreshold = 0.9;
    const db = other.nodes.find((n) => n.id === 'DB')!;
    if (db.kind === 'board') db.diversity = 0.8;
    const l1 = other.nodes.find((n) => n.id === 'L1')!;
    if (l1.kind === 'load') l1.demand = { value: 20, unit: 'A' };
    other.nodes = other.nodes.filter((n) => n.id !== 'L2');
    other.cables = other.cables.filter((x) => x.id !== 'C2');
    const t = comparisonTables(compareDesigns(A, side('Changed', other)));
    expect(t.changes.headers).toEqual(['Element', 'What', 'As drawn', 'Changed']);
    expect(t.changes.rows).toEqual([
      [
        'Settings',
        'limit profile',
        'IEC 60364-5-52 Annex G, public LV supply (type A)',
        'IEC 60364-5-52 Annex G, private LV supply (type B)',
      ],
      ['Settings', 'tight from', '80 % of the drop budget', '90 % of the drop budget'],
      ['Board DB (Outbuilding board)', 'diversity', '1', '0.8'],
      ['Load L1 (Heater)', 'demand', '25', '20'],
    ]);
    const l2 = row(t.statusChanged.rows, 'L2')!;
    expect(l2.slice(2, 5)).toEqual(['6.14', '–', '–']);
    expect(l2[7]).toBe('not in this design');
    // C2 is gone: 0.9779 kg of copper less (by hand above).
    // Its own drop was 0.755 % of U0 (by hand above).
    expect(row(t.cables.rows, 'C2')).toEqual([
      'C2',
      '',
      'only in A: 1.5 mm² Cu, 20.0 m, DB → L2',
      '0.76 → – % of U0',
      '-0.98',
    ]);
  });

  test('the tables come in print order and every one can say it is empty', () => {
    expect(tableList(tables).map((t) => t.title)).toEqual([
      'In brief',
      'Loads that changed status',
      'Loads whose drop moved',
      'Cables changed',
      'Settings, supply, boards and load inputs changed',
    ]);
    for (const t of tableList(tables)) {
      expect(t.headers.length).toBe(t.align.length);
      for (const r of t.rows) expect(r.length).toBe(t.headers.length);
      expect(t.tones.length).toBe(t.rows.length);
    }
  });
});

describe('wording helpers', () => {
  test('a change keeps its sign, and nothing that would print as zero reads "no change"', () => {
    expect(signed(17.8689)).toBe('+17.9');
    expect(signed(-2, 0)).toBe('-2');
    expect(signed(0.004, 2)).toBe('no change');
    expect(signed(1e-12)).toBe('no change');
    expect(signed(Number.NaN)).toBe('–');
    expect(signed(0.5, 2, 'points')).toBe('+0.50 points');
  });

  test('a field change shares its unit: "size 6 → 16 mm²"', () => {
    expect(changeText({ field: 'sizeMm2', label: 'size', a: '6 mm²', b: '16 mm²' })).toBe('size 6 → 16 mm²');
    expect(changeText({ field: 'cpc.kind', label: 'cpc', a: 'core', b: 'separate' })).toBe(
      'cpc core → separate',
    );
    expect(changeText({ field: 'device.type', label: 'device', a: 'none', b: 'mcb' })).toBe(
      'device none → mcb',
    );
  });

  test('long labels are shortened for headers; an alternative cannot pass for the current design', () => {
    expect(headerLabel('Short')).toBe('Short');
    expect(headerLabel('x'.repeat(80))).toHaveLength(28);
    expect(headerLabel('x'.repeat(80)).endsWith('…')).toBe(true);
    expect(alternativeLabel({ name: 'current design' })).toBe('Alternative "current design"');
    expect(alternativeLabel({ name: 'Board moved' })).toBe('Board moved');
  });
});

describe('conductor metal working', () => {
  test('the formula and both densities with their sources, once, then one row per design', () => {
    const c = compareDesigns(A, B);
    const w = metalWorking([c.a, c.b]);
    expect(w.lines[0]).toMatch(/^Formula: m = Σ ρ × S × L/);
    expect(w.lines.some((l) => l.startsWith('ρ Cu = 8890 kg/m³ (IEC 60028'))).toBe(true);
    expect(w.lines.some((l) => l.startsWith('ρ Al = 2703 kg/m³ (IEC 60889'))).toBe(true);
    expect(w.lines.some((l) => /armour/.test(l))).toBe(true);
    expect(w.table.rows).toEqual([
      ['As drawn', 'cable runs = 3 (document: cables); Σ L = 95 m (document: cable lengthM)', '10.1', '0.00'],
      [
        'Sub-main in 16 mm²',
        'cable runs = 3 (document: cables); Σ L = 95 m (document: cable lengthM)',
        '28.0',
        '0.00',
      ],
    ]);
  });

  test('the method names the densities and their standards', () => {
    // IEC 60028: 8.89 g/cm³ annealed copper at 20 °C; IEC 60889: 2.703 g/cm³ aluminium wire at 20 °C.
    expect(COMPARISON_METHOD).toContain('copper 8.89 g/cm³ (IEC 60028)');
    expect(COMPARISON_METHOD).toContain('aluminium 2.703 g/cm³ (IEC 60889)');
    expect(COMPARISON_METHOD).toMatch(/neutral of the same size/);
    expect(COMPARISON_METHOD).toMatch(/armour/);
  });
});
