import { describe, expect, it } from 'vitest';
import { parseCatalogueCsv, parseCatalogueJson } from '../../../src/catalogue/loadCatalogue.ts';
import { limitProfile, longRunAllowancePct } from '../../../src/catalogue/limits.ts';
import { solveDrop } from '../../../src/solver/solveDrop.ts';
import { network } from '../../fixtures/build.ts';

const HEAD = '# id: site-sheet\n# title: Example sheet\n# source: data sheet rev 3\n';

describe('user conductor data', () => {
  it('CSV in three forms: ohm/km, single-phase and three-phase mV/A/m', () => {
    const r = parseCatalogueCsv(
      `${HEAD}material,insulation,construction,sizeMm2,rOhmPerKm,xOhmPerKm,mvPerAm1phR,mvPerAm1phX,mvPerAm3phR,mvPerAm3phX\n` +
        'Cu,thermoplastic70,multicore,2.5,8.9,0.1,,,,\n' +
        'Cu,thermoplastic70,multicore,4,,,11,0.2,,\n' +
        'Cu,thermoplastic70,multicore,6,,,,,6.4,\n',
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const [a, b, c] = r.catalogue.conductors;
    expect(a?.rOhmPerM).toBeCloseTo(0.0089, 12);
    expect(b?.rOhmPerM).toBeCloseTo(0.0055, 12);
    expect(b?.xOhmPerM).toBeCloseTo(0.0001, 12);
    expect(c?.rOhmPerM).toBeCloseTo(0.0064 / Math.sqrt(3), 12);
    expect(c?.xOhmPerM).toBe(0);
    expect(c?.tempC).toBe(70);
  });

  it('names the line and column of each bad cell and keeps going', () => {
    const r = parseCatalogueCsv(
      `${HEAD}material,insulation,construction,sizeMm2,rOhmPerKm,xOhmPerKm\nCu,thermoplastic70,multicore,abc,8.9,0.1\nBrass,thermoplastic70,multicore,4,-1,\n`,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual([
      'line 5, column sizeMm2: must be a positive number of mm², got "abc".',
      'line 6, column material: must be one of Cu, Al, got "Brass".',
      'line 6, column rOhmPerKm: must be a positive number, got "-1".',
    ]);
  });

  it('JSON: missing title/source, repeated rows, not JSON at all', () => {
    expect(parseCatalogueJson('{').ok).toBe(false);
    const r = parseCatalogueJson(
      JSON.stringify({
        id: 'x',
        conductors: [
          {
            material: 'Cu',
            insulation: 'thermoplastic70',
            construction: 'multicore',
            sizeMm2: 4,
            rOhmPerKm: 5.5,
          },
          {
            material: 'Cu',
            insulation: 'thermoplastic70',
            construction: 'multicore',
            sizeMm2: 4,
            rOhmPerKm: 5.5,
          },
        ],
      }),
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.join('\n')).toMatch(/title/);
    expect(r.errors.join('\n')).toMatch(/source/);
    expect(r.errors.join('\n')).toMatch(/conductors row 2: repeats conductors row 1/);
  });

  it('the working names the loaded data set', () => {
    const r = parseCatalogueCsv(
      `${HEAD}material,insulation,construction,sizeMm2,rOhmPerKm\nCu,thermoplastic70,multicore,2.5,9\n`,
    );
    if (!r.ok) throw new Error(r.errors.join());
    const doc = network({ dataSet: 'site-sheet' }).supply('S').load('L').cable('C', 'S', 'L').doc();
    const res = solveDrop(doc, r.catalogue);
    expect(res.dataSet.title).toBe('Example sheet');
    expect(res.findings).toEqual([]);
    const src = res.cables.C?.working.find((w) => w.key === 'impedance')?.inputs[0]?.source;
    expect(src).toContain('data set "Example sheet" (site-sheet)');
  });
});

describe('limit profiles (check-values §3)', () => {
  it('IEC 60364-5-52 Table G.52.1 type A and B, NEC informational notes, AS/NZS 3000 3.6.2', () => {
    expect(limitProfile('iecPublic').totalPct).toEqual({ lighting: 3, other: 5 });
    expect(limitProfile('iecPrivate').totalPct).toEqual({ lighting: 6, other: 8 });
    expect(limitProfile('nec').totalPct).toEqual({ lighting: 5, other: 5 });
    expect(limitProfile('nec').branchPct).toBe(3);
    expect(limitProfile('asnzs').totalPct).toEqual({ lighting: 5, other: 5 });
    expect(limitProfile('custom', { lightingPct: 2, otherPct: 4 }).totalPct).toEqual({
      lighting: 2,
      other: 4,
    });
  });

  it('long-run allowance: 0.005 %/m beyond 100 m, capped at 0.5 % (G.52.1 note)', () => {
    expect(longRunAllowancePct(100)).toBe(0);
    expect(longRunAllowancePct(150)).toBeCloseTo(0.25, 12);
    expect(longRunAllowancePct(200)).toBeCloseTo(0.5, 12);
    expect(longRunAllowancePct(1000)).toBe(0.5);
  });
});
