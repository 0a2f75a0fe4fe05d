/**
 * The fast protection pass (attachProtection: numeric arrays, objects built on first read) against
 * its eager reference form (attachProtectionReference), on the demo and on seeded random radial
 * networks dressed with devices, RCDs, installations, TT and private supplies and motors. Every
 * protection figure, check, working record, finding and summary must be identical, key order
 * included. Neither is the source of truth for the electrical figures (the reference tests check
 * those against published values); this test proves the optimisation changed nothing.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseDocument } from '../../src/model/parseDocument.ts';
import type { Cable, Device, Installation, ProjectDocument } from '../../src/model/types.ts';
import type { Results } from '../../src/solver/results.ts';
import { solveDrop } from '../../src/solver/solveDrop.ts';
import { attachProtection } from '../../src/solver/protection/attachProtection.ts';
import { attachProtectionReference } from '../../src/solver/protection/attachProtectionReference.ts';
import { radialNetwork } from '../fixtures/randomRadial.ts';
import { handResults } from '../unit/protection/handResults.ts';
import { workedDoc } from '../unit/protection/workedDoc.ts';

function demo(): ProjectDocument {
  const text = readFileSync(new URL('../../public/demo-project.json', import.meta.url), 'utf8');
  const r = parseDocument(text);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.doc;
}

/** A protection result with its lazily built checks and working as own fields, for deep equality. */
function plain<T extends { checks: unknown; working: unknown }>(p: T | undefined) {
  return p && { ...p, checks: p.checks, working: p.working };
}

/** Every protection field of every element, both ways of reading: per element, then as JSON. */
function expectSame(fast: Results, ref: Results): void {
  expect(Object.keys(fast.cables)).toEqual(Object.keys(ref.cables));
  expect(Object.keys(fast.nodes)).toEqual(Object.keys(ref.nodes));
  expect(Object.keys(fast.loads)).toEqual(Object.keys(ref.loads));
  for (const id of Object.keys(ref.cables)) {
    expect('protection' in fast.cables[id]!).toBe('protection' in ref.cables[id]!);
    expect(plain(fast.cables[id]!.protection)).toEqual(ref.cables[id]!.protection);
  }
  for (const id of Object.keys(ref.nodes)) {
    expect('protection' in fast.nodes[id]!).toBe('protection' in ref.nodes[id]!);
    expect(plain(fast.nodes[id]!.protection)).toEqual(ref.nodes[id]!.protection);
  }
  for (const id of Object.keys(ref.loads))
    expect(fast.loads[id]!.motorStart).toEqual(ref.loads[id]!.motorStart);
  // Findings compared as read: a failed check's message is made when first read (LazyFinding).
  const read = (fs: Results['findings']) =>
    fs.map((f) => ({ code: f.code, severity: f.severity, elementId: f.elementId, message: f.message }));
  expect(read(fast.findings)).toEqual(read(ref.findings));
  expect(fast.protection).toEqual(ref.protection);
  expect(fast.references).toEqual(ref.references);
  expect(JSON.stringify(fast)).toBe(JSON.stringify(ref));
}

function both(doc: ProjectDocument): { fast: Results; ref: Results } {
  // Separate drop results: the reference writes into the result objects it is given.
  return {
    fast: attachProtection(doc, solveDrop(doc)),
    ref: attachProtectionReference(doc, solveDrop(doc)),
  };
}

const breaker = (type: 'mcb' | 'rcbo') =>
  fc.record({
    type: fc.constant(type),
    curve: fc.constantFrom('B' as const, 'C' as const, 'D' as const),
    ratingA: fc.constantFrom(6, 10, 16, 20, 32, 40, 63, 80, 125),
    breakingKa: fc.constantFrom(3, 6, 10),
  });
const rcd = fc.option(
  fc.record({ type: fc.constantFrom('A' as const, 'AC' as const), idnMa: fc.constantFrom(0, 30, 100, 300) }),
  { nil: undefined },
);
const device: fc.Arbitrary<Device | undefined> = fc.oneof(
  fc.constant(undefined),
  fc.constant(undefined),
  breaker('mcb'),
  fc.tuple(breaker('rcbo'), rcd).map(([d, r]) => (r ? { ...d, rcd: r } : d)),
  // 250 A is not in the built-in fuse data set: the Zs check cannot be assessed.
  fc.record({
    type: fc.constant('fuseGG' as const),
    ratingA: fc.constantFrom(16, 25, 32, 63, 100, 125, 250),
    breakingKa: fc.constantFrom(16, 80),
  }),
  fc
    .record({
      type: fc.constant('mccb' as const),
      ratingA: fc.constantFrom(100, 160, 250),
      breakingKa: fc.constantFrom(10, 36),
      irMultiple: fc.option(fc.constantFrom(0.8, 1), { nil: undefined }),
      imMultiple: fc.option(fc.constantFrom(5, 10), { nil: undefined }),
    })
    .map((d) => JSON.parse(JSON.stringify(d)) as Device),
);
const installation: fc.Arbitrary<Installation | undefined> = fc.option(
  fc.record({
    method: fc.constantFrom(
      'clippedDirect' as const,
      'conduitOnWall' as const,
      'trayOrFreeAir' as const,
      'buriedDirect' as const,
      'inInsulation' as const,
    ),
    ambientC: fc.constantFrom(25, 30, 40, 65),
    groupedCircuits: fc.constantFrom(1, 3, 9, 24),
    groupArrangement: fc.constantFrom('bunched' as const, 'tray' as const),
    insulationFactor: fc.constantFrom(1, 0.5),
  }),
  { nil: undefined },
);
const dressing = fc.record({
  cables: fc.array(
    fc.record({
      device,
      installation,
      construction: fc.constantFrom<Cable['construction']>('multicore', 'armouredMulticore', 'flatTwinEarth'),
      cpcSteelArmour: fc.boolean(),
      oddSize: fc.integer({ min: 0, max: 30 }),
    }),
    { minLength: 40, maxLength: 40 },
  ),
  tt: fc.boolean(),
  raOhm: fc.option(fc.constantFrom(20, 200, 2000), { nil: undefined }),
  privateSupply: fc.boolean(),
  pfcKa: fc.constantFrom(0, 6, 16),
  motorEvery: fc.integer({ min: 2, max: 6 }),
});

type Dressing = typeof dressing extends fc.Arbitrary<infer T> ? T : never;

function dress(doc: ProjectDocument, d: Dressing): ProjectDocument {
  const s = doc.nodes.find((n) => n.kind === 'supply');
  if (s?.kind === 'supply') {
    s.earthing = d.tt ? 'TT' : 'TN-C-S';
    if (d.raOhm !== undefined) s.raOhm = d.raOhm;
    s.pfcKa = d.pfcKa;
    if (d.privateSupply) {
      s.ownership = 'private';
      s.transformer = { kva: 500, impedancePct: 4.5, xOverR: 5 };
    }
  }
  doc.cables.forEach((c, k) => {
    const x = d.cables[k % d.cables.length]!;
    if (x.device) c.device = structuredClone(x.device);
    if (x.installation) c.installation = { ...x.installation };
    c.construction = c.phases === 3 && x.construction === 'flatTwinEarth' ? 'multicore' : x.construction;
    if (x.cpcSteelArmour) c.cpc = { kind: 'armour', sizeMm2: 20 + c.sizeMm2, material: 'steel' };
    // Now and then a size IEC 60228 does not list: the segment has no resistance.
    if (x.oddSize === 0) c.cpc = { ...c.cpc, sizeMm2: 3 };
  });
  doc.nodes.forEach((n, k) => {
    if (n.kind === 'load' && k % d.motorEvery === 0)
      n.motor = { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 4 + (k % 5) };
  });
  return doc;
}

describe('attachProtection equals its eager reference form', () => {
  it('on the demo project', () => {
    const { fast, ref } = both(demo());
    expect(Object.values(ref.cables).filter((c) => c.protection).length).toBeGreaterThan(10);
    expectSame(fast, ref);
  });

  it('on hand-made drop results (the path that reads result objects)', () => {
    const doc = workedDoc();
    const fast = attachProtection(doc, handResults(doc, { C1: 40, C2: 16, C3: 30, C4: 2 }));
    const ref = attachProtectionReference(doc, handResults(doc, { C1: 40, C2: 16, C3: 30, C4: 2 }));
    expectSame(fast, ref);
  });

  it('on random dressed radial networks', () => {
    fc.assert(
      fc.property(radialNetwork({ maxElements: 40 }), dressing, (doc, d) => {
        const { fast, ref } = both(dress(doc, d));
        expectSame(fast, ref);
      }),
      { seed: 20261201, numRuns: 150 },
    );
  });

  it('when only some elements are read, in any order, and read again', () => {
    fc.assert(
      fc.property(radialNetwork({ maxElements: 25 }), dressing, fc.nat(), (doc, d, pick) => {
        const { fast, ref } = both(dress(doc, d));
        const ids = Object.keys(ref.nodes);
        const id = ids[pick % ids.length]!;
        // A node read first through `loads` or `nodes`, its checks before its figures.
        const viaLoads = fast.loads[id];
        expect((viaLoads ?? fast.nodes[id])!.protection?.checks).toEqual(ref.nodes[id]!.protection?.checks);
        expect(fast.nodes[id]).toBe(viaLoads ?? fast.nodes[id]);
        expect(plain(fast.nodes[id]!.protection)).toEqual(ref.nodes[id]!.protection);
        expect(fast.nodes[id]!.protection?.checks).toBe(fast.nodes[id]!.protection?.checks);
        expect(JSON.stringify({ ...fast.cables })).toBe(JSON.stringify({ ...ref.cables }));
      }),
      { seed: 7, numRuns: 60 },
    );
  });
});
