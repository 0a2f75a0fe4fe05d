// Properties of comparing two designs, on random radial networks (tests/fixtures/randomRadial.ts).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { compareDesigns } from '../../src/solver/compare/compareDesigns.ts';
import { metalTotals } from '../../src/solver/compare/conductorMetal.ts';
import { solve } from '../../src/solver/solve.ts';
import { BUILTIN_CATALOGUE } from '../../src/catalogue/builtinConductors.ts';
import { sizesFor } from '../../src/catalogue/conductorLookup.ts';
import type { ProjectDocument } from '../../src/model/types.ts';
import { radialNetwork } from '../fixtures/randomRadial.ts';

const runs = { seed: 20261202, numRuns: 60 };
const side = (label: string, doc: ProjectDocument) => ({ label, doc, results: solve(doc) });

describe('comparing designs', () => {
  it('a design compared with itself shows no change at all', () => {
    fc.assert(
      fc.property(radialNetwork(), (doc) => {
        const c = compareDesigns(side('A', doc), side('B', structuredClone(doc)));
        expect(c.cables).toEqual([]);
        expect(c.nodes).toEqual([]);
        expect(c.settings).toEqual([]);
        for (const l of c.loads) {
          expect(l.statusChanged).toBe(false);
          expect(l.dropChangePct).toBe(0);
          expect(l.changes).toEqual([]);
        }
        expect(c.a.loads).toEqual(c.b.loads);
      }),
      runs,
    );
  });

  it('swapping the designs mirrors every change', () => {
    fc.assert(
      fc.property(radialNetwork(), fc.nat(), (doc, pick) => {
        const other: ProjectDocument = structuredClone(doc);
        const cable = other.cables[pick % other.cables.length]!;
        cable.lengthM = cable.lengthM * 2 + 5;
        const ab = compareDesigns(side('A', doc), side('B', other));
        const ba = compareDesigns(side('B', other), side('A', doc));
        expect(ab.cables.map((x) => x.id)).toEqual([cable.id]);
        expect(ba.cables[0]!.copperKgChange).toBeCloseTo(-ab.cables[0]!.copperKgChange, 9);
        ab.loads.forEach((l, k) => {
          const m = ba.loads[k]!;
          expect(m.id).toBe(l.id);
          expect(m.statusChanged).toBe(l.statusChanged);
          expect(m.dropChangePct).toBeCloseTo(-(l.dropChangePct as number), 9);
          if (l.statusChanged) expect(m.direction).not.toBe(l.direction);
        });
      }),
      runs,
    );
  });

  it('a bigger conductor adds metal and never turns a balanced load worse', () => {
    fc.assert(
      fc.property(radialNetwork({ threePhaseOnly: true }), fc.nat(), (doc, pick) => {
        const cable = doc.cables[pick % doc.cables.length]!;
        const sizes = sizesFor(BUILTIN_CATALOGUE, cable.material, cable.insulation, cable.construction);
        const next = sizes.find((s) => s > cable.sizeMm2);
        fc.pre(next !== undefined);
        const bigger: ProjectDocument = structuredClone(doc);
        bigger.cables.find((c) => c.id === cable.id)!.sizeMm2 = next as number;
        const c = compareDesigns(side('A', doc), side('B', bigger));
        expect(metalTotals(bigger.cables).copperKg + metalTotals(bigger.cables).aluminiumKg).toBeGreaterThan(
          metalTotals(doc.cables).copperKg + metalTotals(doc.cables).aluminiumKg,
        );
        for (const l of c.loads) expect(l.direction).not.toBe('worse');
      }),
      runs,
    );
  });
});
