/**
 * What `solve(document)` returns. Figures are SI (amperes, volts, ohms, metres); every percentage
 * carries its basis; every figure a user sees has a Working record behind it.
 *
 * This is the contract between the engine and its views (editor, CLI, exports). Add fields freely;
 * renaming one means updating every view.
 */
import type { Id, Phase } from '../model/types.ts';
import type {
  CableProtection,
  MotorStartResult,
  NodeProtection,
  ProtectionSummary,
} from './protection/protectionResults.ts';

export type Status = 'within' | 'close' | 'over';

/**
 * The word a person reads for each status, in the editor, the report and the working alike; the
 * status values themselves (`within`, `close`, `over`) are the file and JSON vocabulary.
 */
export const STATUS_SHOWN: Readonly<Record<Status, string>> = {
  within: 'clear',
  close: 'tight',
  over: 'over',
};

/** A percentage always says what it is a percentage of. */
export interface Percent {
  value: number;
  /** U0 for single-phase and per-phase figures, ULL for balanced three-phase line-to-line figures. */
  basis: 'U0' | 'ULL';
  basisV: number;
}

export interface WorkingInput {
  name: string;
  value: number | string;
  unit: string;
  /** Where the value came from: a document field, a catalogue row, a limit profile, another result. */
  source: string;
}

export interface Working {
  /** Stable key, e.g. `ib`, `impedance`, `drop`, `cumulative`, `limit`, `headroom`. */
  key: string;
  title: string;
  formula: string;
  inputs: WorkingInput[];
  result: { value: number | string; unit: string };
  /** Where the method is simplified, it says so here. */
  note?: string;
}

export type PhaseCurrents = Record<Phase | 'N', number>;

export interface CableResult {
  id: Id;
  /** Design current Ib: the worst phase current. */
  ibA: number;
  /** Current magnitude on each conductor (0 where a conductor is absent). */
  currentsA: PhaseCurrents;
  /** The phase(s) this cable carries. */
  phases: Phase[];
  /** Per-metre resistance at conductor operating temperature and reactance, one conductor. */
  rOhmPerM: number;
  xOhmPerM: number;
  /** Worst-phase drop along this segment, in volts and as a percentage. */
  dropV: number;
  dropPct: Percent;
  /** Per-phase drop along this segment referred to U0 (line to neutral), volts. */
  phaseDropV: Partial<Record<Phase, number>>;
  /** Cumulative drop from the origin at the far end, worst phase, percent of U0. */
  cumulativePct: Percent;
  /** Longest this cable could be with the drop budget left on its worst downstream path, metres. */
  maxLengthM: number | null;
  status: Status | null;
  working: Working[];
  /** False where the cable is outside the solved tree or its own drop could not be computed. */
  solved?: boolean;
  /** Which case of the one phasor method applied (null when not solved). */
  dropMethod?: 'singlePhaseLoop' | 'balancedThreePhase' | 'unbalancedThreePhase' | null;
  /** Device, capacity (Iz) and per-segment checks; added by attachProtection. */
  protection?: CableProtection;
}

export interface NodeResult {
  id: Id;
  /** Cables from the origin to this node, in order (empty for the supply or an unfed node). */
  path: Id[];
  /** Voltage to neutral at the node per phase present. */
  voltageV: Partial<Record<Phase, number>>;
  /** Cumulative drop from the origin, worst phase, percent of U0. */
  cumulativePct: Percent;
  /** Demand current per phase flowing into the node. */
  currentsA: PhaseCurrents;
  status: Status | null;
  working: Working[];
  /** False where nothing feeds the node from the supply. */
  solved?: boolean;
  /** Node voltage to neutral as a phasor (U0 at the phase angle minus the phasor drops). */
  voltagePhasorV?: Partial<Record<Phase, { re: number; im: number }>>;
  /** Loop impedance Zs, prospective fault current and their checks; added by attachProtection. */
  protection?: NodeProtection;
}

export interface PathShare {
  cableId: Id;
  dropPct: number;
  /** Fraction of the load's total drop contributed by this segment (0..1). */
  share: number;
}

export interface LoadResult extends NodeResult {
  limitPct: Percent;
  /** Fraction of the budget used (cumulative / limit). */
  budgetUsed: number;
  shares: PathShare[];
  /** Drop of the branch circuit alone (from the last board upstream), where the profile limits it (NEC). */
  branchDropPct?: Percent;
  /** Starting dip for a motor load; added by attachProtection. */
  motorStart?: MotorStartResult;
}

export type Severity = 'error' | 'warning' | 'info';

export interface Finding {
  /** Stable code, e.g. `loop`, `island`, `fedTwice`, `phaseMismatch`, `badLength`, `overLimit`. */
  code: string;
  severity: Severity;
  elementId?: Id;
  message: string;
}

export interface DataSetInfo {
  id: string;
  title: string;
  source: string;
}

export interface LimitProfileInfo {
  id: string;
  title: string;
  source: string;
}

export interface Results {
  cables: Record<Id, CableResult>;
  /** Every node, loads included (a load's entry here is the same object as in `loads`). */
  nodes: Record<Id, NodeResult>;
  loads: Record<Id, LoadResult>;
  findings: Finding[];
  dataSet: DataSetInfo;
  profile: LimitProfileInfo;
  /** Standards and editions the figures rely on, for cautions and reports. */
  references: string[];
  /** Counts of failed checks, phase balance per three-phase board; added by attachProtection. */
  protection?: ProtectionSummary;
}
