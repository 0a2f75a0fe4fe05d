/**
 * The solver's working memory: flat typed arrays indexed by node and cable position in the
 * document, so the passes touch no per-element objects. Per-phase quantities sit at
 * `index * 3 + phase` (phase 0, 1, 2 = L1, L2, L3). Result objects read from here on demand.
 */
import type { Cable, Load, NodeElement, ProjectDocument } from '../model/types.ts';
import type { CatalogueSet, ConductorRow } from '../catalogue/catalogueSet.ts';
import type { LimitProfile } from '../catalogue/limits.ts';
import type { DropFinding } from './findings.ts';
import type { IdIndex } from './idIndex.ts';
import type { IdList } from './idList.ts';

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
  /** Id → position; reads like a ReadonlyMap (`get`, `has`, iteration). */
  nodeIndex: IdIndex;
  cableIndex: IdIndex;
  nodeKind: Uint8Array;
  /** Valid ids (or '' where the element is malformed or repeats an earlier id). */
  nodeIds: IdList;
  cableIds: IdList;
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
  /**
   * Each cable's conductor row, as a position in `rows` (0 where the data set has none): one small
   * list per solve instead of an entry per cable.
   */
  cableRowAt: Int32Array;
  /** The conductor rows the cables use; `rows[0]` is none. */
  rows: (ConductorRow | undefined)[];
  /** A valid parallel count (1 to MAX_PARALLEL), 0 where invalid: with the row and length it gives the segment's impedance. */
  cableParallel: Uint8Array;
  /** Valid one-way length, 0 where invalid. */
  cableLengthM: Float64Array;

  /** Load current of a valid load, A per phase conductor. */
  loadCurrentA: Float64Array;
  loadValid: Uint8Array;
  /** Phases a load draws from (7 for a three-phase load), 0 for non-loads. */
  loadMask: Uint8Array;
  /** A board's demand factor: its diversity × (1 + spare capacity allowance) (1 elsewhere or when invalid). */
  diversity: Float64Array;

  /** Demand current phasor flowing into each node, per phase. */
  iRe: Float64Array;
  iIm: Float64Array;
  /**
   * Scale from the demand current to the one the drop is worked out with (the In basis; 0 where
   * the rating itself is used), per cable; empty when the settings use the demand, where it is 1
   * (read it through dropCurrentScale).
   */
  dropIScale: Float64Array;
  /** Neutral (return) current phasor on each cable. */
  nRe: Float64Array;
  nIm: Float64Array;
  /** The drop projected on the phase's nominal direction (r cos φ + x sin φ form), V, per phase. */
  dropProj: Float64Array;
  /** Cumulative projected drop from the origin at each node, V, per phase. */
  cum: Float64Array;
  /**
   * Node voltage phasor to neutral, per phase: empty until a result first asks for one, then the
   * whole tree's (voltagePhasors in flow.ts). Results read them through that function.
   */
  vRe: Float64Array;
  vIm: Float64Array;
  /** Route length from the origin, m. */
  pathLengthM: Float64Array;
  /**
   * The last board upstream of each node, or the origin where there is none: the branch budget
   * (NEC) counts from its cumulative drop.
   */
  branchAt: Int32Array;

  /**
   * Per load: worst relevant phase; status -1 none, 0..2. Its cumulative %, limit, branch drop and
   * budget used are worked out again when a result is built (loadVerdict in judge.ts).
   */
  worstPhase: Int8Array;
  status: Int8Array;
  /** Per cable: longest length keeping every judged load below within its limit; NaN = none. */
  maxLengthM: Float64Array;

  // Fields read from the document in one pass, in document order, while the index is built
  // (validateElements.ts reads them; the passes after it touch no element object on the fast path).
  /** 1 where an element's fields did not pass the fast checks, so the careful check must run. */
  nodeCheck: Uint8Array;
  cableCheck: Uint8Array;
  /**
   * A load's demand as typed (value, unit code 0 W, 1 kW, 2 kVA, 3 A), power factor, demand factor.
   * Value, power factor and demand factor are read until the upward pass only: they share their
   * memory with `slackPct`.
   */
  loadValue: Float64Array;
  loadUnit: Uint8Array;
  loadPf: Float64Array;
  loadDf: Float64Array;
  /** Phases a load declares (7 three-phase, else the bit of its phase), before the supply is known. */
  loadDeclared: Uint8Array;
  /** 0 lighting, 1 other, 2 neither (judged as lighting, with a finding). */
  loadCategory: Uint8Array;
  /** 1 where a load has motor starting data (read here so protection need not read the loads again). */
  loadMotor: Uint8Array;
  /** 1 where a load is spread evenly along the cable feeding it (that cable drops over half its length). */
  loadSpread: Uint8Array;
  /** A cable's `phases` field: 1, 3, or 0 for anything else. */
  cablePhasesField: Uint8Array;
  /** Scratch for the passes: phases needed below a node, 1 where a three-phase load or cable is below. */
  needBelow: Uint8Array;
  threeBelow: Uint8Array;
  /** Scratch for the judge: smallest slack below a node per phase, % of U0 (over the load fields). */
  slackPct: Float64Array;
  /**
   * The reached nodes in the order the numeric passes walk them (`orderLength` long, parents
   * first): document order when every tree cable runs from a lower to a higher position and each
   * node's children come in cable order, so the passes read memory front to back and every sum
   * adds in the same order as over `order`; otherwise a copy of `order`.
   */
  walk: Int32Array;
  /** True when `walk` is document order rather than breadth-first order. */
  walkIsDocumentOrder: boolean;
  /** Position of each reached node in `order`, filled only when findings need sorting (see findingOrder.ts). */
  rank: Int32Array;
  rankReady: boolean;
  /** Scratch for the topology: compressed child lists. */
  childStart: Int32Array;
  /** The child lists' cables; before the adjacency is built, each cable's id claim (its holder). */
  childCables: Int32Array;
}

/**
 * Bump allocator over one ArrayBuffer: one external allocation per solve instead of fifty, which
 * keeps the garbage collector from being prompted by every typed array.
 */
class Slab {
  private offset = 0;
  constructor(private readonly buffer: ArrayBuffer | undefined) {}
  get bytes(): number {
    return this.offset;
  }
  private take(bytes: number): number {
    const at = this.offset;
    this.offset += (bytes + 7) & ~7;
    return at;
  }
  f64(length: number): Float64Array {
    const at = this.take(length * 8);
    return this.buffer ? new Float64Array(this.buffer, at, length) : new Float64Array(0);
  }
  i32(length: number): Int32Array {
    const at = this.take(length * 4);
    return this.buffer ? new Int32Array(this.buffer, at, length) : new Int32Array(0);
  }
  u8(length: number): Uint8Array {
    const at = this.take(length);
    return this.buffer ? new Uint8Array(this.buffer, at, length) : new Uint8Array(0);
  }
  i8(length: number): Int8Array {
    const at = this.take(length);
    return this.buffer ? new Int8Array(this.buffer, at, length) : new Int8Array(0);
  }
}

export type DropArrays = ReturnType<typeof layout>;

/** The scale of cable `j`'s drop current (DropState.dropIScale): 1 on the demand basis. */
export function dropCurrentScale(s: DropState, j: number): number {
  return s.useDeviceRating ? (s.dropIScale[j] as number) : 1;
}

/**
 * A load's typed demand fields are read only until its current is set (the upward pass); the
 * judge's slack is needed only after that. So the two share one region of the buffer.
 */
function loadFields(region: Float64Array, n: number) {
  return {
    loadValue: region.subarray(0, n),
    loadPf: region.subarray(n, 2 * n),
    loadDf: region.subarray(2 * n, 3 * n),
    slackPct: region,
  };
}

function layout(a: Slab, n: number, m: number, useDeviceRating: boolean) {
  return {
    nodeKind: a.u8(n).fill(KIND_INVALID),
    parentCable: a.i32(n).fill(-1),
    cableFrom: a.i32(m).fill(-1),
    cableTo: a.i32(m).fill(-1),
    cableRowAt: a.i32(m),
    order: a.i32(n),
    reached: a.u8(n),
    nodePhases: a.u8(n),
    cablePhases: a.u8(m),
    cableBad: a.u8(m),
    incomplete: a.u8(n),
    cableParallel: a.u8(m),
    cableLengthM: a.f64(m),
    loadCurrentA: a.f64(n),
    loadValid: a.u8(n),
    loadMask: a.u8(n),
    diversity: a.f64(n).fill(1),
    iRe: a.f64(n * 3),
    iIm: a.f64(n * 3),
    dropIScale: a.f64(useDeviceRating ? m : 0).fill(1),
    nRe: a.f64(m),
    nIm: a.f64(m),
    dropProj: a.f64(m * 3),
    cum: a.f64(n * 3),
    pathLengthM: a.f64(n),
    branchAt: a.i32(n),
    worstPhase: a.i8(n).fill(-1),
    status: a.i8(n).fill(-1),
    maxLengthM: a.f64(m).fill(NaN),
    nodeCheck: a.u8(n),
    cableCheck: a.u8(m),
    loadUnit: a.u8(n),
    loadDeclared: a.u8(n),
    loadCategory: a.u8(n),
    loadMotor: a.u8(n),
    loadSpread: a.u8(n),
    cablePhasesField: a.u8(m),
    needBelow: a.u8(n),
    threeBelow: a.u8(n),
    ...loadFields(a.f64(n * 3), n),
    walk: a.i32(n),
    rank: a.i32(n),
    childStart: a.i32(n + 1),
    childCables: a.i32(m),
  };
}

/** Every typed array of a state for `n` nodes and `m` cables, carved from one buffer. */
export function allocateArrays(n: number, m: number, useDeviceRating: boolean): DropArrays {
  const measure = new Slab(undefined);
  layout(measure, n, m, useDeviceRating);
  return layout(new Slab(new ArrayBuffer(measure.bytes)), n, m, useDeviceRating);
}

/** The conductor row of cable `j`, or undefined where the data set has none. */
export function cableRow(s: DropState, j: number): ConductorRow | undefined {
  return s.rows[s.cableRowAt[j] as number];
}

export type { Load };
