import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveDrop } from '../../src/solver/solveDrop.ts';
import { BUILTIN_CATALOGUE } from '../../src/catalogue/builtinConductors.ts';
import { sizesFor } from '../../src/catalogue/conductorLookup.ts';
import type { Phase, ProjectDocument } from '../../src/model/types.ts';
import { radialNetwork } from '../fixtures/randomRadial.ts';

const SEED = 20261201;
const runs = { seed: SEED, numRuns: 150 };
const PH: Phase[] = ['L1', 'L2', 'L3'];

describe('solver properties on random radial networks', () => {
  it('per phase, the current into every board or junction equals the sum of its outgoing currents', () => {
    // cos φ 1 everywhere, unit demand factors and diversity: the phasors of one phase are in
    // line, so their magnitudes add.
    fc.assert(
      fc.property(radialNetwork({ unityPf: true }), (doc) => {
        const r = solveDrop(doc);
        expect(r.findings.filter((f) => f.severity === 'error' && f.code !== 'overLimit')).toEqual([]);
        for (const into of doc.cables) {
          const out = doc.cables.filter((c) => c.from === into.to);
          if (out.length === 0) continue;
          for (const p of PH) {
            const sum = out.reduce((a, c) => a + (r.cables[c.id]?.currentsA[p] ?? 0), 0);
            expect(r.cables[into.id]?.currentsA[p]).toBeCloseTo(sum, 8);
          }
        }
      }),
      runs,
    );
  });

  it('drops add along every path: a load’s cumulative is the sum of its segments on its phase', () => {
    fc.assert(
      fc.property(radialNetwork(), (doc) => {
        const r = solveDrop(doc);
        for (const n of doc.nodes) {
          if (n.kind !== 'load') continue;
          const load = r.loads[n.id]!;
          const phases = n.phases === 3 ? PH : [n.phase];
          const sums = phases.map((p) =>
            load.path.reduce((a, id) => a + (r.cables[id]?.phaseDropV[p] ?? 0), 0),
          );
          expect(load.cumulativePct.value).toBeCloseTo((Math.max(...sums) / 230) * 100, 9);
          expect(load.shares.reduce((a, s) => a + s.dropPct, 0)).toBeCloseTo(load.cumulativePct.value, 9);
        }
      }),
      runs,
    );
  });

  it('a bigger conductor never raises a load’s drop (balanced networks)', () => {
    // Only where every segment is balanced: with a neutral current, a smaller neutral impedance
    // also shrinks the star-point shift that raises the lightly loaded phases, so on those phases
    // a bigger cable can legitimately increase the drop.
    fc.assert(
      fc.property(radialNetwork({ threePhaseOnly: true }), fc.nat(), (doc, pick) => {
        const before = solveDrop(doc);
        const cable = doc.cables[pick % doc.cables.length]!;
        const sizes = sizesFor(BUILTIN_CATALOGUE, cable.material, cable.insulation, cable.construction);
        const next = sizes.find((s) => s > cable.sizeMm2);
        fc.pre(next !== undefined);
        const bigger: ProjectDocument = structuredClone(doc);
        bigger.cables.find((c) => c.id === cable.id)!.sizeMm2 = next as number;
        const after = solveDrop(bigger);
        for (const id of Object.keys(before.loads))
          expect(after.loads[id]!.cumulativePct.value).toBeLessThanOrEqual(
            before.loads[id]!.cumulativePct.value + 1e-12,
          );
      }),
      runs,
    );
  });

  it('a load spread along its cable halves that cable’s own drop and changes no other cable’s', () => {
    // Uniformly distributed load: the far-end drop is the whole current over half the length
    // (common practice). Its current is the same, so every other segment drops as before.
    fc.assert(
      fc.property(radialNetwork(), fc.nat(), (doc, pick) => {
        const loads = doc.nodes.filter((n) => n.kind === 'load');
        fc.pre(loads.length > 0);
        const load = loads[pick % loads.length]!;
        const before = solveDrop(doc);
        const feed = doc.cables.find((c) => c.to === load.id);
        fc.pre(feed !== undefined && before.cables[feed.id]?.solved !== false);
        const spread: ProjectDocument = structuredClone(doc);
        const target = spread.nodes.find((n) => n.id === load.id)!;
        if (target.kind === 'load') target.distributed = true;
        const after = solveDrop(spread);
        for (const c of doc.cables) {
          const a = before.cables[c.id];
          const b = after.cables[c.id];
          if (!a || !b || a.solved === false) continue;
          const want = c.id === feed!.id ? a.dropV / 2 : a.dropV;
          expect(b.dropV).toBeCloseTo(want, 9);
        }
      }),
      runs,
    );
  });

  it('never throws on mangled documents, and reports them', () => {
    const junk = fc.constantFrom<unknown>(
      NaN,
      -1,
      0,
      '',
      'x',
      null,
      undefined,
      {},
      [],
      Infinity,
      '__proto__',
      true,
    );
    const mutation = fc.record({
      list: fc.constantFrom('nodes', 'cables', 'settings', 'root'),
      index: fc.nat(),
      field: fc.constantFrom(
        'id',
        'kind',
        'from',
        'to',
        'lengthM',
        'sizeMm2',
        'phases',
        'phase',
        'demand',
        'powerFactor',
        'demandFactor',
        'parallel',
        'material',
        'diversity',
        'u0V',
        'uLlV',
        'limitProfile',
        'customLimits',
        'closeThreshold',
        'nodes',
        'cables',
      ),
      value: junk,
      remove: fc.boolean(),
      drop: fc.boolean(),
    });
    fc.assert(
      fc.property(
        radialNetwork({ maxElements: 12 }),
        fc.array(mutation, { minLength: 1, maxLength: 6 }),
        (doc, muts) => {
          const mangled = structuredClone(doc) as unknown as Record<string, unknown>;
          for (const m of muts) {
            if (m.list === 'root') {
              mangled[m.field] = m.value;
              continue;
            }
            const target = mangled[m.list];
            if (m.list === 'settings') {
              if (target && typeof target === 'object')
                (target as Record<string, unknown>)[m.field] = m.value;
              continue;
            }
            if (!Array.isArray(target) || target.length === 0) continue;
            const i = m.index % target.length;
            if (m.drop) target.splice(i, 1);
            else if (target[i] && typeof target[i] === 'object') {
              if (m.remove) delete (target[i] as Record<string, unknown>)[m.field];
              else (target[i] as Record<string, unknown>)[m.field] = m.value;
            } else target[i] = m.value;
          }
          const r = solveDrop(mangled as unknown as ProjectDocument);
          expect(Array.isArray(r.findings)).toBe(true);
          expect(() => JSON.stringify(r)).not.toThrow();
          for (const f of r.findings) expect(f.message.length).toBeGreaterThan(10);
        },
      ),
      { seed: SEED, numRuns: 300 },
    );
  });
});
