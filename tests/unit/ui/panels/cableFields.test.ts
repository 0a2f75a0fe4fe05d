// The reference-method list keeps every method selectable but marks those no built-in capacity
// table covers for the cable, so the form never promises a capacity check it cannot make.
import { describe, expect, test } from 'vitest';
import { newCable } from '../../../../src/model/defaults.ts';
import { methodOptions } from '../../../../src/ui/panels/cableFields.ts';
import { METHOD_OPTIONS } from '../../../../src/ui/panels/options.ts';

const unmarked = (labels: readonly { value: string; label: string }[]) =>
  labels.filter((o) => !o.label.includes('no capacity table')).map((o) => o.value);

describe('methodOptions', () => {
  test('flat twin-and-earth 2.5 mm²: the four 4D5 methods are offered plainly, the rest marked', () => {
    const options = methodOptions(
      newCable('C', 'A', 'B', undefined, { construction: 'flatTwinEarth', sizeMm2: 2.5 }),
    );
    expect(options.map((o) => o.value)).toEqual(METHOD_OPTIONS.map((o) => o.value));
    expect(unmarked(options).sort()).toEqual(
      ['aboveInsulation', 'clippedDirect', 'conduitInInsulatedWall', 'inInsulation'].sort(),
    );
    expect(options.find((o) => o.value === 'buriedDirect')?.label).toMatch(
      /– no capacity table for this cable, Iz not assessed$/,
    );
  });

  test('armoured XLPE three-phase: clipped, buried and tray are covered', () => {
    const options = methodOptions(
      newCable('C', 'A', 'B', undefined, {
        insulation: 'thermosetting90',
        construction: 'armouredMulticore',
        sizeMm2: 25,
        phases: 3,
      }),
    );
    expect(unmarked(options).sort()).toEqual([
      'buriedDirect',
      'buriedDuct',
      'clippedDirect',
      'trayOrFreeAir',
    ]);
  });

  test('aluminium has no built-in table: every method is marked, and still selectable', () => {
    const options = methodOptions(
      newCable('C', 'A', 'B', undefined, { material: 'Al', construction: 'multicore', sizeMm2: 25 }),
    );
    expect(options).toHaveLength(METHOD_OPTIONS.length);
    expect(unmarked(options)).toEqual([]);
  });

  test('a size outside the table says which size is missing', () => {
    const options = methodOptions(
      newCable('C', 'A', 'B', undefined, {
        insulation: 'thermosetting90',
        construction: 'singleCore',
        sizeMm2: 16,
      }),
    );
    // 4E1A prints method F from 25 mm² only.
    expect(options.find((o) => o.value === 'trayOrFreeAir')?.label).toMatch(
      /no capacity table at 16 mm², Iz not assessed/,
    );
    expect(unmarked(options)).toContain('clippedDirect');
  });
});

describe('grouping arrangement field', () => {
  test('offered for cables in air, not underground, where the buried tables apply', async () => {
    const { CABLE_FIELDS } = await import('../../../../src/ui/panels/cableFields.ts');
    const field = CABLE_FIELDS.flatMap((g) => g.fields).find(
      (f) => f.key === 'installation.groupArrangement',
    )!;
    const at = (method: 'clippedDirect' | 'buriedDirect' | 'buriedDuct') =>
      newCable('C', 'A', 'B', undefined, {
        installation: {
          method,
          ambientC: 20,
          groupedCircuits: 3,
          groupArrangement: 'bunched',
          insulationFactor: 1,
        },
      });
    expect(field.shown?.(at('clippedDirect'))).toBe(true);
    expect(field.shown?.(at('buriedDirect'))).toBe(false);
    expect(field.shown?.(at('buriedDuct'))).toBe(false);
  });
});
