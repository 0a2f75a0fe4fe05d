/** The editable fields of each node kind, grouped as the details panel shows them. */
import type { Board, Junction, NodeElement, PhaseCount, Supply } from '../../model/types.ts';
import type { FieldGroup } from './fieldSpec.ts';
import { LOAD_FIELDS } from './loadFields.ts';
import { nameField } from './nameField.ts';
import { EARTHING_OPTIONS, OWNERSHIP_OPTIONS, PHASE_COUNT_OPTIONS, ZE_SOURCE_OPTIONS } from './options.ts';

type Groups<E> = FieldGroup<E, Partial<E>>[];

export const SUPPLY_FIELDS: Groups<Supply> = [
  {
    title: 'Supply',
    fields: [
      nameField<Supply>(),
      {
        kind: 'choice',
        key: 'phases',
        label: 'Phases',
        options: PHASE_COUNT_OPTIONS,
        get: (s) => String(s.phases),
        set: (_s, v) => ({ phases: Number(v) as PhaseCount }),
      },
      {
        kind: 'number',
        key: 'u0V',
        label: 'Voltage to earth U0',
        unit: 'V',
        rule: { min: 50, max: 1000 },
        get: (s) => s.u0V,
        set: (_s, u0V) => ({ u0V }),
      },
      {
        kind: 'choice',
        key: 'earthing',
        label: 'Earthing',
        options: EARTHING_OPTIONS,
        get: (s) => s.earthing,
        set: (_s, v) => ({ earthing: v as Supply['earthing'] }),
      },
      {
        kind: 'choice',
        key: 'ownership',
        label: 'Ownership',
        options: OWNERSHIP_OPTIONS,
        get: (s) => s.ownership,
        set: (_s, v) => ({ ownership: v as Supply['ownership'] }),
      },
    ],
  },
  {
    title: 'At the origin',
    fields: [
      {
        kind: 'number',
        key: 'zeOhm',
        label: 'Ze',
        unit: 'Ω',
        rule: { min: 0, max: 100 },
        hint: 'External earth fault loop impedance.',
        get: (s) => s.zeOhm,
        set: (_s, zeOhm) => ({ zeOhm }),
      },
      {
        kind: 'choice',
        key: 'zeSource',
        label: 'Ze is',
        options: ZE_SOURCE_OPTIONS,
        get: (s) => s.zeSource,
        set: (_s, v) => ({ zeSource: v as Supply['zeSource'] }),
      },
      {
        kind: 'number',
        key: 'pfcKa',
        label: 'Prospective fault current',
        unit: 'kA',
        rule: { min: 0, minExclusive: true, max: 200 },
        get: (s) => s.pfcKa,
        set: (_s, pfcKa) => ({ pfcKa }),
      },
      {
        kind: 'number',
        key: 'raOhm',
        label: 'Electrode resistance RA',
        unit: 'Ω',
        rule: { min: 0, minExclusive: true, max: 10000 },
        shown: (s) => s.earthing === 'TT',
        get: (s) => s.raOhm,
        set: (_s, raOhm) => ({ raOhm }),
      },
    ],
  },
  {
    title: 'Transformer',
    shown: (s) => s.ownership === 'private',
    fields: [
      {
        kind: 'number',
        key: 'transformer.kva',
        label: 'Rating',
        unit: 'kVA',
        rule: { min: 0, minExclusive: true, max: 100000 },
        get: (s) => s.transformer?.kva,
        set: (s, kva) => ({ transformer: { impedancePct: 5, xOverR: 5, ...s.transformer, kva } }),
      },
      {
        kind: 'number',
        key: 'transformer.impedancePct',
        label: 'Impedance uk (% of rated voltage)',
        unit: '%',
        rule: { min: 0, minExclusive: true, max: 30 },
        get: (s) => s.transformer?.impedancePct,
        set: (s, impedancePct) => ({ transformer: { kva: 500, xOverR: 5, ...s.transformer, impedancePct } }),
      },
      {
        kind: 'number',
        key: 'transformer.xOverR',
        label: 'X/R ratio',
        unit: '',
        rule: { min: 0, minExclusive: true, max: 100 },
        get: (s) => s.transformer?.xOverR,
        set: (s, xOverR) => ({ transformer: { kva: 500, impedancePct: 5, ...s.transformer, xOverR } }),
      },
    ],
  },
];

export const BOARD_FIELDS: Groups<Board> = [
  {
    title: 'Board',
    fields: [
      nameField<Board>(),
      {
        kind: 'number',
        key: 'diversity',
        label: 'Diversity factor',
        unit: '',
        rule: { min: 0, minExclusive: true, max: 1 },
        hint: 'Share of the outgoing demand taken as the board’s demand; 1 means none.',
        get: (b) => b.diversity,
        set: (_b, diversity) => ({ diversity }),
      },
      {
        kind: 'number',
        key: 'spareCapacityPct',
        label: 'Spare capacity allowance',
        unit: '%',
        rule: { min: 0, max: 200 },
        hint: 'For loads still to come: the cables feeding this board are designed for its demand plus this share (0 for none).',
        get: (b) => b.spareCapacityPct ?? 0,
        set: (_b, pct) => ({ spareCapacityPct: pct > 0 ? pct : undefined }),
      },
    ],
  },
];

export const JUNCTION_FIELDS: Groups<Junction> = [{ title: 'Junction', fields: [nameField<Junction>()] }];

/** The field groups for a node, by its kind. */
export function nodeFieldGroups(el: NodeElement): FieldGroup<NodeElement, Partial<NodeElement>>[] {
  const groups = { supply: SUPPLY_FIELDS, board: BOARD_FIELDS, junction: JUNCTION_FIELDS, load: LOAD_FIELDS }[
    el.kind
  ];
  return groups as unknown as FieldGroup<NodeElement, Partial<NodeElement>>[];
}
