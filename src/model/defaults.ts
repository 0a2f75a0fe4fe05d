/**
 * Factories for new documents and elements, with the usual trade defaults. The editor uses them
 * when the user places a part; the tests and the migration use them to fill gaps.
 *
 * Defaults are starting points the user is expected to change, never measured data. A new cable
 * gets no route length (0 m): the solver reports it until the user enters one, so no drop is
 * ever computed on an invented length.
 */
import type {
  Board,
  Cable,
  Cpc,
  Id,
  Junction,
  Load,
  LoadCategory,
  LoadKind,
  Position,
  ProjectDetails,
  ProjectDocument,
  Settings,
  Supply,
} from './types.ts';
import { FORMAT_ID, FORMAT_VERSION } from './types.ts';

/**
 * The id of the built-in conductor data set (derived from IEC 60228, see src/catalogue). Spelled
 * here because the model sits below the catalogue; a test keeps the two equal.
 */
export const BUILT_IN_DATA_SET = 'builtin-iec60228';

export type CableDefaults = Settings['cableDefaults'];

/**
 * cpc that comes with flat twin-and-earth of each line size (common practice for the usual
 * 70 °C flat twin-and-earth range: 1.0/1.0, 1.5/1.0, 2.5/1.5, 4/1.5, 6/2.5, 10/4, 16/6).
 */
export const FLAT_TWIN_EARTH_CPC_MM2: Readonly<Record<number, number>> = {
  1: 1,
  1.5: 1,
  2.5: 1.5,
  4: 1.5,
  6: 2.5,
  10: 4,
  16: 6,
};

/**
 * A cpc guess for a cable that does not state one: the flat twin-and-earth pairing where it
 * applies, otherwise a full-size copper core. The caller must tell the user it was assumed.
 */
export function assumedCpc(
  construction: Cable['construction'],
  sizeMm2: number,
  material: Cable['material'],
): Cpc {
  const te = FLAT_TWIN_EARTH_CPC_MM2[sizeMm2];
  if (construction === 'flatTwinEarth' && te !== undefined)
    return { kind: 'core', sizeMm2: te, material: 'Cu' };
  return { kind: 'core', sizeMm2, material };
}

/** 2.5 mm² copper flat twin-and-earth with its 1.5 mm² cpc, the commonest final circuit cable. */
export function defaultCableDefaults(): CableDefaults {
  return {
    lengthM: 0,
    material: 'Cu',
    insulation: 'thermoplastic70',
    construction: 'flatTwinEarth',
    sizeMm2: 2.5,
    cpc: { kind: 'core', sizeMm2: 1.5, material: 'Cu' },
    phases: 1,
    parallel: 1,
  };
}

/** IEC 60364-5-52 Annex G public-supply limits, 230/400 V 50 Hz, close at 80 % of the budget. */
export function defaultSettings(): Settings {
  return {
    frequencyHz: 50,
    u0V: 230,
    uLlV: 400,
    limitProfile: 'iecPublic',
    customLimits: { lightingPct: 3, otherPct: 5 },
    longRunAllowance: false,
    closeThreshold: 0.8,
    designCurrentBasis: 'Ib',
    dataSet: BUILT_IN_DATA_SET,
    cableDefaults: defaultCableDefaults(),
  };
}

/** Empty project details; `date` is an ISO date (YYYY-MM-DD). */
export function defaultDetails(date = ''): ProjectDetails {
  return {
    title: 'Untitled project',
    client: '',
    site: '',
    reference: '',
    revision: 'A',
    author: '',
    date,
    notes: '',
  };
}

/**
 * A public three-phase 230/400 V TN-C-S supply with the usual declared maxima: Ze 0.35 Ω and a
 * prospective fault current of 16 kA (common practice for UK public supplies; confirm with the
 * supply company).
 */
export function newSupply(
  id: Id,
  position: Position,
  overrides: Partial<Omit<Supply, 'kind' | 'id'>> = {},
): Supply {
  return {
    kind: 'supply',
    id,
    name: 'Supply',
    position,
    phases: 3,
    u0V: 230,
    earthing: 'TN-C-S',
    zeOhm: 0.35,
    zeSource: 'declared',
    pfcKa: 16,
    ownership: 'public',
    ...overrides,
  };
}

export function newBoard(
  id: Id,
  position: Position,
  overrides: Partial<Omit<Board, 'kind' | 'id'>> = {},
): Board {
  return { kind: 'board', id, name: id, position, diversity: 1, ...overrides };
}

export function newJunction(
  id: Id,
  position: Position,
  overrides: Partial<Omit<Junction, 'kind' | 'id'>> = {},
): Junction {
  return { kind: 'junction', id, name: id, position, ...overrides };
}

type LoadPreset = Pick<Load, 'category' | 'demand' | 'powerFactor' | 'phases' | 'demandFactor' | 'motor'>;

/**
 * Starting figures per kind of load (common practice, typical ratings; the user sets the real
 * ones): a lighting circuit, a socket circuit, a 3 kW heater or immersion heater, a 7.2 kW
 * cooker, a 5.5 kW direct-on-line motor, a 32 A (7.4 kW) charge point, a split air-conditioning
 * unit.
 */
export const LOAD_PRESETS: Readonly<Record<LoadKind, LoadPreset>> = {
  lighting: preset('lighting', 0.5, 'kW', 0.9),
  sockets: preset('other', 3, 'kW', 0.95),
  heating: preset('other', 3, 'kW', 1),
  cooking: preset('other', 7.2, 'kW', 1),
  waterHeating: preset('other', 3, 'kW', 1),
  motor: {
    ...preset('other', 5.5, 'kW', 0.85, 3),
    // Direct-on-line start: about 6 x full-load current at a low power factor (common practice).
    motor: { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 10 },
  },
  evCharging: preset('other', 7.4, 'kW', 1),
  hvac: preset('other', 3.5, 'kW', 0.9),
  other: preset('other', 1, 'kW', 1),
};

function preset(
  category: LoadCategory,
  value: number,
  unit: Load['demand']['unit'],
  powerFactor: number,
  phases: Load['phases'] = 1,
): LoadPreset {
  return { category, demand: { value, unit }, powerFactor, phases, demandFactor: 1 };
}

/**
 * A load of a kind, with that kind's preset figures.
 *
 * @example
 *   newLoad('L4', { x: 0, y: 400 }, 'motor'); // 5.5 kW three-phase, DOL start data
 */
export function newLoad(
  id: Id,
  position: Position,
  loadKind: LoadKind = 'sockets',
  overrides: Partial<Omit<Load, 'kind' | 'id'>> = {},
): Load {
  const p = LOAD_PRESETS[loadKind];
  const load: Load = {
    kind: 'load',
    id,
    name: id,
    position,
    loadKind,
    category: p.category,
    demand: { ...p.demand },
    powerFactor: p.powerFactor,
    phases: p.phases,
    phase: 'L1',
    demandFactor: p.demandFactor,
    ...overrides,
  };
  if (p.motor && !('motor' in overrides)) load.motor = { ...p.motor };
  return load;
}

/**
 * A cable from `from` (upstream) to `to`, with the project's cable defaults.
 *
 * @example
 *   newCable('C3', 'DB1', 'L4', doc.settings.cableDefaults, { lengthM: 18 });
 */
export function newCable(
  id: Id,
  from: Id,
  to: Id,
  defaults: CableDefaults = defaultCableDefaults(),
  overrides: Partial<Omit<Cable, 'id' | 'from' | 'to'>> = {},
): Cable {
  const base: Cable = structuredClone({ ...defaults, id, name: id, from, to }) as Cable;
  return { ...base, ...overrides };
}

/**
 * A new project: default details and settings and one supply at the top of the drawing.
 *
 * @example
 *   const doc = newProject({ date: '2025-03-01' });
 */
export function newProject(options: { date?: string; withSupply?: boolean } = {}): ProjectDocument {
  return {
    format: FORMAT_ID,
    version: FORMAT_VERSION,
    details: defaultDetails(options.date ?? ''),
    settings: defaultSettings(),
    nodes: options.withSupply === false ? [] : [newSupply('S1', { x: 0, y: 0 })],
    cables: [],
    alternatives: [],
  };
}
