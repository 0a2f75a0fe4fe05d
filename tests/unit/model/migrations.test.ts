import { describe, expect, test } from 'vitest';
import { migrate, MIGRATIONS } from '../../../src/model/migrations.ts';
import type { CableV0 } from '../../../src/model/migrations.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import {
  defaultCableDefaults,
  defaultSettings,
  newBoard,
  newLoad,
  newSupply,
} from '../../../src/model/defaults.ts';

/** A file in the pre-release (version 0) shape. */
function versionZeroText(cables: CableV0[]): string {
  const { cableDefaults: _dropped, ...settings } = defaultSettings();
  return JSON.stringify({
    format: 'dropline-project',
    version: 0,
    details: {
      title: 'Old',
      client: '',
      site: '',
      reference: '',
      revision: 'A',
      author: '',
      date: '',
      notes: '',
    },
    settings,
    nodes: [
      newSupply('S1', { x: 0, y: 0 }),
      newBoard('DB1', { x: 0, y: 100 }),
      newLoad('L1', { x: 0, y: 200 }),
    ],
    cables,
  });
}

const v0Cable = (over: Partial<CableV0>): CableV0 => ({
  id: 'C1',
  name: 'Sub-main',
  from: 'S1',
  to: 'DB1',
  length: 35,
  material: 'Cu',
  insulation: 'thermoplastic70',
  construction: 'flatTwinEarth',
  size: 2.5,
  phases: 1,
  ...over,
});

describe('migration 0 -> 1 (unitNamesAndCpc)', () => {
  test('renames length and size, adds cpc, parallel and cable defaults', () => {
    const r = parseDocument(
      versionZeroText([
        v0Cable({}),
        v0Cable({ id: 'C2', from: 'DB1', to: 'L1', construction: 'armouredMulticore', size: 16, length: 60 }),
      ]),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.version).toBe(2);
    const [c1, c2] = r.doc.cables;
    expect(c1).toMatchObject({ lengthM: 35, sizeMm2: 2.5, parallel: 1 });
    expect('length' in c1! || 'size' in c1!).toBe(false);
    // 2.5 mm² flat twin-and-earth carries a 1.5 mm² cpc (common practice).
    expect(c1!.cpc).toEqual({ kind: 'core', sizeMm2: 1.5, material: 'Cu' });
    expect(c2!.cpc).toEqual({ kind: 'core', sizeMm2: 16, material: 'Cu' });
    expect(r.doc.settings.cableDefaults).toEqual(defaultCableDefaults());
    expect(r.warnings).toEqual([
      'the file was made for version 0; updated to version 2 (unitNamesAndCpc, namedAlternatives)',
      'cable C1: the file gave no cpc; assumed a 1.5 mm² Cu core; check it',
      'cable C2: the file gave no cpc; assumed a 16 mm² Cu core; check it',
    ]);
  });

  test('errors after migrating still name the element', () => {
    const r = parseDocument(versionZeroText([v0Cable({ length: -4 })]));
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.errors).toEqual([
        'cable C1 "Sub-main": lengthM must be a one-way route length in metres, 0 or more; got -4',
      ]);
  });

  test('steps run in order and each names itself', () => {
    const seen: string[] = [];
    const steps = [
      { from: 1, to: 2, name: 'second', description: '', up: () => (seen.push('second'), []) },
      { from: 0, to: 1, name: 'first', description: '', up: () => (seen.push('first'), []) },
    ];
    const r = migrate({ version: 0 }, steps);
    expect(r.ok && r.applied).toEqual(['first', 'second']);
    expect(seen).toEqual(['first', 'second']);
    expect(MIGRATIONS.map((s) => `${s.from}->${s.to} ${s.name}`)).toEqual([
      '0->1 unitNamesAndCpc',
      '1->2 namedAlternatives',
    ]);
  });

  test('a gap in the steps is reported, not skipped', () => {
    expect(migrate({ version: 0 }, [])).toEqual({
      ok: false,
      errors: ['project file: no migration from version 0'],
    });
  });

  test('negative or fractional versions are refused', () => {
    expect(migrate({ version: -1 }).ok).toBe(false);
    expect(migrate({ version: 0.5 }).ok).toBe(false);
  });
});

describe('migration 1 -> 2 (namedAlternatives)', () => {
  test('a version-1 file opens with no alternatives and says it was updated', () => {
    const doc = { ...JSON.parse(versionZeroText([])), version: 1 };
    doc.settings.cableDefaults = defaultCableDefaults();
    const r = parseDocument(JSON.stringify(doc));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.version).toBe(2);
    expect(r.doc.alternatives).toEqual([]);
    expect(r.warnings).toEqual(['the file was made for version 1; updated to version 2 (namedAlternatives)']);
  });

  test('alternatives already in a version-1 file (a hand edit) are kept, not overwritten', () => {
    const raw = { version: 1, alternatives: ['kept'] };
    const r = migrate(raw);
    expect(r.ok).toBe(true);
    expect(raw.alternatives).toEqual(['kept']);
  });
});
