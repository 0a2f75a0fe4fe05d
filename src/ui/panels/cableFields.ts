/** The editable fields of a cable segment, its protective device and its installation. */
import { standardSizes } from '../../catalogue/iec60228.ts';
import { MAX_PARALLEL } from '../../model/bounds.ts';
import { sizesWithCapacity } from '../../catalogue/capacityTables.ts';
import type { Cable, InstallMethod, Installation, PhaseCount } from '../../model/types.ts';
import type { FieldGroup, NumberField, NumberRule } from './fieldSpec.ts';
import { DEVICE_GROUP } from './deviceFields.ts';
import {
  ARRANGEMENT_OPTIONS,
  CONSTRUCTION_OPTIONS,
  CPC_KIND_OPTIONS,
  CPC_MATERIAL_OPTIONS,
  INSULATION_OPTIONS,
  MATERIAL_OPTIONS,
  METHOD_OPTIONS,
  PHASE_COUNT_OPTIONS,
} from './options.ts';

type P = Partial<Cable>;

const sizeOptions = (c: Cable) => {
  const sizes = standardSizes(c.material);
  // Keep a non-standard size already in the document selectable, so opening a file never alters it.
  if (!sizes.includes(c.sizeMm2)) sizes.push(c.sizeMm2);
  return sizes.sort((a, b) => a - b).map((s) => ({ value: String(s), label: `${s} mm²` }));
};

/**
 * Every method stays selectable (a file's own method is never altered), but one for which no
 * built-in capacity table has a cell for this cable says so, so the list promises no check it
 * cannot make.
 */
export const methodOptions = (c: Cable) =>
  METHOD_OPTIONS.map((o) => {
    const sizes = sizesWithCapacity({
      material: c.material,
      insulation: c.insulation,
      construction: c.construction,
      method: o.value as InstallMethod,
      loaded: c.phases === 3 ? 3 : 2,
    });
    if (sizes.includes(c.sizeMm2)) return o;
    const where = sizes.length ? `at ${c.sizeMm2} mm²` : 'for this cable';
    return { value: o.value, label: `${o.label} – no capacity table ${where}, Iz not assessed` };
  });

// Offered when the user adds a device or an installation record; visible in the form at once so
// the user replaces them with the real ones.
const INSTALLATION_OFFER: Installation = {
  method: 'clippedDirect',
  ambientC: 30,
  groupedCircuits: 1,
  groupArrangement: 'bunched',
  insulationFactor: 1,
};

function installNumber(
  key: keyof Installation & string,
  label: string,
  unit: string,
  rule: NumberRule,
  hint?: string,
): NumberField<Cable, P> {
  return {
    kind: 'number',
    key: `installation.${key}`,
    label,
    unit,
    rule,
    hint,
    shown: (c) => c.installation !== undefined,
    get: (c) => c.installation?.[key] as number | undefined,
    set: (c, v) => ({ installation: { ...INSTALLATION_OFFER, ...c.installation, [key]: v } }),
  };
}

export const CABLE_FIELDS: FieldGroup<Cable, P>[] = [
  {
    title: 'Cable',
    fields: [
      {
        kind: 'text',
        key: 'name',
        label: 'Name',
        required: true,
        get: (c) => c.name,
        set: (_c, name) => ({ name }),
      },
      {
        kind: 'number',
        key: 'lengthM',
        label: 'Route length (one way)',
        unit: 'm',
        rule: { min: 0, minExclusive: true, max: 10000 },
        unsetPrompt:
          'Not set yet: enter the route length, measured or taken off the drawings; nothing on this path can be solved without it.',
        get: (c) => c.lengthM,
        set: (_c, lengthM) => ({ lengthM }),
      },
      {
        kind: 'number',
        key: 'route.allowanceM',
        label: 'Added to the plan length',
        unit: 'm',
        rule: { min: 0, max: 1000 },
        hint: 'The length is measured on the site plan (along x, then y, between its ends and through any bends of its route) plus this allowance for rises, drops and terminations.',
        shown: (c) => c.route !== undefined,
        get: (c) => c.route?.allowanceM,
        set: (c, allowanceM) => ({ route: { ...c.route, allowanceM } }),
      },
      {
        kind: 'choice',
        key: 'phases',
        label: 'Phases',
        options: PHASE_COUNT_OPTIONS,
        get: (c) => String(c.phases),
        set: (_c, v) => ({ phases: Number(v) as PhaseCount }),
      },
      {
        kind: 'number',
        key: 'parallel',
        label: 'Cables in parallel',
        unit: '',
        rule: { min: 1, max: MAX_PARALLEL, integer: true },
        get: (c) => c.parallel,
        set: (_c, parallel) => ({ parallel }),
      },
    ],
  },
  {
    title: 'Construction',
    fields: [
      {
        kind: 'choice',
        key: 'material',
        label: 'Conductor',
        options: MATERIAL_OPTIONS,
        get: (c) => c.material,
        set: (_c, v) => ({ material: v as Cable['material'] }),
      },
      {
        kind: 'choice',
        key: 'sizeMm2',
        label: 'Line conductor size',
        options: sizeOptions,
        get: (c) => String(c.sizeMm2),
        set: (_c, v) => ({ sizeMm2: Number(v) }),
      },
      {
        kind: 'choice',
        key: 'insulation',
        label: 'Insulation',
        options: INSULATION_OPTIONS,
        get: (c) => c.insulation,
        set: (_c, v) => ({ insulation: v as Cable['insulation'] }),
      },
      {
        kind: 'choice',
        key: 'construction',
        label: 'Construction',
        options: CONSTRUCTION_OPTIONS,
        get: (c) => c.construction,
        set: (_c, v) => ({ construction: v as Cable['construction'] }),
      },
    ],
  },
  {
    title: 'Protective conductor (cpc)',
    fields: [
      {
        kind: 'choice',
        key: 'cpc.kind',
        label: 'Provided by',
        options: CPC_KIND_OPTIONS,
        get: (c) => c.cpc.kind,
        set: (c, v) => ({ cpc: { ...c.cpc, kind: v as Cable['cpc']['kind'] } }),
      },
      {
        kind: 'number',
        key: 'cpc.sizeMm2',
        label: 'cpc cross-section',
        unit: 'mm²',
        rule: { min: 0, minExclusive: true, max: 1000 },
        get: (c) => c.cpc.sizeMm2,
        set: (c, sizeMm2) => ({ cpc: { ...c.cpc, sizeMm2 } }),
      },
      {
        kind: 'choice',
        key: 'cpc.material',
        label: 'cpc material',
        options: CPC_MATERIAL_OPTIONS,
        get: (c) => c.cpc.material,
        set: (c, v) => ({ cpc: { ...c.cpc, material: v as Cable['cpc']['material'] } }),
      },
    ],
  },
  DEVICE_GROUP,
  {
    title: 'Installation',
    fields: [
      {
        kind: 'toggle',
        key: 'installation',
        label: 'Installation conditions given',
        get: (c) => c.installation !== undefined,
        set: (_c, on) => ({ installation: on ? { ...INSTALLATION_OFFER } : undefined }),
      },
      {
        kind: 'choice',
        key: 'installation.method',
        label: 'Reference method',
        options: methodOptions,
        shown: (c) => c.installation !== undefined,
        get: (c) => c.installation?.method ?? 'clippedDirect',
        set: (c, v) => ({
          installation: { ...INSTALLATION_OFFER, ...c.installation, method: v as Installation['method'] },
        }),
      },
      installNumber(
        'ambientC',
        'Ambient temperature',
        '°C',
        { min: -30, max: 80 },
        'Of the air around the cable; for a buried cable, of the ground (its tables are at 20 °C, not 30 °C).',
      ),
      {
        kind: 'text',
        key: 'installation.run',
        label: 'Shared run',
        hint: 'The tray, trunking, duct or trench it shares, by name (e.g. Tray T1). Cables given the same run are grouped: the circuits grouped are counted from the run (shown with the run in the cable schedule). Leave empty to type the count.',
        shown: (c) => c.installation !== undefined,
        check: (v) => (v.trim().length > 60 ? 'A run name is at most 60 characters; shorten it.' : null),
        get: (c) => c.installation?.run ?? '',
        set: (c, v) => {
          const { run: _old, ...rest } = { ...INSTALLATION_OFFER, ...c.installation };
          const run = v.trim();
          return { installation: run ? { ...rest, run } : rest };
        },
      },
      {
        ...installNumber('groupedCircuits', 'Circuits grouped (this one included)', '', {
          min: 1,
          max: 100,
          integer: true,
        }),
        // In a shared run the count comes from the run.
        shown: (c) => c.installation !== undefined && c.installation.run === undefined,
      },
      {
        kind: 'choice',
        key: 'installation.groupArrangement',
        label: 'Grouping arrangement',
        options: ARRANGEMENT_OPTIONS,
        // Underground the buried grouping tables apply whatever the arrangement (docs/protection.md).
        shown: (c) =>
          c.installation !== undefined &&
          c.installation.method !== 'buriedDirect' &&
          c.installation.method !== 'buriedDuct',
        get: (c) => c.installation?.groupArrangement ?? 'bunched',
        set: (c, v) => ({
          installation: {
            ...INSTALLATION_OFFER,
            ...c.installation,
            groupArrangement: v as Installation['groupArrangement'],
          },
        }),
      },
      installNumber(
        'insulationFactor',
        'Thermal insulation factor Ci',
        '',
        { min: 0, minExclusive: true, max: 1 },
        '1 where the cable does not pass through insulation.',
      ),
    ],
  },
];
