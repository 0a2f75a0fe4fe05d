// Save then load gives the same document, for arbitrary valid documents (fast-check, seeded).
import { expect, test } from 'vitest';
import fc from 'fast-check';
import type { Cable, NodeElement, ProjectDocument } from '../../src/model/types.ts';
import { parseDocument } from '../../src/model/parseDocument.ts';
import { serializeDocument } from '../../src/model/serializeDocument.ts';
import { defaultSettings } from '../../src/model/defaults.ts';

const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((v) => (v === 0 ? 0 : v));
const pos = (max: number) => num(Number.MIN_VALUE, max);
const frac = () => fc.double({ min: 0.01, max: 1, noNaN: true });
const text = (max = 30) => fc.string({ maxLength: max, unit: 'grapheme' });
const position = fc.record({ x: num(-1e6, 1e6), y: num(-1e6, 1e6) });
const phaseCount = fc.constantFrom(1 as const, 3 as const);

const supply = fc.record(
  {
    kind: fc.constant('supply' as const),
    name: text(),
    position,
    phases: phaseCount,
    u0V: num(1, 1000),
    earthing: fc.constantFrom('TN-S' as const, 'TN-C-S' as const, 'TT' as const),
    zeOhm: num(0, 5),
    zeSource: fc.constantFrom('declared' as const, 'measured' as const),
    pfcKa: pos(100),
    ownership: fc.constantFrom('public' as const, 'private' as const),
    transformer: fc.record({ kva: pos(5000), impedancePct: pos(100), xOverR: num(0, 20) }),
    raOhm: num(0, 500),
  },
  {
    requiredKeys: [
      'kind',
      'name',
      'position',
      'phases',
      'u0V',
      'earthing',
      'zeOhm',
      'zeSource',
      'pfcKa',
      'ownership',
    ],
  },
);
const board = fc.record({ kind: fc.constant('board' as const), name: text(), position, diversity: frac() });
const junction = fc.record({ kind: fc.constant('junction' as const), name: text(), position });
const load = fc.record(
  {
    kind: fc.constant('load' as const),
    name: text(),
    position,
    loadKind: fc.constantFrom('lighting', 'sockets', 'heating', 'motor', 'evCharging', 'other' as const),
    category: fc.constantFrom('lighting' as const, 'other' as const),
    demand: fc.record({
      value: num(0, 1e6),
      unit: fc.constantFrom('W' as const, 'kW' as const, 'kVA' as const, 'A' as const),
    }),
    powerFactor: frac(),
    phases: phaseCount,
    phase: fc.constantFrom('L1' as const, 'L2' as const, 'L3' as const),
    demandFactor: frac(),
    motor: fc.record({ startMultiple: num(1, 20), startPowerFactor: frac(), dipLimitPct: pos(100) }),
  },
  {
    requiredKeys: [
      'kind',
      'name',
      'position',
      'loadKind',
      'category',
      'demand',
      'powerFactor',
      'phases',
      'phase',
      'demandFactor',
    ],
  },
);
const cableBody = fc.record(
  {
    name: text(),
    lengthM: num(0, 5000),
    material: fc.constantFrom('Cu' as const, 'Al' as const),
    insulation: fc.constantFrom('thermoplastic70' as const, 'thermosetting90' as const),
    construction: fc.constantFrom(
      'flatTwinEarth' as const,
      'multicore' as const,
      'armouredMulticore' as const,
      'singleCore' as const,
    ),
    sizeMm2: fc.constantFrom(1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300),
    cpc: fc.record({
      kind: fc.constantFrom('core' as const, 'separate' as const, 'armour' as const),
      sizeMm2: pos(300),
      material: fc.constantFrom('Cu' as const, 'Al' as const, 'steel' as const),
    }),
    phases: phaseCount,
    parallel: fc.integer({ min: 1, max: 50 }),
    device: fc.record(
      {
        type: fc.constantFrom('mcb' as const, 'rcbo' as const, 'fuseGG' as const, 'mccb' as const),
        curve: fc.constantFrom('B' as const, 'C' as const, 'D' as const),
        ratingA: pos(4000),
        breakingKa: pos(100),
        irMultiple: pos(1),
        imMultiple: pos(20),
        rcd: fc.record({
          type: fc.constantFrom('AC' as const, 'A' as const, 'F' as const, 'B' as const),
          idnMa: pos(1000),
        }),
      },
      { requiredKeys: ['type', 'ratingA', 'breakingKa'] },
    ),
    installation: fc.record({
      method: fc.constantFrom('clippedDirect' as const, 'buriedDuct' as const, 'inInsulation' as const),
      ambientC: num(-50, 100),
      groupedCircuits: fc.integer({ min: 1, max: 1000 }),
      groupArrangement: fc.constantFrom('bunched' as const, 'singleLayer' as const, 'tray' as const),
      insulationFactor: frac(),
    }),
  },
  {
    requiredKeys: [
      'name',
      'lengthM',
      'material',
      'insulation',
      'construction',
      'sizeMm2',
      'cpc',
      'phases',
      'parallel',
    ],
  },
);

const designArb = fc
  .record({
    details: fc.record({
      title: text(),
      client: text(),
      site: text(),
      reference: text(),
      revision: text(5),
      author: text(),
      date: fc.constantFrom('', '2025-01-31'),
      notes: text(200),
    }),
    nodes: fc.array(fc.oneof(supply, board, junction, load), { minLength: 1, maxLength: 25 }),
    cableBodies: fc.array(fc.tuple(cableBody, fc.nat(), fc.nat()), { maxLength: 30 }),
    limitProfile: fc.constantFrom(
      'iecPublic' as const,
      'iecPrivate' as const,
      'nec' as const,
      'asnzs' as const,
      'custom' as const,
    ),
    closeThreshold: fc.double({ min: 0.01, max: 0.99, noNaN: true }),
  })
  .map(({ details, nodes, cableBodies, limitProfile, closeThreshold }) => {
    const withIds = nodes.map((n, i) => ({ ...n, id: `N${i + 1}` }) as NodeElement);
    const cables: Cable[] = [];
    cableBodies.forEach(([body, a, b], i) => {
      const from = withIds[a % withIds.length]!.id;
      const to = withIds[b % withIds.length]!.id;
      if (from !== to) cables.push({ ...body, id: `C${i + 1}`, from, to });
    });
    return {
      format: 'dropline-project' as const,
      version: 2 as const,
      details,
      settings: { ...defaultSettings(), limitProfile, closeThreshold },
      nodes: withIds,
      cables,
    };
  });

/** A design with up to two named alternatives (each a design of its own) kept beside it. */
const documentArb: fc.Arbitrary<ProjectDocument> = fc
  .tuple(designArb, fc.array(fc.tuple(designArb, text(200)), { maxLength: 2 }))
  .map(([doc, others]) => ({
    ...doc,
    alternatives: others.map(([other, note], k) => ({
      name: `Option ${k + 1}`,
      note,
      keptAt: '2025-01-31T10:15:00.000Z',
      settings: other.settings,
      nodes: other.nodes,
      cables: other.cables,
    })),
  }));

test('save then load gives the same document', () => {
  fc.assert(
    fc.property(documentArb, (doc) => {
      const r = parseDocument(serializeDocument(doc));
      if (!r.ok) throw new Error(r.errors.join('\n'));
      expect(r.doc).toEqual(doc);
      // Saving again gives the same text: the key order is stable.
      expect(serializeDocument(r.doc)).toBe(serializeDocument(doc));
    }),
    { seed: 20250301, numRuns: 300 },
  );
});

test('serializing never depends on the order keys were set in', () => {
  fc.assert(
    fc.property(documentArb, (doc) => {
      const reversed = JSON.parse(JSON.stringify(doc), (_k, v) =>
        v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).reverse()) : v,
      );
      expect(serializeDocument(reversed)).toBe(serializeDocument(doc));
    }),
    { seed: 7, numRuns: 100 },
  );
});

test('mangled documents are answered with messages, never an internal error', () => {
  const paths = fc.array(fc.oneof(fc.string({ maxLength: 12 }), fc.nat(30)), { minLength: 1, maxLength: 4 });
  fc.assert(
    fc.property(documentArb, paths, fc.jsonValue(), (doc, path, junk) => {
      const raw = JSON.parse(serializeDocument(doc)) as Record<string, unknown>;
      let holder: unknown = raw;
      for (const key of path.slice(0, -1)) {
        const next = (holder as Record<string, unknown>)?.[key as string];
        if (next && typeof next === 'object') holder = next;
      }
      if (holder && typeof holder === 'object')
        (holder as Record<string, unknown>)[path[path.length - 1] as string] = junk;
      const r = parseDocument(JSON.stringify(raw));
      if (!r.ok) {
        expect(r.errors.length).toBeGreaterThan(0);
        for (const e of r.errors) expect(e).not.toMatch(/internal error/);
      }
    }),
    { seed: 99, numRuns: 400 },
  );
});
