/**
 * Result objects over the solver state, built when a record is first read (see lazyRecord.ts).
 * Every figure is a plain own field, so spreading a result copies it; only `working` is a getter
 * (records are built when asked for: read `r.working`, it is not copied by `{...r}`). `toJSON`
 * includes the working, so `JSON.stringify(results)` prints everything.
 */
import type { Id, Phase } from '../model/types.ts';
import type {
  CableResult,
  LoadResult,
  NodeResult,
  PathShare,
  Percent,
  PhaseCurrents,
  Status,
  Working,
} from './results.ts';
import type { DropState } from './dropState.ts';
import { KIND_LOAD, cableRow } from './dropState.ts';
import { PHASE_NAMES, dropMethod, pathTo, phasesOf, worstCablePhase, worstNodeCum } from './dropMethod.ts';
import type { DropMethod } from './dropMethod.ts';
import { cableIbA, voltagePhasors } from './flow.ts';
import { STATUS_WORDS, judged, loadPhaseMask } from './judge.ts';
import { cableWorking, nodeWorking } from './working.ts';
import { hypot } from './hypot.ts';

function statusOf(code: number): Status | null {
  return code < 0 ? null : (STATUS_WORDS[code] ?? null);
}

function currentsAt(s: DropState, v: number, mask: number, nRe: number, nIm: number): PhaseCurrents {
  const b = v * 3;
  const m = (p: number) => (mask & (1 << p) ? hypot(s.iRe[b + p] as number, s.iIm[b + p] as number) : 0);
  return { L1: m(0), L2: m(1), L3: m(2), N: hypot(nRe, nIm) };
}

function pctU0(s: DropState, volts: number): Percent {
  return { value: (volts / s.u0V) * 100, basis: 'U0', basisV: s.u0V };
}

const NO_CURRENT: PhaseCurrents = Object.freeze({ L1: 0, L2: 0, L3: 0, N: 0 });

export class CableResultView implements CableResult {
  readonly id: Id;
  readonly ibA: number;
  /** The demand current on each conductor; N is the phasor sum of the phase currents. */
  readonly currentsA: PhaseCurrents;
  readonly phases: Phase[];
  readonly rOhmPerM: number;
  readonly xOhmPerM: number;
  readonly dropV: number;
  readonly dropPct: Percent;
  readonly phaseDropV: Partial<Record<Phase, number>>;
  readonly cumulativePct: Percent;
  readonly maxLengthM: number | null;
  readonly status: Status | null;
  /** False where the cable is outside the solved tree or its own drop could not be computed. */
  readonly solved: boolean;
  /** Which case of the phasor method applied (null when not solved). */
  readonly dropMethod: DropMethod | null;
  readonly #s: DropState;
  readonly #j: number;

  constructor(s: DropState, j: number) {
    this.#s = s;
    this.#j = j;
    this.id = s.cableIds.at(j);
    const v = s.cableTo[j] as number;
    const inTree = v >= 0 && s.reached[v] === 1;
    const mask = inTree ? (s.cablePhases[j] as number) : 0;
    this.solved = inTree && !s.cableBad[j];
    this.ibA = inTree ? cableIbA(s, j) : 0;
    if (inTree) {
      let nr = 0;
      let ni = 0;
      for (let p = 0; p < 3; p++) {
        if (!(mask & (1 << p))) continue;
        nr += s.iRe[v * 3 + p] as number;
        ni += s.iIm[v * 3 + p] as number;
      }
      this.currentsA = currentsAt(s, v, mask, nr, ni);
    } else this.currentsA = { ...NO_CURRENT };
    this.phases = phasesOf(mask);
    const row = cableRow(s, j);
    const parallel = (s.cables[j] as { parallel?: unknown }).parallel;
    const n = typeof parallel === 'number' && parallel >= 1 ? parallel : 1;
    this.rOhmPerM = row ? row.rOhmPerM / n : NaN;
    this.xOhmPerM = row ? (row.xOhmPerM * (row.frequencyHz ? s.frequencyHz / row.frequencyHz : 1)) / n : NaN;
    this.dropMethod = this.solved ? dropMethod(s, j) : null;
    const p = worstCablePhase(s, j);
    const d = this.solved && p >= 0 ? (s.dropProj[j * 3 + p] as number) : this.solved ? 0 : NaN;
    if (this.dropMethod === 'balancedThreePhase') {
      this.dropV = Math.sqrt(3) * d;
      this.dropPct = { value: (this.dropV / s.uLlV) * 100, basis: 'ULL', basisV: s.uLlV };
    } else {
      this.dropV = d;
      this.dropPct = pctU0(s, d);
    }
    const drops: Partial<Record<Phase, number>> = {};
    if (this.solved)
      for (let q = 0; q < 3; q++)
        if (mask & (1 << q)) drops[PHASE_NAMES[q] as Phase] = s.dropProj[j * 3 + q] as number;
    this.phaseDropV = drops;
    this.cumulativePct = pctU0(s, inTree ? worstNodeCum(s, v, mask).volts : NaN);
    const maxLen = s.maxLengthM[j] as number;
    this.maxLengthM = Number.isNaN(maxLen) ? null : maxLen;
    this.status = inTree ? statusOf(s.status[v] as number) : null;
  }

  /** Formula, inputs and result of every figure, built on each read. */
  get working(): Working[] {
    return cableWorking(this.#s, this.#j);
  }

  toJSON(): Record<string, unknown> {
    return { ...(this as object), working: this.working };
  }
}

export class NodeResultView implements NodeResult {
  readonly id: Id;
  readonly path: Id[];
  /** U0 minus the cumulative drop, per phase present (the same basis as the percentages). */
  readonly voltageV: Partial<Record<Phase, number>>;
  /** The node voltage to neutral as a phasor (U0 ∠ phase angle minus the phasor drops), per phase present. */
  readonly voltagePhasorV: Partial<Record<Phase, { re: number; im: number }>>;
  readonly cumulativePct: Percent;
  readonly currentsA: PhaseCurrents;
  readonly status: Status | null;
  /** False where nothing feeds the node from the supply. */
  readonly solved: boolean;
  readonly #s: DropState;
  readonly #v: number;

  constructor(s: DropState, v: number) {
    this.#s = s;
    this.#v = v;
    this.id = s.nodeIds.at(v);
    this.solved = s.reached[v] === 1;
    this.status = this.solved ? statusOf(s.status[v] as number) : null;
    this.path = pathTo(s, v).map((j) => s.cableIds.at(j));
    const mask = !this.solved
      ? 0
      : s.nodeKind[v] === KIND_LOAD
        ? loadPhaseMask(s, v)
        : (s.nodePhases[v] as number);
    const volts: Partial<Record<Phase, number>> = {};
    const phasors: Partial<Record<Phase, { re: number; im: number }>> = {};
    const b = v * 3;
    const { vRe, vIm } = mask ? voltagePhasors(s) : s;
    for (let p = 0; p < 3; p++) {
      if (!(mask & (1 << p))) continue;
      const name = PHASE_NAMES[p] as Phase;
      volts[name] = s.u0V - (s.cum[b + p] as number);
      phasors[name] = { re: vRe[b + p] as number, im: vIm[b + p] as number };
    }
    this.voltageV = volts;
    this.voltagePhasorV = phasors;
    this.cumulativePct = !this.solved
      ? pctU0(s, NaN)
      : v === s.root
        ? pctU0(s, 0)
        : pctU0(s, worstNodeCum(s, v, mask).volts);
    if (this.solved) {
      const nr = (s.iRe[b] as number) + (s.iRe[b + 1] as number) + (s.iRe[b + 2] as number);
      const ni = (s.iIm[b] as number) + (s.iIm[b + 1] as number) + (s.iIm[b + 2] as number);
      this.currentsA = currentsAt(s, v, 7, nr, ni);
    } else this.currentsA = { ...NO_CURRENT };
  }

  /** Formula, inputs and result of every figure, built on each read. */
  get working(): Working[] {
    return nodeWorking(this.#s, this.#v);
  }

  toJSON(): Record<string, unknown> {
    return { ...(this as object), working: this.working };
  }
}

export class LoadResultView extends NodeResultView implements LoadResult {
  readonly limitPct: Percent;
  readonly budgetUsed: number;
  readonly shares: PathShare[];
  /** Drop of the branch circuit alone (from the last board upstream), where the profile limits it. */
  readonly branchDropPct?: Percent;

  constructor(s: DropState, v: number) {
    super(s, v);
    const verdict = judged(s, v);
    this.limitPct = { value: verdict.limit, basis: 'U0', basisV: s.u0V };
    this.budgetUsed = this.solved ? verdict.used : NaN;
    if (s.profile.branchPct !== undefined && this.solved)
      this.branchDropPct = { value: verdict.branchWorst, basis: 'U0', basisV: s.u0V };
    const p = Math.max(0, s.worstPhase[v] as number);
    const total = verdict.worstPct;
    this.shares = pathTo(s, v).map((j) => {
      const dropPct = ((s.dropProj[j * 3 + p] as number) / s.u0V) * 100;
      return { cableId: s.cableIds.at(j), dropPct, share: total > 0 ? dropPct / total : 0 };
    });
  }
}
