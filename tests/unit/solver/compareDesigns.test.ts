import { describe, expect, test } from 'vitest';
import { compareDesigns } from '../../../src/solver/compare/compareDesigns.ts';
import { cableMetal, metalTotals } from '../../../src/solver/compare/conductorMetal.ts';
import { solve } from '../../../src/solver/solve.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import { network } from '../../fixtures/build.ts';

/** An outbuilding on a long single-phase sub-main (invented for the test). */
function outbuilding(subMainMm2: number, cpcMm2: number): ProjectDocument {
  return network()
    .supply('S')
    .board('DB')
    .cable('SM', 'S', 'DB', {
      lengthM: 60,
      sizeMm2: subMainMm2,
      cpc: { kind: 'core', sizeMm2: cpcMm2, material: 'Cu' },
    })
    .load('L1', { amps: 25 })
    .cable('C1', 'DB', 'L1', { lengthM: 15, sizeMm2: 4 })
    .load('L2', { amps: 3, category: 'lighting', loadKind: 'lighting' })
    .cable('C2', 'DB', 'L2', { lengthM: 20, sizeMm2: 1.5 })
    .doc();
}

const side = (label: string, doc: ProjectDocument) => ({ label, doc, results: solve(doc) });

describe('conductor metal', () => {
  // Hand calculation with the IEC 60028 density of annealed copper, 8.89 g/cm³ = 8.89e-3 kg per
  // mm² per metre, and the IEC 60889 density of aluminium wire, 2.703 g/cm³.
  test('single-phase: line, neutral and cpc core along the route', () => {
    const [sm] = outbuilding(6, 2.5).cables;
    // (2 × 6 + 2.5) mm² × 60 m × 8.89e-3 = 7.7343 kg
    expect(cableMetal(sm!)).toEqual({ copperKg: expect.closeTo(7.7343, 6), aluminiumKg: 0 });
  });

  test('three-phase aluminium with a copper cpc, in parallel; armour is not counted', () => {
    const base = outbuilding(6, 2.5).cables[0]!;
    const al = { ...base, phases: 3 as const, material: 'Al' as const, sizeMm2: 25, parallel: 2 };
    // Lines and neutral: 4 × 25 mm² × 60 m × 2 cables × 2.703e-3 = 32.436 kg Al;
    // cpc core in each cable: 2.5 mm² × 60 m × 2 × 8.89e-3 = 2.667 kg Cu.
    const m = cableMetal({ ...al, cpc: { kind: 'core', sizeMm2: 2.5, material: 'Cu' } });
    expect(m.aluminiumKg).toBeCloseTo(32.436, 6);
    expect(m.copperKg).toBeCloseTo(2.667, 6);
    const armoured = cableMetal({ ...al, cpc: { kind: 'armour', sizeMm2: 46, material: 'steel' } });
    expect(armoured).toEqual({ copperKg: 0, aluminiumKg: expect.closeTo(32.436, 6) });
    // A separate cpc is one conductor along the route, however many cables run in parallel.
    const separate = cableMetal({ ...al, cpc: { kind: 'separate', sizeMm2: 16, material: 'Cu' } });
    expect(separate.copperKg).toBeCloseTo(16 * 60 * 8.89e-3, 9);
  });

  test('totals add the runs, and unusable figures count as nothing rather than NaN', () => {
    const doc = outbuilding(6, 2.5);
    const t = metalTotals(doc.cables);
    // C1: (2 × 4 + 2.5) × 15 × 8.89e-3 = 1.400175; C2: (2 × 1.5 + 2.5) × 20 × 8.89e-3 = 0.9779.
    expect(t.copperKg).toBeCloseTo(7.7343 + 1.400175 + 0.9779, 6);
    expect(t.routeM).toBe(95);
    expect(t.working.inputs.find((i) => i.name === 'ρ Cu')?.source).toMatch(/IEC 60028/);
    const broken = { ...doc.cables[0]!, lengthM: Number.NaN, sizeMm2: -1 };
    expect(metalTotals([broken]).copperKg).toBe(0);
  });
});

describe('compareDesigns', () => {
  const a = side('As drawn', outbuilding(6, 2.5));
  const b = side('Sub-main in 16 mm²', outbuilding(16, 16));

  test('the load over its limit on the thin sub-main comes within it on the thicker one', () => {
    const c = compareDesigns(a, b);
    const l1 = c.loads.find((l) => l.id === 'L1')!;
    expect(a.results.loads.L1!.status).toBe('over');
    expect(b.results.loads.L1!.status).not.toBe('over');
    expect(l1.statusChanged).toBe(true);
    expect(l1.direction).toBe('better');
    expect(l1.a!.status).toBe('over');
    // The change in the load's drop is the change in the sub-main's drop: nothing else moved.
    const subMainChange = b.results.cables.SM!.cumulativePct.value - a.results.cables.SM!.cumulativePct.value;
    expect(l1.dropChangePct).toBeCloseTo(subMainChange, 9);
    expect(l1.dropChangePct).toBeLessThan(0);
    expect(l1.changes).toEqual([]);
    expect(c.a.loads.over).toBeGreaterThan(c.b.loads.over);
  });

  test('only the changed cable is listed, with its field changes and the metal it adds', () => {
    const c = compareDesigns(a, b);
    expect(c.cables.map((x) => x.id)).toEqual(['SM']);
    const sm = c.cables[0]!;
    expect(sm.changes).toEqual([
      { field: 'sizeMm2', label: 'size', a: '6 mm²', b: '16 mm²' },
      { field: 'cpc.sizeMm2', label: 'cpc size', a: '2.5 mm²', b: '16 mm²' },
    ]);
    // (2 × 16 + 16) × 60 × 8.89e-3 = 25.6032 kg against 7.7343 kg.
    expect(sm.copperKgChange).toBeCloseTo(25.6032 - 7.7343, 6);
    expect(c.b.metal.copperKg - c.a.metal.copperKg).toBeCloseTo(25.6032 - 7.7343, 6);
    expect(c.settings).toEqual([]);
    expect(c.nodes).toEqual([]);
  });

  test('added, removed and moved elements, input and settings changes are all told', () => {
    const other = outbuilding(6, 2.5);
    other.settings.limitProfile = 'iecPrivate';
    const db = other.nodes.find((n) => n.id === 'DB')!;
    db.position = { x: 40, y: 0 };
    db.plan = { xM: 12.5, yM: 3 };
    if (db.kind === 'board') db.diversity = 0.8;
    const l1 = other.nodes.find((n) => n.id === 'L1')!;
    if (l1.kind === 'load') l1.demand = { value: 20, unit: 'A' };
    other.nodes = other.nodes.filter((n) => n.id !== 'L2');
    other.cables = other.cables.filter((x) => x.id !== 'C2');
    other.nodes.push({ kind: 'junction', id: 'J1', name: 'Joint', position: { x: 0, y: 0 } });
    const c = compareDesigns(a, side('Changed', other));
    expect(c.settings).toEqual([
      { field: 'limitProfile', label: 'limit profile', a: 'iecPublic', b: 'iecPrivate' },
    ]);
    expect(c.nodes).toEqual([
      {
        id: 'DB',
        kind: 'board',
        name: 'DB',
        presence: 'both',
        changes: [
          { field: 'diversity', label: 'diversity', a: '1', b: '0.8' },
          { field: 'position', label: 'place on the drawing', a: '(0, 0)', b: '(40, 0)' },
          { field: 'plan', label: 'place on the site plan', a: 'not placed', b: '(12.5 m, 3 m)' },
        ],
      },
      { id: 'J1', kind: 'junction', name: 'Joint', presence: 'added', changes: [] },
    ]);
    const loads = Object.fromEntries(c.loads.map((l) => [l.id, l]));
    expect(loads.L1!.changes).toEqual([{ field: 'demand.value', label: 'demand', a: '25', b: '20' }]);
    expect(loads.L2!.b).toBeNull();
    expect(loads.L2!.statusChanged).toBe(false);
    expect(c.cables.find((x) => x.id === 'C2')).toMatchObject({
      b: null,
      copperKgChange: expect.closeTo(-0.9779, 6),
    });
  });

  test('a route bent another way on the plan is told by its bends; equal bends are no change', () => {
    const bent = (via: { xM: number; yM: number }[]) => {
      const doc = outbuilding(16, 16);
      doc.cables[0] = { ...doc.cables[0]!, route: { allowanceM: 2, via } };
      return doc;
    };
    const a = side('A', bent([{ xM: 10, yM: 0 }]));
    const same = compareDesigns(a, side('Same', bent([{ xM: 10, yM: 0 }])));
    expect(same.cables).toEqual([]);
    const other = compareDesigns(
      a,
      side(
        'B',
        bent([
          { xM: 10, yM: 5 },
          { xM: 20, yM: 5 },
        ]),
      ),
    );
    expect(other.cables[0]!.changes).toEqual([
      {
        field: 'route.via',
        label: 'bends on the plan route',
        a: '1 at (10, 0) m',
        b: '2 at (10, 5) (20, 5) m',
      },
    ]);
  });

  test('a broken design compares without throwing; its unsolved loads are counted as such', () => {
    const broken = outbuilding(6, 2.5);
    broken.cables = broken.cables.filter((x) => x.id !== 'SM');
    const c = compareDesigns(a, side('No sub-main', broken));
    expect(c.b.loads.unsolved).toBe(2);
    expect(c.b.worst).toBeNull();
    expect(c.loads.find((l) => l.id === 'L1')).toMatchObject({ statusChanged: true, direction: 'worse' });
    expect(c.b.errors).toBeGreaterThan(0);
  });
});
