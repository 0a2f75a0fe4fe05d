/**
 * The project document: the single source of truth for a distribution layout.
 *
 * Units are part of every field name (`lengthM`, `sizeMm2`, `zeOhm`, `pfcKa`) so a figure never
 * travels without its unit. Route lengths are one-way. The file format is versioned JSON; its
 * schema lives in `schema.ts` and is published as `docs/project.schema.json`.
 */

export type Id = string;

export type Phase = 'L1' | 'L2' | 'L3';
export const PHASES: readonly Phase[] = ['L1', 'L2', 'L3'];

/** Number of phases a supply, cable or load uses. */
export type PhaseCount = 1 | 3;

export interface Position {
  x: number;
  y: number;
}

/** A place on the site plan, in metres from the plan image's top-left corner (x right, y down). */
export interface PlanPoint {
  xM: number;
  yM: number;
}

/**
 * The site plan: a drawing of the site (a scanned or exported floor plan) that boards and loads
 * are placed on, so a cable's length can be measured from where its ends are.
 */
export interface SitePlan {
  /** The drawing as a data URL (PNG, JPEG or SVG). */
  image: string;
  /** How many metres the drawing's full width spans on site (its scale). */
  widthM: number;
}

/**
 * A cable whose length is measured on the site plan: the rectilinear distance between its ends'
 * plan points (cables follow walls and containment, not the straight line), through its bends
 * where it has any, plus an allowance for rises, drops and terminations. Its `lengthM` is kept
 * equal to that by every edit.
 */
export interface PlanRoute {
  /** Added to the measured distance: rises, drops, bends, terminations, metres. */
  allowanceM: number;
  /**
   * Points the route passes through on its way from the sending end to the receiving end (around
   * a building, along a trench); each leg between them is measured along x, then y.
   */
  via?: PlanPoint[];
}

export type Earthing = 'TN-S' | 'TN-C-S' | 'TT';
export type SupplyOwnership = 'public' | 'private';

export interface Transformer {
  kva: number;
  /** Short-circuit impedance uk, percent. */
  impedancePct: number;
  /** X/R ratio of the transformer impedance. */
  xOverR: number;
}

export interface Supply {
  kind: 'supply';
  id: Id;
  name: string;
  position: Position;
  /** Where the element stands on the site plan, if placed there. */
  plan?: PlanPoint;
  phases: PhaseCount;
  /** Nominal line-to-neutral voltage U0. */
  u0V: number;
  earthing: Earthing;
  /** External earth fault loop impedance at the origin. */
  zeOhm: number;
  /** Whether Ze was declared by the supply company or measured on site. */
  zeSource: 'declared' | 'measured';
  /** Prospective fault current at the origin (the larger of L-N and L-L-L as declared). */
  pfcKa: number;
  ownership: SupplyOwnership;
  /** For a private supply: the transformer, from which the source impedance is derived. */
  transformer?: Transformer;
  /** For TT: resistance of the installation earth electrode plus protective conductors. */
  raOhm?: number;
}

export interface Board {
  kind: 'board';
  id: Id;
  name: string;
  position: Position;
  /** Where the element stands on the site plan, if placed there. */
  plan?: PlanPoint;
  /** Diversity applied to the board's outgoing demand (1 = none). */
  diversity: number;
  /**
   * Allowance for loads still to come, % of the board's demand (after diversity): the cables
   * feeding the board carry the demand × (1 + allowance / 100). None when absent.
   */
  spareCapacityPct?: number;
}

/** Joins cable segments, for example where a run changes size or tees off. */
export interface Junction {
  kind: 'junction';
  id: Id;
  name: string;
  position: Position;
  /** Where the element stands on the site plan, if placed there. */
  plan?: PlanPoint;
}

export type LoadKind =
  'lighting' | 'sockets' | 'heating' | 'cooking' | 'waterHeating' | 'motor' | 'evCharging' | 'hvac' | 'other';

export const LOAD_KINDS: readonly LoadKind[] = [
  'lighting',
  'sockets',
  'heating',
  'cooking',
  'waterHeating',
  'motor',
  'evCharging',
  'hvac',
  'other',
];

/** The voltage-drop limit category a load is judged against. */
export type LoadCategory = 'lighting' | 'other';

export type DemandUnit = 'W' | 'kW' | 'kVA' | 'A';

export interface Demand {
  value: number;
  unit: DemandUnit;
}

export interface MotorStart {
  /** Starting current as a multiple of full-load current. */
  startMultiple: number;
  /** Power factor while starting (typically 0.2-0.4 for direct-on-line). */
  startPowerFactor: number;
  /** Largest dip the user accepts at the motor while it starts, percent of nominal. */
  dipLimitPct: number;
}

export interface Load {
  kind: 'load';
  id: Id;
  name: string;
  position: Position;
  /** Where the element stands on the site plan, if placed there. */
  plan?: PlanPoint;
  loadKind: LoadKind;
  category: LoadCategory;
  demand: Demand;
  powerFactor: number;
  phases: PhaseCount;
  /** The phase a single-phase load is connected to; ignored for three-phase loads. */
  phase: Phase;
  /** Share of the connected demand taken as design demand (0..1]. */
  demandFactor: number;
  /**
   * The load is spread evenly along the cable that feeds it (a row of luminaires, a run of socket
   * outlets): the drop at the far end is that of the whole current over half the cable's length.
   */
  distributed?: boolean;
  motor?: MotorStart;
}

export type NodeElement = Supply | Board | Junction | Load;
export type NodeKind = NodeElement['kind'];

export type Material = 'Cu' | 'Al';
export type Insulation = 'thermoplastic70' | 'thermosetting90';
export type Construction = 'flatTwinEarth' | 'multicore' | 'armouredMulticore' | 'singleCore';

/** How the circuit protective conductor is provided. */
export interface Cpc {
  kind: 'core' | 'separate' | 'armour';
  /** Cross-section of the cpc (for armour: the armour's cross-section). */
  sizeMm2: number;
  material: 'Cu' | 'Al' | 'steel';
}

export type DeviceType = 'mcb' | 'rcbo' | 'fuseGG' | 'mccb';
export type BreakerCurve = 'B' | 'C' | 'D';

export interface Rcd {
  type: 'AC' | 'A' | 'F' | 'B';
  idnMa: number;
}

export interface Device {
  type: DeviceType;
  /** For mcb and rcbo. */
  curve?: BreakerCurve;
  ratingA: number;
  breakingKa: number;
  /** For mccb: long-time setting Ir as a multiple of In. */
  irMultiple?: number;
  /** For mccb: instantaneous setting Im as a multiple of Ir. */
  imMultiple?: number;
  rcd?: Rcd;
}

/** Reference installation methods, by plain description (IEC 60364-5-52 Table B.52.1 letters noted). */
export type InstallMethod =
  | 'clippedDirect' // C
  | 'conduitOnWall' // B1 / B2
  | 'conduitInInsulatedWall' // A1 / A2
  | 'trayOrFreeAir' // E / F
  | 'buriedDirect' // D2
  | 'buriedDuct' // D1
  | 'inInsulation' // flat twin-and-earth totally surrounded by thermal insulation
  | 'aboveInsulation'; // flat twin-and-earth clipped to a joist, touching insulation on one side

export interface Installation {
  method: InstallMethod;
  ambientC: number;
  /** Number of circuits grouped together, this one included. */
  groupedCircuits: number;
  groupArrangement: 'bunched' | 'singleLayer' | 'tray';
  /** Thermal insulation factor Ci where a short length passes through insulation (1 = none). */
  insulationFactor: number;
  /**
   * A shared containment run (tray, trunking, duct, trench) by name. Every cable given the same
   * run is grouped with the others in it: `groupedCircuits` is then the number of circuits in the
   * run, counted by the editor (see runs.ts).
   */
  run?: string;
}

export interface Cable {
  id: Id;
  name: string;
  /** Upstream node (towards the supply). */
  from: Id;
  /** Downstream node. */
  to: Id;
  /** One-way route length. */
  lengthM: number;
  material: Material;
  insulation: Insulation;
  construction: Construction;
  /** Line conductor cross-section. */
  sizeMm2: number;
  cpc: Cpc;
  phases: PhaseCount;
  /** Number of identical cables in parallel. */
  parallel: number;
  device?: Device;
  installation?: Installation;
  /** Present when the length is measured on the site plan rather than typed. */
  route?: PlanRoute;
}

/** One issue of the design: a row of the revision table the tender pack prints. */
export interface RevisionEntry {
  revision: string;
  /** Year-month-day. */
  date: string;
  /** What changed in this issue. */
  description: string;
  by: string;
  checked: string;
}

export interface ProjectDetails {
  title: string;
  client: string;
  site: string;
  reference: string;
  revision: string;
  author: string;
  date: string;
  notes: string;
  /** Every issue of the design, oldest first; the last is the current revision. */
  revisions?: RevisionEntry[];
}

export type LimitProfileId = 'iecPublic' | 'iecPrivate' | 'nec' | 'asnzs' | 'custom';

export interface CustomLimits {
  lightingPct: number;
  otherPct: number;
}

export interface Settings {
  frequencyHz: 50 | 60;
  /** Nominal line-to-neutral voltage. */
  u0V: number;
  /** Nominal line-to-line voltage. */
  uLlV: number;
  limitProfile: LimitProfileId;
  customLimits: CustomLimits;
  /** Apply the IEC 60364-5-52 G.52.1 allowance of +0.005 % per metre beyond 100 m (at most +0.5 %). */
  longRunAllowance: boolean;
  /** Share of a load's drop budget above which it is reported as close to its limit (0..1). */
  closeThreshold: number;
  /** Which current the drop is computed with: design current Ib, or the device rating In. */
  designCurrentBasis: 'Ib' | 'In';
  /** Id of the conductor data set the solver uses (the built-in one unless the user loaded theirs). */
  dataSet: string;
  /** Defaults for a newly drawn cable. */
  cableDefaults: Omit<Cable, 'id' | 'name' | 'from' | 'to' | 'route'>;
}

/**
 * A design kept beside the current one, to compare with it or to go back to: the whole
 * distribution and its settings as they were when it was kept. The project details are shared.
 */
export interface Alternative {
  /** Unique within the project, e.g. "Sub-main in 35 mm²". */
  name: string;
  /** What differs and why, in the user's words. */
  note: string;
  /** When it was kept, ISO 8601 (date and time, UTC). */
  keptAt: string;
  settings: Settings;
  nodes: NodeElement[];
  cables: Cable[];
}

export const FORMAT_ID = 'dropline-project';
export const FORMAT_VERSION = 2;

export interface ProjectDocument {
  format: typeof FORMAT_ID;
  version: typeof FORMAT_VERSION;
  details: ProjectDetails;
  settings: Settings;
  nodes: NodeElement[];
  cables: Cable[];
  /** Other designs for the same project (named alternatives), oldest first. */
  alternatives: Alternative[];
  /** The site plan, shared by every alternative (each places its own elements on it). */
  plan?: SitePlan;
}
