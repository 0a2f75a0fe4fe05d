// A user's JSON data set may carry its own capacity tables and gG fuse data; they replace the
// built-in ones for the solve and the working names them.
import { expect, test } from 'vitest';
import { parseCatalogueJson } from '../../../src/catalogue/loadCatalogue.ts';
import { solve } from '../../../src/solver/solve.ts';
import { network } from '../../fixtures/build.ts';

const SIZES = [1.5, 2.5, 4];
function dataSet(extra: Record<string, unknown>) {
  return JSON.stringify({
    id: 'licensed-test',
    title: 'Licensed test set',
    source: 'test',
    conductors: [
      // BS 7671 two-core 70 °C: 29 / 18 / 11 mV/A/m (check-values §2.1, C [S17]).
      {
        material: 'Cu',
        insulation: 'thermoplastic70',
        construction: 'multicore',
        sizeMm2: 1.5,
        mvPerAm1phR: 29,
      },
      {
        material: 'Cu',
        insulation: 'thermoplastic70',
        construction: 'multicore',
        sizeMm2: 2.5,
        mvPerAm1phR: 18,
      },
      {
        material: 'Cu',
        insulation: 'thermoplastic70',
        construction: 'multicore',
        sizeMm2: 4,
        mvPerAm1phR: 11,
      },
    ],
    ...extra,
  });
}

// IEC 60364-5-52 Table B.52.2 method C, PVC, two loaded conductors, copper: 19.5 / 27 / 36 A
// (from memory: check-values §7.1, status M).
const table = {
  id: 'user-b52-2',
  title: 'User capacity table (IEC 60364-5-52 B.52.2 column C)',
  source: 'IEC 60364-5-52 Table B.52.2 (from memory)',
  material: 'Cu',
  insulation: 'thermoplastic70',
  constructions: ['multicore'],
  referenceC: 30,
  sizesMm2: SIZES,
  methods: { clippedDirect: { label: 'B.52.2 C', amps: { 2: [19.5, 27, 36] } } },
};

function doc() {
  return network()
    .supply('S', { phases: 1 })
    .load('L1', { amps: 16 })
    .cable('C1', 'S', 'L1', {
      lengthM: 15,
      sizeMm2: 2.5,
      phases: 1,
      device: { type: 'mcb', curve: 'B', ratingA: 20, breakingKa: 10 },
      installation: {
        method: 'clippedDirect',
        ambientC: 30,
        groupedCircuits: 1,
        groupArrangement: 'bunched',
        insulationFactor: 1,
      },
    })
    .doc();
}

test('capacity tables from the data set replace the built-in ones and are named in the working', () => {
  const loaded = parseCatalogueJson(dataSet({ capacityTables: [table] }));
  expect(loaded.ok).toBe(true);
  if (!loaded.ok) return;
  const d = doc();
  d.settings.dataSet = 'licensed-test';
  const p = solve(d, loaded.catalogue).cables['C1']!.protection!;
  expect(p.izA).toBe(27);
  const iz = p.working.find((w) => w.key === 'iz')!;
  expect(iz.inputs[0]!.source).toContain('User capacity table');
});

test('a table whose column does not match its sizes is refused with the path and the fix', () => {
  const bad = { ...table, methods: { clippedDirect: { label: 'C', amps: { 2: [19.5, 27] } } } };
  const loaded = parseCatalogueJson(dataSet({ capacityTables: [bad] }));
  expect(loaded.ok).toBe(false);
  if (loaded.ok) return;
  expect(loaded.errors.join('\n')).toMatch(
    /capacityTables\.0 \(user-b52-2\)\.methods\.clippedDirect\.amps\.2: give one value/,
  );
});

test('gG fuse data are checked: a fuse needs more current to melt in 0.4 s than in 5 s', () => {
  const fuses = { id: 'f', title: 'Fuses', source: 'S', rows: [{ ratingA: 32, ia04sA: 100, ia5sA: 200 }] };
  const loaded = parseCatalogueJson(dataSet({ ggFuses: fuses }));
  expect(loaded.ok).toBe(false);
  if (loaded.ok) return;
  expect(loaded.errors.join('\n')).toMatch(/ggFuses\.rows\.0 \(32 A\): ia04sA must be larger than ia5sA/);
  const wrongType = parseCatalogueJson(dataSet({ ggFuses: { ...fuses, rows: 'none' } }));
  expect(wrongType.ok).toBe(false);
});
