/**
 * Property tests on random radial networks (seeded): every proposed sizing passes every check it
 * claims when solved for real, and the tree sizing never uses more conductor than the per-cable
 * sizing it is compared with.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { newBoard, newCable, newLoad, newProject } from '../../src/model/defaults.ts';
import type { ProjectDocument } from '../../src/model/types.ts';
import { solve } from '../../src/solver/solve.ts';
import { proposeTreeSizing } from '../../src/solver/sizing/proposeTreeSizing.ts';
import { proposeCableSize } from '../../src/solver/sizing/proposeCableSize.ts';
import { DEFAULT_SIZING, failingSizingChecks } from '../../src/solver/sizing/sizingCore.ts';
import type { SizeChange } from '../../src/solver/sizing/sizingCore.ts';
import { clipped } from '../unit/protection/workedDoc.ts';

const network = fc.record({
  subMainM: fc.integer({ min: 5, max: 80 }),
  boards: fc.array(
    fc.record({
      lengthM: fc.integer({ min: 5, max: 60 }),
      loads: fc.array(
        fc.record({
          lengthM: fc.integer({ min: 3, max: 40 }),
          kw: fc.integer({ min: 1, max: 3 }),
          lighting: fc.boolean(),
        }),
        { minLength: 1, maxLength: 3 },
      ),
    }),
    { minLength: 1, maxLength: 2 },
  ),
});

type Net = typeof network extends fc.Arbitrary<infer T> ? T : never;

function build(n: Net): ProjectDocument {
  const doc = newProject();
  doc.nodes.push(newBoard('MB', { x: 0, y: 0 }));
  doc.cables.push(
    newCable('SM', 'S1', 'MB', undefined, {
      lengthM: n.subMainM,
      insulation: 'thermosetting90',
      construction: 'armouredMulticore',
      sizeMm2: 16,
      cpc: { kind: 'core', sizeMm2: 16, material: 'Cu' },
      phases: 3,
      device: { type: 'fuseGG', ratingA: 100, breakingKa: 80 },
      installation: clipped,
    }),
  );
  n.boards.forEach((b, i) => {
    doc.nodes.push(newBoard(`DB${i}`, { x: 0, y: 0 }));
    doc.cables.push(
      newCable(`B${i}`, 'MB', `DB${i}`, undefined, {
        lengthM: b.lengthM,
        insulation: 'thermosetting90',
        construction: 'armouredMulticore',
        sizeMm2: 6,
        cpc: { kind: 'core', sizeMm2: 6, material: 'Cu' },
        phases: 3,
        device: { type: 'fuseGG', ratingA: 32, breakingKa: 80 },
        installation: clipped,
      }),
    );
    b.loads.forEach((l, j) => {
      const id = `L${i}_${j}`;
      doc.nodes.push(
        newLoad(id, { x: 0, y: 0 }, l.lighting ? 'lighting' : 'heating', {
          demand: { value: l.kw, unit: 'kW' },
          phase: (['L1', 'L2', 'L3'] as const)[j % 3],
        }),
      );
      doc.cables.push(
        newCable(`F${i}_${j}`, `DB${i}`, id, undefined, {
          lengthM: l.lengthM,
          sizeMm2: 1.5,
          cpc: { kind: 'core', sizeMm2: 1, material: 'Cu' },
          device: { type: 'mcb', curve: 'B', ratingA: 16, breakingKa: 10 },
          installation: clipped,
        }),
      );
    });
  });
  return doc;
}

function apply(doc: ProjectDocument, changes: SizeChange[]): ProjectDocument {
  const out = structuredClone(doc);
  for (const ch of changes) {
    const c = out.cables.find((x) => x.id === ch.cableId)!;
    if (ch.field === 'sizeMm2') c.sizeMm2 = ch.to;
    else c.cpc.sizeMm2 = ch.to;
  }
  return out;
}

describe('tree sizing', () => {
  it('passes every claimed check when it says it passes, and never uses more conductor than per-cable sizing', () => {
    let passing = 0;
    fc.assert(
      fc.property(network, (n) => {
        const doc = build(n);
        const r = proposeTreeSizing(doc);
        const applied = apply(doc, r.changes);
        if (r.passes) {
          passing++;
          expect(failingSizingChecks(solve(applied))).toEqual([]);
        }
        if (r.perCablePasses) expect(r.volumeTreeMm2M).toBeLessThanOrEqual(r.volumePerCableMm2M + 1e-9);
        expect(r.volumeTreeMm2M).toBeCloseTo(
          applied.cables.reduce((v, c) => v + c.sizeMm2 * c.lengthM, 0),
          6,
        );
      }),
      { numRuns: 12, seed: 4242 },
    );
    // The property must bite: most random networks get a passing design.
    expect(passing).toBeGreaterThan(6);
  });
});

describe('tree sizing with a terminal limit on final circuits', () => {
  it('never gives a final circuit more than the limit, and what it says passes does pass', () => {
    let capped = 0;
    fc.assert(
      fc.property(network, fc.constantFrom(2.5, 4, 6), (n, maxFinalMm2) => {
        const doc = build(n);
        const r = proposeTreeSizing(doc, { ...DEFAULT_SIZING, maxFinalMm2 });
        expect(r.maxFinalMm2).toBe(maxFinalMm2);
        const applied = apply(doc, r.changes);
        for (const c of applied.cables) {
          const drawn = doc.cables.find((x) => x.id === c.id)!;
          // Finals are the F cables (board to load); sub-mains are not limited.
          if (c.id.startsWith('F') && c.sizeMm2 !== drawn.sizeMm2) {
            expect(c.sizeMm2).toBeLessThanOrEqual(maxFinalMm2);
            capped++;
          }
        }
        if (r.passes) expect(failingSizingChecks(solve(applied))).toEqual([]);
      }),
      { numRuns: 10, seed: 777 },
    );
    // The property must bite: some final circuits were resized under the limit.
    expect(capped).toBeGreaterThan(0);
  });
});

describe('single-cable sizing', () => {
  it('the proposed size passes Iz, I2, cpc and Zs at the far end of that cable', () => {
    fc.assert(
      fc.property(network, (n) => {
        const doc = build(n);
        const { changes, error } = proposeCableSize(doc, 'F0_0');
        if (error) return;
        const res = solve(apply(doc, changes));
        const checks = [
          ...(res.cables.F0_0!.protection?.checks ?? []),
          ...(res.nodes.L0_0!.protection?.checks ?? []),
        ];
        for (const c of checks) if (['inIz', 'i2', 'cpc', 'zs'].includes(c.key)) expect(c.pass).toBe(true);
      }),
      { numRuns: 12, seed: 99 },
    );
  });
});
