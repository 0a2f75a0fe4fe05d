/** Small shared readers over the solver state, used by result objects and working records. */
import type { Phase } from '../model/types.ts';
import { dropCurrentScale, type DropState } from './dropState.ts';
import { hypot } from './hypot.ts';

export type DropMethod = 'singlePhaseLoop' | 'balancedThreePhase' | 'unbalancedThreePhase';

export const PHASE_NAMES: readonly Phase[] = ['L1', 'L2', 'L3'];

export function phasesOf(mask: number): Phase[] {
  const out: Phase[] = [];
  if (mask & 1) out.push('L1');
  if (mask & 2) out.push('L2');
  if (mask & 4) out.push('L3');
  return out;
}

/** Which case of the one phasor method applied to a cable, for the working and the percentage basis. */
export function dropMethod(s: DropState, j: number): DropMethod {
  const mask = s.cablePhases[j] as number;
  if (mask !== 7) return 'singlePhaseLoop';
  const v = s.cableTo[j] as number;
  let ib = 0;
  for (let p = 0; p < 3; p++)
    ib = Math.max(ib, hypot(s.iRe[v * 3 + p] as number, s.iIm[v * 3 + p] as number));
  const kept = dropCurrentScale(s, j);
  const scale = kept === 0 ? 1 : kept;
  const neutral = hypot(s.nRe[j] as number, s.nIm[j] as number);
  // A rounding residue of a balanced set is ~1e-15 of the phase current.
  return neutral <= 1e-9 * Math.max(ib * scale, 1e-9) ? 'balancedThreePhase' : 'unbalancedThreePhase';
}

/** Worst phase of a cable's projected drop, or -1. */
export function worstCablePhase(s: DropState, j: number): number {
  const mask = s.cablePhases[j] as number;
  let worst = -1;
  let best = -Infinity;
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    const d = s.dropProj[j * 3 + p] as number;
    if (d > best) {
      best = d;
      worst = p;
    }
  }
  return worst;
}

/** Worst cumulative drop at a node over the given phases, V; -1 phase when none. */
export function worstNodeCum(s: DropState, v: number, mask: number): { phase: number; volts: number } {
  let phase = -1;
  let volts = -Infinity;
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    const c = s.cum[v * 3 + p] as number;
    if (c > volts) {
      volts = c;
      phase = p;
    }
  }
  return { phase, volts: phase < 0 ? NaN : volts };
}

/** Cable ids from the origin to a node, in order. */
export function pathTo(s: DropState, v: number): number[] {
  const out: number[] = [];
  if (!s.reached[v]) return out;
  let w = v;
  while (w !== s.root) {
    const j = s.parentCable[w] as number;
    if (j < 0) break;
    out.push(j);
    w = s.cableFrom[j] as number;
  }
  return out.reverse();
}
