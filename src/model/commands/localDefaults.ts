/**
 * Factories the editor uses to create elements. They mirror the trade defaults a designer would
 * pick first (230/400 V, TN-C-S, 2.5 mm2 copper twin and earth for a final circuit) and are kept
 * here until the model's own factories in src/model/defaults.ts exist; then this module forwards
 * to them.
 */
import type {
  Board,
  Cable,
  Junction,
  Load,
  LoadKind,
  NodeElement,
  Position,
  ProjectDocument,
  Settings,
  Supply,
} from '../types.ts';
import { FORMAT_ID, FORMAT_VERSION } from '../types.ts';

export type PartKind = 'supply' | 'board' | 'junction' | `load:${LoadKind}`;

export const DEFAULT_CABLE: Settings['cableDefaults'] = {
  lengthM: 20,
  material: 'Cu',
  insulation: 'thermoplastic70',
  construction: 'flatTwinEarth',
  sizeMm2: 2.5,
  cpc: { kind: 'core', sizeMm2: 1.5, material: 'Cu' },
  phases: 1,
  parallel: 1,
};

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
    dataSet: 'builtin',
    cableDefaults: structuredClone(DEFAULT_CABLE),
  };
}

export function emptyProject(): ProjectDocument {
  return {
    format: FORMAT_ID,
    version: FORMAT_VERSION,
    details: {
      title: 'Untitled project',
      client: '',
      site: '',
      reference: '',
      revision: 'A',
      author: '',
      date: '',
      notes: '',
    },
    settings: defaultSettings(),
    nodes: [],
    cables: [],
  };
}

const LOAD_TEMPLATES: Record<
  LoadKind,
  Pick<Load, 'category' | 'demand' | 'powerFactor' | 'phases' | 'demandFactor'>
> = {
  lighting: {
    category: 'lighting',
    demand: { value: 800, unit: 'W' },
    powerFactor: 0.95,
    phases: 1,
    demandFactor: 1,
  },
  sockets: {
    category: 'other',
    demand: { value: 20, unit: 'A' },
    powerFactor: 0.95,
    phases: 1,
    demandFactor: 0.5,
  },
  heating: {
    category: 'other',
    demand: { value: 3, unit: 'kW' },
    powerFactor: 1,
    phases: 1,
    demandFactor: 1,
  },
  cooking: {
    category: 'other',
    demand: { value: 7.2, unit: 'kW' },
    powerFactor: 1,
    phases: 1,
    demandFactor: 0.6,
  },
  waterHeating: {
    category: 'other',
    demand: { value: 3, unit: 'kW' },
    powerFactor: 1,
    phases: 1,
    demandFactor: 1,
  },
  motor: {
    category: 'other',
    demand: { value: 5.5, unit: 'kW' },
    powerFactor: 0.85,
    phases: 3,
    demandFactor: 1,
  },
  evCharging: {
    category: 'other',
    demand: { value: 7.4, unit: 'kW' },
    powerFactor: 0.99,
    phases: 1,
    demandFactor: 1,
  },
  hvac: { category: 'other', demand: { value: 4, unit: 'kW' }, powerFactor: 0.9, phases: 1, demandFactor: 1 },
  other: {
    category: 'other',
    demand: { value: 1, unit: 'kW' },
    powerFactor: 0.95,
    phases: 1,
    demandFactor: 1,
  },
};

/** A new element of a tray part, with the id and name given by the caller. */
export function newNodeOfPart(part: PartKind, id: string, name: string, position: Position): NodeElement {
  if (part === 'supply') {
    const s: Supply = {
      kind: 'supply',
      id,
      name,
      position,
      phases: 3,
      u0V: 230,
      earthing: 'TN-C-S',
      zeOhm: 0.35,
      zeSource: 'declared',
      pfcKa: 16,
      ownership: 'public',
    };
    return s;
  }
  if (part === 'board') {
    const b: Board = { kind: 'board', id, name, position, diversity: 1 };
    return b;
  }
  if (part === 'junction') {
    const j: Junction = { kind: 'junction', id, name, position };
    return j;
  }
  const loadKind = part.slice('load:'.length) as LoadKind;
  const t = LOAD_TEMPLATES[loadKind];
  const l: Load = {
    kind: 'load',
    id,
    name,
    position,
    loadKind,
    category: t.category,
    demand: { ...t.demand },
    powerFactor: t.powerFactor,
    phases: t.phases,
    phase: 'L1',
    demandFactor: t.demandFactor,
    ...(loadKind === 'motor' ? { motor: { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 10 } } : {}),
  };
  return l;
}

/** A cable from the project's defaults. */
export function newCableFromDefaults(doc: ProjectDocument, id: string, from: string, to: string): Cable {
  return { ...structuredClone(doc.settings.cableDefaults), id, name: id, from, to };
}
