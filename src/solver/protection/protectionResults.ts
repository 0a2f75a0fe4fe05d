/**
 * Result shapes for capacity, loop impedance, fault level, protective conductor, phase balance and
 * motor starting. They hang off CableResult / NodeResult / LoadResult / Results as optional fields
 * (see results.ts) so views can read them without knowing how they were computed.
 */
import type { Device, Id, Phase } from '../../model/types.ts';
import type { Working } from '../results.ts';

/** Stable keys of the checks; views and the CLI group by them. */
export type CheckKey =
  | 'ibIn' // Ib <= In
  | 'inIz' // In <= Iz
  | 'i2' // I2 <= 1.45 Iz
  | 'zs' // Zs <= Zs max (disconnection in the required time)
  | 'rcdTouch' // RA x IΔn <= 50 V (TT) or Zs x IΔn <= 50 V
  | 'breaking' // breaking capacity >= prospective fault current at the device
  | 'cpc' // adiabatic check on the protective conductor (or the table minimum)
  | 'motorDip'; // starting dip at the motor within the user's limit

export interface Check {
  key: CheckKey;
  title: string;
  /** null when the check cannot be assessed (missing device or data); the message says why. */
  pass: boolean | null;
  value: number | null;
  limit: number | null;
  unit: string;
  message: string;
  working: Working;
}

/** Complex impedance carried as R and X so large cables and transformer sources keep their angle. */
export interface Impedance {
  rOhm: number;
  xOhm: number;
}

export interface CableProtection {
  /** The device protecting this segment: its own, or the one upstream through junctions. */
  device: Device | null;
  /** Id of the cable whose sending end carries that device. */
  deviceCableId: Id | null;
  /** Whether the protected circuit is a final circuit or a distribution circuit. */
  circuit: 'final' | 'distribution';
  /** Tabulated capacity It and the corrected capacity Iz = It x Ca x Cg x Ci (x parallel). */
  itA: number | null;
  izA: number | null;
  factors: { ca: number; cg: number; ci: number } | null;
  /** Ib / Iz (0..): capacity use. */
  capacityUse: number | null;
  /** R1 + R2 of this segment at operating temperature and at 20 °C. */
  r1r2HotOhm: number;
  r1r2ColdOhm: number;
  /** Disconnection time required for the circuit this segment belongs to. */
  requiredTimeS: number | null;
  checks: Check[];
  /** Working of Iz and R1 + R2 (each check carries its own working too). */
  working: Working[];
}

export interface FaultLevel {
  /** Line-to-neutral prospective fault current, maximum (cables at 20 °C, cmax). */
  lnA: number;
  /** Three-phase symmetrical prospective fault current; null where the point is single-phase. */
  lllA: number | null;
  /** The larger of the two: what breaking capacities are compared with. */
  maxA: number;
  /** Voltage factor used for the maximum currents (IEC 60909-0 cmax). */
  cMax: number;
}

export interface NodeProtection {
  /** Design loop impedance at operating temperature, magnitude and parts. */
  zsOhm: number;
  zs: Impedance;
  /** Loop impedance with conductors at 20 °C (what a tester would see, before the 0.8 rule). */
  zsColdOhm: number;
  /** Maximum Zs for the device protecting this point, null where unassessable. */
  zsMaxOhm: number | null;
  /** Largest value a tester should measure with conductors cold (0.8 x Zs max). */
  testZsMaxOhm: number | null;
  /** Earth fault current for disconnection, Cmin x U0 / Zs. */
  earthFaultA: number;
  fault: FaultLevel;
  checks: Check[];
  /** Working of Zs and the prospective fault current. */
  working: Working[];
}

export interface MotorStartResult {
  startCurrentA: number;
  dipAtMotorPct: number;
  dipAtBoardPct: number | null;
  boardId: Id | null;
  limitPct: number;
}

export interface BoardBalance {
  boardId: Id;
  currentsA: Record<Phase | 'N', number>;
  /** (Imax − Iavg) / Iavg x 100, percent of the average phase current. */
  imbalancePct: number;
  worstPhase: Phase;
}

export interface ProtectionSummary {
  /** Number of checks that failed, across every cable, node and load. */
  failedChecks: number;
  /** Number of checks that could not be assessed. */
  unassessedChecks: number;
  balance: Record<Id, BoardBalance>;
  fuseDataSet: { id: string; title: string; source: string };
  capacityDataSets: string[];
}
