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
import { KIND_BOARD, PHASE_COS, PHASE_SIN } from './dropState.ts';

export function sumDemand(s: DropState): void {
  const { iRe, iIm, order } = s;
  // Load phasors were set by validateNodes; here they are summed from the leaves up.
  for (let k = s.orderLength - 1; k >= 0; k--) {
    const v = order[k] as number;
    const b = v * 3;
    const kind = s.nodeKind[v];
    if (kind === KIND_BOARD) {
      const d = s.diversity[v] as number;
      if (d !== 1) {
        for (let p = 0; p < 3; p++) {
          iRe[b + p] = (iRe[b + p] as number) * d;
          iIm[b + p] = (iIm[b + p] as number) * d;
        }
      }
    }
    const j = s.parentCable[v] as number;
    if (v === s.root || j < 0) continue;
    const ub = (s.cableFrom[j] as number) * 3;
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
    const m = Math.hypot(s.iRe[v * 3 + p] as number, s.iIm[v * 3 + p] as number);
    if (m > ib) ib = m;
  }
  return ib;
}

/** Drop of the cable `j` feeding node `v`, per phase carried. */
function segmentDrop(s: DropState, v: number, j: number): void {
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
  s.dropIScale[j] = atRating > 0 ? 0 : scale;
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
  const zr = s.cableZr[j] as number;
  const zx = s.cableZx[j] as number;
  const cb = j * 3;
  if (mask & 1) drop(s, cb, 0, zr, zx, jr0 + nr, ji0 + ni);
  if (mask & 2) drop(s, cb, 1, zr, zx, jr1 + nr, ji1 + ni);
  if (mask & 4) drop(s, cb, 2, zr, zx, jr2 + nr, ji2 + ni);
}

function drop(s: DropState, cb: number, p: number, zr: number, zx: number, jr: number, ji: number): void {
  const re = zr * jr - zx * ji;
  const im = zr * ji + zx * jr;
  s.dvRe[cb + p] = re;
  s.dvIm[cb + p] = im;
  s.dropProj[cb + p] = re * (PHASE_COS[p] as number) + im * (PHASE_SIN[p] as number);
}

export function accumulate(s: DropState): void {
  const { cum, vRe, vIm, dvRe, dvIm, dropProj, branchBase } = s;
  if (s.root < 0) return;
  const rb = s.root * 3;
  for (let p = 0; p < 3; p++) {
    vRe[rb + p] = s.u0V * (PHASE_COS[p] as number);
    vIm[rb + p] = s.u0V * (PHASE_SIN[p] as number);
  }
  for (let k = 1; k < s.orderLength; k++) {
    const v = s.order[k] as number;
    const j = s.parentCable[v] as number;
    const u = s.cableFrom[j] as number;
    const b = v * 3;
    const ub = u * 3;
    const cb = j * 3;
    const board = s.nodeKind[v] === KIND_BOARD;
    if (!s.cableBad[j]) segmentDrop(s, v, j);
    for (let p = 0; p < 3; p++) {
      const c = (cum[ub + p] as number) + (dropProj[cb + p] as number);
      cum[b + p] = c;
      vRe[b + p] = (vRe[ub + p] as number) - (dvRe[cb + p] as number);
      vIm[b + p] = (vIm[ub + p] as number) - (dvIm[cb + p] as number);
      branchBase[b + p] = board ? c : (branchBase[ub + p] as number);
    }
    s.incomplete[v] = (s.incomplete[u] as number) | (s.cableBad[j] as number);
    s.pathLengthM[v] = (s.pathLengthM[u] as number) + (s.cableLengthM[j] as number);
  }
}
