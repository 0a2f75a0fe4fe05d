/**
 * Which phases each cable and node carries. A single-phase cable takes the phase of the loads
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

export function assignPhases(s: DropState): void {
  const { findings } = s;
  const n = s.nodeCount;
  const need = new Uint8Array(n);
  const has3 = new Uint8Array(n);
  const supply = s.root >= 0 ? (s.nodes[s.root] as unknown as Record<string, unknown>) : undefined;
  const supplyMask = supply?.phases === 1 ? 1 : 7;

  for (let k = s.orderLength - 1; k >= 0; k--) {
    const v = s.order[k] as number;
    if (s.nodeKind[v] === KIND_LOAD) {
      const mask = s.loadMask[v] as number;
      need[v] = mask;
      if (mask === 7) has3[v] = 1;
      else if (supplyMask === 1) {
        const el = s.nodes[v] as unknown as Record<string, unknown>;
        if (el.phases === 1 && el.phase !== 'L1')
          findings.push({
            code: 'phaseIgnored',
            severity: 'info',
            elementId: s.nodeIds[v] as string,
            message: `${nodeLabel(s, v)}: set to phase ${shown(el.phase)} but the supply is single-phase; it is solved on the supply's phase L1.`,
          });
      }
    }
    const pc = s.parentCable[v] as number;
    if (v === s.root || pc < 0) continue;
    const u = s.cableFrom[pc] as number;
    need[u] = (need[u] as number) | (need[v] as number);
    const cablePhases = (s.cables[pc] as unknown as Record<string, unknown>).phases;
    if (has3[v] || cablePhases === 3) has3[u] = 1;
  }

  if (s.root >= 0) s.nodePhases[s.root] = supplyMask;
  for (let k = 1; k < s.orderLength; k++) {
    const v = s.order[k] as number;
    const j = s.parentCable[v] as number;
    const u = s.cableFrom[j] as number;
    const avail = s.nodePhases[u] as number;
    const id = s.cableIds[j] as string;
    const phases = (s.cables[j] as unknown as Record<string, unknown>).phases;
    let mask: number;
    if (phases === 3) {
      mask = 7;
      if (avail !== 7) {
        s.cableBad[j] = 1;
        findings.push({
          code: 'phaseMismatch',
          severity: 'error',
          elementId: id,
          message: `cable ${id} is three-phase but ${nodeLabel(s, u)} has only phase ${BIT_NAME[avail] ?? '?'}; feed it from a three-phase point or make it single-phase.`,
        });
      }
    } else if (phases === 1) {
      const below = need[v] as number;
      if (has3[v]) {
        s.cableBad[j] = 1;
        findings.push({
          code: 'phaseMismatch',
          severity: 'error',
          elementId: id,
          message: `cable ${id} is single-phase but a three-phase load or cable hangs below it; make it three-phase or change what it feeds to single-phase.`,
        });
      }
      if (bitCount(below) > 1) {
        s.cableBad[j] = 1;
        const names = [1, 2, 4].filter((b) => below & b).map((b) => BIT_NAME[b]);
        findings.push({
          code: 'mixedPhases',
          severity: 'error',
          elementId: id,
          message: `cable ${id} is single-phase but loads below it are on phases ${names.join(', ')}; put them on one phase or make the cable three-phase.`,
        });
      }
      const lowest = below & -below || avail & -avail || 1;
      // After a mixed-phase finding keep every phase below, so cables further down are not flagged again.
      mask = has3[v] ? 7 : bitCount(below) > 1 ? below : lowest;
      if (!has3[v] && (lowest & avail) === 0) {
        s.cableBad[j] = 1;
        findings.push({
          code: 'phaseMismatch',
          severity: 'error',
          elementId: id,
          message: `cable ${id} serves phase ${BIT_NAME[lowest] ?? '?'} but ${nodeLabel(s, u)} has only phase ${BIT_NAME[avail] ?? '?'}; move its loads to that phase.`,
        });
      }
    } else {
      s.cableBad[j] = 1;
      mask = avail;
      findings.push({
        code: 'badPhases',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: phases must be 1 or 3, got ${shown(phases)}.`,
      });
    }
    s.cablePhases[j] = mask;
    s.nodePhases[v] = mask;
  }
}
