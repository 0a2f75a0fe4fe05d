/**
 * The solver's working memory: flat typed arrays indexed by node and cable position in the
 * document, so the passes touch no per-element objects. Per-phase quantities sit at
 * `index * 3 + phase` (phase 0, 1, 2 = L1, L2, L3). Result objects read from here on demand.
 */
import type { Cable, Load, NodeElement, ProjectDocument } from '../model/types.ts';
import type { CatalogueSet, ConductorRow } from '../catalogue/catalogueSet.ts';
import type { LimitProfile } from '../catalogue/limits.ts';
import type { DropFinding } from './findings.ts';

export const KIND_SUPPLY = 0;
export const KIND_BOARD = 1;
export const KIND_JUNCTION = 2;
export const KIND_LOAD = 3;
export const KIND_INVALID = 9;

/** Nominal angle of each phase voltage, radians (L1 reference, L2 lagging 120°, L3 leading 120°). */
export const PHASE_ANGLE = [0, (-2 * Math.PI) / 3, (2 * Math.PI) / 3] as const;
export const PHASE_COS = PHASE_ANGLE.map(Math.cos);
export const PHASE_SIN = PHASE_ANGLE.map(Math.sin);

export interface DropState {
  doc: ProjectDocument;
  catalogue: CatalogueSet;
  profile: LimitProfile;
  findings: DropFinding[];
  u0V: number;
  uLlV: number;
  /** Where U0 and ULL were taken from, for the working. */
  voltageSource: { u0: string; uLl: string };
  frequencyHz: number;
  closeThreshold: number;
  useDeviceRating: boolean;
  longRunAllowance: boolean;

  nodes: NodeElement[];
  cables: Cable[];
  nodeCount: number;
  cableCount: number;
  nodeIndex: Map<string, number>;
  cableIndex: Map<string, number>;
  nodeKind: Uint8Array;
  /** Valid ids (or '' where the element is malformed). */
  nodeIds: string[];
  cableIds: string[];
  /** Cable index feeding each node, -1 where none. */
  parentCable: Int32Array;
  cableFrom: Int32Array;
  cableTo: Int32Array;
  /** Reached nodes in breadth-first order from the supply; a parent always precedes its children. */
  order: Int32Array;
  orderLength: number;
  root: number;
  reached: Uint8Array;
  /** Phases present at a node (bit 0 = L1 ...). */
  nodePhases: Uint8Array;
  /** Phases a cable carries. */
  cablePhases: Uint8Array;
  /** 1 where the segment's drop cannot be computed (bad length, unknown size, phase conflict ...). */
  cableBad: Uint8Array;
  /** 1 where some cable between the origin and the node could not be computed. */
  incomplete: Uint8Array;
  cableRow: (ConductorRow | undefined)[];
  /** Series impedance of one conductor of the whole segment, parallel cables combined, ohm. */
  cableZr: Float64Array;
  cableZx: Float64Array;
  /** Valid one-way length, 0 where invalid. */
  cableLengthM: Float64Array;

  /** Load current of a valid load, A per phase conductor, and its lag angle. */
  loadCurrentA: Float64Array;
  loadPhiRad: Float64Array;
  loadValid: Uint8Array;
  /** Phases a load draws from (7 for a three-phase load), 0 for non-loads. */
  loadMask: Uint8Array;
  /** Effective diversity of a board (1 elsewhere or when invalid). */
  diversity: Float64Array;

  /** Demand current phasor flowing into each node, per phase. */
  iRe: Float64Array;
  iIm: Float64Array;
  /** Current used for the drop (differs from the demand when the In basis applies), per phase. */
  dropIScale: Float64Array;
  /** Neutral (return) current phasor on each cable. */
  nRe: Float64Array;
  nIm: Float64Array;
  /** Phasor drop on each cable, per phase (phase conductor plus the neutral's share), V. */
  dvRe: Float64Array;
  dvIm: Float64Array;
  /** The drop projected on the phase's nominal direction (r cos φ + x sin φ form), V, per phase. */
  dropProj: Float64Array;
  /** Cumulative projected drop from the origin at each node, V, per phase. */
  cum: Float64Array;
  /** Node voltage phasor to neutral, per phase. */
  vRe: Float64Array;
  vIm: Float64Array;
  /** Route length from the origin, m. */
  pathLengthM: Float64Array;
  /** Cumulative drop at the last board upstream of each node (NEC branch budget), V, per phase. */
  branchBase: Float64Array;

  /** Per load: worst relevant phase, cumulative % of U0, limit %, budget used; status -1 none, 0..2. */
  worstPhase: Int8Array;
  loadCumPct: Float64Array;
  loadLimitPct: Float64Array;
  loadBranchPct: Float64Array;
  budgetUsed: Float64Array;
  status: Int8Array;
  /** Per cable: longest length keeping every judged load below within its limit; NaN = none. */
  maxLengthM: Float64Array;
}

export type { Load };
