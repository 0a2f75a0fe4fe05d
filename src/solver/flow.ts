/**
 * The numeric passes: demand phasors summed from the loads up, the phasor drop of every segment,
 * and the voltages and cumulative drops from the origin down.
 *
 * Drop of a segment on phase p: ΔV_p = Z (I_p + I_N), with Z the series impedance of one
 * conductor and I_N the phasor sum of the phase currents returning in the neutral. For a
 * single-phase cable I_N = I_p, giving the loop 2 Z I; for a balanced three-phase cable I_N = 0,
 * giving Z I per phase (the √3 line-to-line method divided by √3); an unbalanced one falls out of
 * the same formula. The drop reported is ΔV projected on the phase's nominal voltage direction,
 * which for a single load is exactly I (r cos φ + x sin φ); projections add along a path, so the
 * cumulative drop is their sum and the voltage shown is U0 minus it.
 */
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_LOAD, PHASE_COS, PHASE_SIN, cableRow } from './dropState.ts';
import type { ConductorRow } from '../catalogue/catalogueSet.ts';
import { assignCablePhases, supplyMask } from './phases.ts';
import { setLoadCurrent } from './validateElements.ts';
import { FindingTail } from './findingOrder.ts';
import { hypot } from './hypot.ts';

/**
 * The upward pass, leaves first: each reached load's phases and current phasors, the phases
 * needed below every node (for phases.ts), and the demand summed into every node, × board
 * diversity.
 */
export function sumDemand(s: DropState): void {
  const { iRe, iIm, walk, nodeKind, parentCable, cableFrom, loadMask, nodeCheck, loadDeclared } = s;
  const { needBelow, threeBelow, cablePhasesField, diversity } = s;
  const root = s.root;
  const single = supplyMask(s) === 1;
  for (let k = s.orderLength - 1; k >= 0; k--) {
    const v = walk[k] as number;
    const b = v * 3;
    const kind = nodeKind[v];
    if (kind === KIND_LOAD) {
      const declared = loadDeclared[v] as number;
      const mask = single && declared !== 7 ? 1 : declared;
      loadMask[v] = mask;
      needBelow[v] = mask;
      if (mask === 7) threeBelow[v] = 1;
      if (!nodeCheck[v]) setLoadCurrent(s, v, mask);
    } else if (kind === KIND_BOARD) {
      const d = diversity[v] as number;
      if (d !== 1) {
        for (let p = 0; p < 3; p++) {
          iRe[b + p] = (iRe[b + p] as number) * d;
          iIm[b + p] = (iIm[b + p] as number) * d;
        }
      }
    }
    const j = parentCable[v] as number;
    if (v === root || j < 0) continue;
    const u = cableFrom[j] as number;
    needBelow[u] = (needBelow[u] as number) | (needBelow[v] as number);
    if (threeBelow[v] || cablePhasesField[j] === 3) threeBelow[u] = 1;
    const ub = u * 3;
    iRe[ub] = (iRe[ub] as number) + (iRe[b] as number);
    iIm[ub] = (iIm[ub] as number) + (iIm[b] as number);
    iRe[ub + 1] = (iRe[ub + 1] as number) + (iRe[b + 1] as number);
    iIm[ub + 1] = (iIm[ub + 1] as number) + (iIm[b + 1] as number);
    iRe[ub + 2] = (iRe[ub + 2] as number) + (iRe[b + 2] as number);
    iIm[ub + 2] = (iIm[ub + 2] as number) + (iIm[b + 2] as number);
  }
}

/** Device rating In of a cable when the In basis applies, else 0. */
export function deviceRatingA(s: DropState, j: number): number {
  if (!s.useDeviceRating) return 0;
  const device = (s.cables[j] as { device?: { ratingA?: unknown } }).device;
  const rating = device && typeof device === 'object' ? device.ratingA : undefined;
  return typeof rating === 'number' && Number.isFinite(rating) && rating > 0 ? rating : 0;
}

/**
 * Magnitude of the worst phase current on a cable, A.
 * @example cableIbA(state, 3) // 24.1
 */
export function cableIbA(s: DropState, j: number): number {
  const v = s.cableTo[j] as number;
  const mask = s.cablePhases[j] as number;
  let ib = 0;
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    const m = hypot(s.iRe[v * 3 + p] as number, s.iIm[v * 3 + p] as number);
    if (m > ib) ib = m;
  }
  return ib;
}

/**
 * Drop of the cable `j` feeding node `v` from `u`, per phase carried. With `phasors` it also sets
 * the voltage phasor at `v`: the one at `u` minus the phasor drop (the caller has copied `u`'s,
 * which phases not carried keep). Running it again gives the same figures.
 */
function segmentDrop(s: DropState, v: number, j: number, u: number, phasors: boolean): void {
  const { iRe, iIm } = s;
  const mask = s.cablePhases[j] as number;
  const b = v * 3;
  // The currents the drop is computed with: demand, or scaled so the worst phase is In.
  let scale = 1;
  let atRating = 0;
  const rating = deviceRatingA(s, j);
  if (rating > 0) {
    const ib = cableIbA(s, j);
    if (ib > 0) scale = rating / ib;
    else atRating = rating;
  }
  if (s.useDeviceRating) s.dropIScale[j] = atRating > 0 ? 0 : scale;
  let jr0 = 0;
  let ji0 = 0;
  let jr1 = 0;
  let ji1 = 0;
  let jr2 = 0;
  let ji2 = 0;
  if (atRating > 0) {
    if (mask & 1) jr0 = atRating;
    if (mask & 2) {
      jr1 = atRating * (PHASE_COS[1] as number);
      ji1 = atRating * (PHASE_SIN[1] as number);
    }
    if (mask & 4) {
      jr2 = atRating * (PHASE_COS[2] as number);
      ji2 = atRating * (PHASE_SIN[2] as number);
    }
  } else {
    if (mask & 1) {
      jr0 = (iRe[b] as number) * scale;
      ji0 = (iIm[b] as number) * scale;
    }
    if (mask & 2) {
      jr1 = (iRe[b + 1] as number) * scale;
      ji1 = (iIm[b + 1] as number) * scale;
    }
    if (mask & 4) {
      jr2 = (iRe[b + 2] as number) * scale;
      ji2 = (iIm[b + 2] as number) * scale;
    }
  }
  const nr = jr0 + jr1 + jr2;
  const ni = ji0 + ji1 + ji2;
  s.nRe[j] = nr;
  s.nIm[j] = ni;
  // Series impedance of one conductor of the whole segment, parallel cables combined (the segment
  // is solvable, so its row, length and parallel count are valid).
  const row = cableRow(s, j) as ConductorRow;
  // A load spread evenly along its cable: the drop at the far end is that of the whole current
  // over half the length (the uniformly distributed load; common practice).
  const lengthM = (s.cableLengthM[j] as number) * (s.loadSpread[v] ? 0.5 : 1);
  const p = s.cableParallel[j] as number;
  const scaleX = row.frequencyHz ? s.frequencyHz / row.frequencyHz : 1;
  const zr = (row.rOhmPerM * lengthM) / p;
  const zx = (row.xOhmPerM * scaleX * lengthM) / p;
  const cb = j * 3;
  const ub = u * 3;
  if (mask & 1) drop(s, cb, b, ub, 0, zr, zx, jr0 + nr, ji0 + ni, phasors);
  if (mask & 2) drop(s, cb, b, ub, 1, zr, zx, jr1 + nr, ji1 + ni, phasors);
  if (mask & 4) drop(s, cb, b, ub, 2, zr, zx, jr2 + nr, ji2 + ni, phasors);
}

function drop(
  s: DropState,
  cb: number,
  b: number,
  ub: number,
  p: number,
  zr: number,
  zx: number,
  jr: number,
  ji: number,
  phasors: boolean,
): void {
  const re = zr * jr - zx * ji;
  const im = zr * ji + zx * jr;
  if (phasors) {
    s.vRe[b + p] = (s.vRe[ub + p] as number) - re;
    s.vIm[b + p] = (s.vIm[ub + p] as number) - im;
  }
  s.dropProj[cb + p] = re * (PHASE_COS[p] as number) + im * (PHASE_SIN[p] as number);
}

/**
 * The node voltage phasors (U0 ∠ phase angle minus the phasor drops down the path), worked out for
 * the whole tree the first time a result asks for one: only the nodal check and a node's
 * `voltagePhasorV` read them, so a solve does not carry them. The same walk and the same segment
 * drops as the downward pass, so the same figures.
 */
export function voltagePhasors(s: DropState): { vRe: Float64Array; vIm: Float64Array } {
  if (s.vRe.length === 0 && s.nodeCount > 0) {
    const vRe = (s.vRe = new Float64Array(s.nodeCount * 3));
    const vIm = (s.vIm = new Float64Array(s.nodeCount * 3));
    if (s.root >= 0) {
      const rb = s.root * 3;
      for (let p = 0; p < 3; p++) {
        vRe[rb + p] = s.u0V * (PHASE_COS[p] as number);
        vIm[rb + p] = s.u0V * (PHASE_SIN[p] as number);
      }
      const { walk, parentCable, cableFrom, cableBad } = s;
      for (let k = 1; k < s.orderLength; k++) {
        const v = walk[k] as number;
        const j = parentCable[v] as number;
        const u = cableFrom[j] as number;
        const b = v * 3;
        const ub = u * 3;
        // A phase the segment does not carry (or a segment not solved) drops nothing.
        for (let p = 0; p < 3; p++) {
          vRe[b + p] = vRe[ub + p] as number;
          vIm[b + p] = vIm[ub + p] as number;
        }
        if (!cableBad[j]) segmentDrop(s, v, j, u, true);
      }
    }
  }
  return { vRe: s.vRe, vIm: s.vIm };
}

/**
 * The downward pass, parents first: each cable's phases (phases.ts), its segment drop, and the
 * cumulative drop, voltage, route length and branch base at every node.
 */
export function accumulate(s: DropState): void {
  const { cum, dropProj, branchAt, walk, parentCable, cableFrom } = s;
  const { nodeKind, cableBad, incomplete, pathLengthM, cableLengthM } = s;
  if (s.root < 0) return;
  s.nodePhases[s.root] = supplyMask(s);
  // The branch budget counts from the last board upstream, or from the origin (cumulative 0).
  branchAt[s.root] = s.root;
  const tail = new FindingTail(s.findings);
  for (let k = 1; k < s.orderLength; k++) {
    const v = walk[k] as number;
    const j = parentCable[v] as number;
    const u = cableFrom[j] as number;
    assignCablePhases(s, v, j, u);
    tail.tag(v);
    const b = v * 3;
    const ub = u * 3;
    const cb = j * 3;
    const bad = cableBad[j] as number;
    if (!bad) segmentDrop(s, v, j, u, false);
    const c0 = (cum[ub] as number) + (dropProj[cb] as number);
    const c1 = (cum[ub + 1] as number) + (dropProj[cb + 1] as number);
    const c2 = (cum[ub + 2] as number) + (dropProj[cb + 2] as number);
    cum[b] = c0;
    cum[b + 1] = c1;
    cum[b + 2] = c2;
    branchAt[v] = nodeKind[v] === KIND_BOARD ? v : (branchAt[u] as number);
    incomplete[v] = (incomplete[u] as number) | bad;
    pathLengthM[v] = (pathLengthM[u] as number) + (cableLengthM[j] as number);
  }
  tail.settle(s, false);
}
