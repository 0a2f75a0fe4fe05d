/** The editable fields of each node kind, grouped as the details panel shows them. */
import type {
  Board,
  Junction,
  Load,
  MotorStart,
  NodeElement,
  Phase,
  PhaseCount,
  Supply,
} from '../../model/types.ts';
import type { FieldGroup } from './fieldSpec.ts';
import {
  CATEGORY_OPTIONS,
  DEMAND_UNIT_OPTIONS,
  EARTHING_OPTIONS,
  LOAD_KIND_OPTIONS,
  OWNERSHIP_OPTIONS,
  PHASE_COUNT_OPTIONS,
  PHASE_OPTIONS,
  ZE_SOURCE_OPTIONS,
} from './options.ts';

type Groups<E> = FieldGroup<E, Partial<E>>[];

const nameField = <E extends NodeElement>() =>
  ({
    kind: 'text',
    key: 'name',
    label: 'Name',
    required: true,
    get: (el: E) => el.name,
    set: (_el: E, name: string) => ({ name }) as Partial<E>,
  }) as const;

// Starting figures offered when the user turns the starting check on; typical of direct-on-line
// starting (common practice), and shown so the user replaces them with the motor's own data.
const MOTOR_START_OFFER: MotorStart = { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 10 };

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
    ],
  },
];

export const JUNCTION_FIELDS: Groups<Junction> = [{ title: 'Junction', fields: [nameField<Junction>()] }];

export const LOAD_FIELDS: Groups<Load> = [
  {
    title: 'Load',
    fields: [
      nameField<Load>(),
      {
        kind: 'choice',
        key: 'loadKind',
        label: 'Kind',
        options: LOAD_KIND_OPTIONS,
        get: (l) => l.loadKind,
        set: (_l, v) => ({ loadKind: v as Load['loadKind'] }),
      },
      {
        kind: 'choice',
        key: 'category',
        label: 'Drop limit',
        options: CATEGORY_OPTIONS,
        get: (l) => l.category,
        set: (_l, v) => ({ category: v as Load['category'] }),
      },
    ],
  },
  {
    title: 'Demand',
    fields: [
      {
        kind: 'number',
        key: 'demand.value',
        label: 'Demand',
        unit: '',
        rule: { min: 0, minExclusive: true, max: 1e7 },
        hint: 'In the unit chosen below.',
        get: (l) => l.demand.value,
        set: (l, value) => ({ demand: { ...l.demand, value } }),
      },
      {
        kind: 'choice',
        key: 'demand.unit',
        label: 'Demand unit',
        options: DEMAND_UNIT_OPTIONS,
        get: (l) => l.demand.unit,
        set: (l, v) => ({ demand: { ...l.demand, unit: v as Load['demand']['unit'] } }),
      },
      {
        kind: 'number',
        key: 'powerFactor',
        label: 'Power factor',
        unit: '',
        rule: { min: 0, minExclusive: true, max: 1 },
        get: (l) => l.powerFactor,
        set: (_l, powerFactor) => ({ powerFactor }),
      },
      {
        kind: 'number',
        key: 'demandFactor',
        label: 'Demand factor',
        unit: '',
        rule: { min: 0, minExclusive: true, max: 1 },
        hint: 'Share of the connected demand taken as design demand.',
        get: (l) => l.demandFactor,
        set: (_l, demandFactor) => ({ demandFactor }),
      },
      {
        kind: 'choice',
        key: 'phases',
        label: 'Phases',
        options: PHASE_COUNT_OPTIONS,
        get: (l) => String(l.phases),
        set: (_l, v) => ({ phases: Number(v) as PhaseCount }),
      },
      {
        kind: 'choice',
        key: 'phase',
        label: 'Connected to',
        options: PHASE_OPTIONS,
        shown: (l) => l.phases === 1,
        get: (l) => l.phase,
        set: (_l, v) => ({ phase: v as Phase }),
      },
    ],
  },
  {
    title: 'Motor starting',
    shown: (l) => l.loadKind === 'motor',
    fields: [
      {
        kind: 'toggle',
        key: 'motor',
        label: 'Check the dip while starting',
        get: (l) => l.motor !== undefined,
        set: (_l, on) => ({ motor: on ? { ...MOTOR_START_OFFER } : undefined }),
      },
      {
        kind: 'number',
        key: 'motor.startMultiple',
        label: 'Starting current (× full load)',
        unit: '',
        rule: { min: 1, max: 20 },
        shown: (l) => l.motor !== undefined,
        get: (l) => l.motor?.startMultiple,
        set: (l, startMultiple) => ({ motor: { ...MOTOR_START_OFFER, ...l.motor, startMultiple } }),
      },
      {
        kind: 'number',
        key: 'motor.startPowerFactor',
        label: 'Power factor while starting',
        unit: '',
        rule: { min: 0, minExclusive: true, max: 1 },
        shown: (l) => l.motor !== undefined,
        get: (l) => l.motor?.startPowerFactor,
        set: (l, startPowerFactor) => ({ motor: { ...MOTOR_START_OFFER, ...l.motor, startPowerFactor } }),
      },
      {
        kind: 'number',
        key: 'motor.dipLimitPct',
        label: 'Largest dip accepted (% of nominal)',
        unit: '%',
        rule: { min: 0, minExclusive: true, max: 50 },
        shown: (l) => l.motor !== undefined,
        get: (l) => l.motor?.dipLimitPct,
        set: (l, dipLimitPct) => ({ motor: { ...MOTOR_START_OFFER, ...l.motor, dipLimitPct } }),
      },
    ],
  },
];

/** The field groups for a node, by its kind. */
export function nodeFieldGroups(el: NodeElement): FieldGroup<NodeElement, Partial<NodeElement>>[] {
  const groups = { supply: SUPPLY_FIELDS, board: BOARD_FIELDS, junction: JUNCTION_FIELDS, load: LOAD_FIELDS }[
    el.kind
  ];
  return groups as unknown as FieldGroup<NodeElement, Partial<NodeElement>>[];
}
