/** The editable fields of a load. */
import type { Load, MotorStart, Phase, PhaseCount } from '../../model/types.ts';
import type { FieldGroup } from './fieldSpec.ts';
import { nameField } from './nameField.ts';
import {
  CATEGORY_OPTIONS,
  DEMAND_UNIT_OPTIONS,
  LOAD_KIND_OPTIONS,
  PHASE_COUNT_OPTIONS,
  PHASE_OPTIONS,
} from './options.ts';

// Starting figures offered when the user turns the starting check on; typical of direct-on-line
// starting (common practice), and shown so the user replaces them with the motor's own data.
const MOTOR_START_OFFER: MotorStart = { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 10 };

export const LOAD_FIELDS: FieldGroup<Load, Partial<Load>>[] = [
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
      {
        kind: 'toggle',
        key: 'distributed',
        label: 'Spread along its cable',
        hint: 'A row of luminaires or a run of socket outlets along the cable feeding it: the drop at the far end is that of the whole current over half the cable’s length. Loop impedance is still taken at the far end.',
        get: (l) => l.distributed === true,
        set: (_l, on) => ({ distributed: on ? true : undefined }),
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
