/**
 * Which phases each cable and node carries (run inside the downward pass of flow.ts). A single-phase cable takes the phase of the loads
 * below it; a three-phase load or cable below a single-phase one, two phases below one
 * single-phase cable, or a three-phase cable fed from a single-phase point make the segment
 * unsolvable, with a finding.
 */
import type { DropState } from './dropState.ts';
import { KIND_LOAD } from './dropState.ts';
import { shown } from './findings.ts';
import { nodeLabel } from './topology.ts';

const BIT_NAME = ['', 'L1', 'L2', '', 'L3'];

function bitCount(mask: number): number {
  return (mask & 1) + ((mask >> 1) & 1) + ((mask >> 2) & 1);
}

/** Phases the supply offers: 1 (L1) for a single-phase supply, else 7. */
export function supplyMask(s: DropState): number {
  const supply = s.root >= 0 ? (s.nodes[s.root] as unknown as Record<string, unknown>) : undefined;
  return supply?.phases === 1 ? 1 : 7;
}

/**
 * `phaseIgnored` for each single-phase load set to L2 or L3 under a single-phase supply, leaves
 * first (the order the findings have always come in).
 */
export function phaseIgnoredFindings(s: DropState): void {
  if (supplyMask(s) !== 1) return;
  for (let k = s.orderLength - 1; k >= 0; k--) {
    const v = s.order[k] as number;
    if (s.nodeKind[v] !== KIND_LOAD || s.loadMask[v] === 7) continue;
    const el = s.nodes[v] as unknown as Record<string, unknown>;
    if (el.phases === 1 && el.phase !== 'L1')
      s.findings.push({
        code: 'phaseIgnored',
        severity: 'info',
        elementId: s.nodeIds.at(v),
        message: `${nodeLabel(s, v)}: set to phase ${shown(el.phase)} but the supply is single-phase; it is solved on the supply's phase L1.`,
      });
  }
}

/**
 * The phases cable `j` (feeding `v` from `u`) carries, from what hangs below it (`needBelow`,
 * `threeBelow`, filled by the demand pass) and what `u` offers; a conflict marks it unsolvable,
 * with a finding. Sets `cablePhases[j]` and `nodePhases[v]`.
 */
export function assignCablePhases(s: DropState, v: number, j: number, u: number): void {
  const { findings } = s;
  const avail = s.nodePhases[u] as number;
  const phases = s.cablePhasesField[j];
  let mask: number;
  if (phases === 3) {
    mask = 7;
    if (avail !== 7) {
      s.cableBad[j] = 1;
      findings.push({
        code: 'phaseMismatch',
        severity: 'error',
        elementId: s.cableIds.at(j),
        message: `cable ${s.cableIds.at(j)} is three-phase but ${nodeLabel(s, u)} has only phase ${BIT_NAME[avail] ?? '?'}; feed it from a three-phase point or make it single-phase.`,
      });
    }
  } else if (phases === 1) {
    const below = s.needBelow[v] as number;
    const three = s.threeBelow[v] === 1;
    const many = bitCount(below) > 1;
    const lowest = below & -below || avail & -avail || 1;
    // After a mixed-phase finding keep every phase below, so cables further down are not flagged again.
    mask = three ? 7 : many ? below : lowest;
    if (three || many || (lowest & avail) === 0) singlePhaseConflict(s, j, u, below, three, lowest, avail);
  } else {
    s.cableBad[j] = 1;
    mask = avail;
    findings.push({
      code: 'badPhases',
      severity: 'error',
      elementId: s.cableIds.at(j),
      message: `cable ${s.cableIds.at(j)}: phases must be 1 or 3, got ${shown((s.cables[j] as unknown as Record<string, unknown>).phases)}.`,
    });
  }
  s.cablePhases[j] = mask;
  s.nodePhases[v] = mask;
}

function singlePhaseConflict(
  s: DropState,
  j: number,
  u: number,
  below: number,
  three: boolean,
  lowest: number,
  avail: number,
): void {
  const { findings } = s;
  const id = s.cableIds.at(j);
  s.cableBad[j] = 1;
  if (three)
    findings.push({
      code: 'phaseMismatch',
      severity: 'error',
      elementId: id,
      message: `cable ${id} is single-phase but a three-phase load or cable hangs below it; make it three-phase or change what it feeds to single-phase.`,
    });
  if (bitCount(below) > 1) {
    const names = [1, 2, 4].filter((b) => below & b).map((b) => BIT_NAME[b]);
    findings.push({
      code: 'mixedPhases',
      severity: 'error',
      elementId: id,
      message: `cable ${id} is single-phase but loads below it are on phases ${names.join(', ')}; put them on one phase or make the cable three-phase.`,
    });
  }
  if (!three && (lowest & avail) === 0)
    findings.push({
      code: 'phaseMismatch',
      severity: 'error',
      elementId: id,
      message: `cable ${id} serves phase ${BIT_NAME[lowest] ?? '?'} but ${nodeLabel(s, u)} has only phase ${BIT_NAME[avail] ?? '?'}; move its loads to that phase.`,
    });
}
