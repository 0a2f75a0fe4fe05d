/**
 * Automatic disconnection: the time a circuit must disconnect in, the current that achieves it for a
 * device, the resulting maximum Zs, and the operating time at a given fault current.
 */
import type { Device, Earthing } from '../../model/types.ts';
import {
  CMIN,
  INSTANTANEOUS_MULTIPLE,
  settingA,
  type FuseCurveRow,
  type FuseDataSet,
} from '../../catalogue/devices.ts';

/**
 * Maximum disconnection time, seconds (IEC 60364-4-41 Table 41.1 / BS 7671 Table 41.1 for a.c.;
 * 411.3.2.3 and 411.3.2.4 for distribution circuits, check-values §4).
 * Final circuits up to 63 A take the short time; larger finals and distribution circuits 5 s (TN) or 1 s (TT).
 * @example requiredDisconnectionS('TN-C-S', 'final', 32, 230) // 0.4
 */
export function requiredDisconnectionS(
  earthing: Earthing,
  circuit: 'final' | 'distribution',
  ratingA: number,
  u0V: number,
): number {
  const tt = earthing === 'TT';
  if (circuit === 'distribution' || ratingA > 63) return tt ? 1 : 5;
  if (u0V <= 230) return tt ? 0.2 : 0.4;
  if (u0V <= 400) return tt ? 0.07 : 0.2;
  return tt ? 0.04 : 0.1;
}

export interface OperatingCurrent {
  iaA: number;
  basis: string;
}

/** log-log interpolation between the 5 s and 0.4 s points of a fuse row. */
function fuseCurrentForTime(ia04: number, ia5: number, tS: number): number {
  const slope = Math.log(ia04 / ia5) / Math.log(0.4 / 5);
  return ia5 * Math.pow(tS / 5, slope);
}

const ROWS = new WeakMap<FuseDataSet, Map<number, FuseCurveRow>>();

/** The data set's row for a rating (the first one listed), looked up in a map built once per set. */
export function fuseRow(fuses: FuseDataSet, ratingA: number): FuseCurveRow | undefined {
  let rows = ROWS.get(fuses);
  if (!rows) {
    rows = new Map();
    for (const r of fuses.rows) if (!rows.has(r.ratingA)) rows.set(r.ratingA, r);
    ROWS.set(fuses, rows);
  }
  return rows.get(ratingA);
}

/**
 * Ia as a bare number, NaN where `operatingCurrent` gives a reason instead (for the numeric pass).
 * @example operatingCurrentA({ type: 'mcb', curve: 'B', ratingA: 32, breakingKa: 6 }, 0.4, fuses) // 160
 */
export function operatingCurrentA(device: Device, requiredS: number, fuses: FuseDataSet): number {
  if (device.type === 'mcb' || device.type === 'rcbo')
    return INSTANTANEOUS_MULTIPLE[device.curve ?? 'B'] * device.ratingA;
  if (device.type === 'mccb') return (device.imMultiple ?? 10) * settingA(device);
  const row = fuseRow(fuses, device.ratingA);
  // Number.NaN rather than the global NaN: V8 then keeps the figure unboxed.
  if (!row) return Number.NaN;
  if (requiredS === 5) return row.ia5sA;
  if (requiredS === 0.4) return row.ia04sA;
  if (requiredS > 0.4 && requiredS < 5) return fuseCurrentForTime(row.ia04sA, row.ia5sA, requiredS);
  return Number.NaN;
}

/**
 * The current Ia that makes the device operate within the required time, or a reason why it is not
 * known. Breakers use their instantaneous multiple (which also meets 5 s); an mccb Im x Ir; a fuse
 * its data set, interpolated log-log between the 0.4 s and 5 s points.
 */
export function operatingCurrent(
  device: Device,
  requiredS: number,
  fuses: FuseDataSet,
): OperatingCurrent | { error: string } {
  if (device.type === 'mcb' || device.type === 'rcbo') {
    const curve = device.curve ?? 'B';
    const m = INSTANTANEOUS_MULTIPLE[curve];
    return {
      iaA: m * device.ratingA,
      basis: `type ${curve}: Ia = ${m} x In (instantaneous trip, IEC 60898-1)`,
    };
  }
  if (device.type === 'mccb') {
    const ir = settingA(device);
    const im = device.imMultiple ?? 10;
    return {
      iaA: im * ir,
      basis: `mccb: Ia = Im x Ir = ${im} x ${ir} A${device.imMultiple === undefined ? ' (Im not given, 10 x Ir assumed)' : ''}`,
    };
  }
  const row = fuseRow(fuses, device.ratingA);
  if (!row) return { error: `the fuse data set "${fuses.title}" has no ${device.ratingA} A row` };
  if (requiredS === 5) return { iaA: row.ia5sA, basis: `${fuses.title}: current for 5 s` };
  if (requiredS === 0.4) return { iaA: row.ia04sA, basis: `${fuses.title}: current for 0.4 s` };
  if (requiredS > 0.4 && requiredS < 5) {
    return {
      iaA: fuseCurrentForTime(row.ia04sA, row.ia5sA, requiredS),
      basis: `${fuses.title}: interpolated log-log between 0.4 s and 5 s`,
    };
  }
  return { error: `the fuse data set gives no operating current for ${requiredS} s` };
}

/**
 * Maximum loop impedance for disconnection: Zs max = Cmin x U0 / Ia (BS 7671 Reg 411.4.4).
 * @example maxZsOhm(160, 230) // 1.3656 (B32)
 */
export function maxZsOhm(iaA: number, u0V: number): number {
  return (CMIN * u0V) / iaA;
}

/**
 * Time the device takes to clear a fault current, seconds, or null when it is not known to operate
 * within 5 s. At or above the instantaneous current a breaker is taken to clear in 0.1 s, a
 * conservative bound in place of the manufacturer's let-through energy (common practice). A fuse
 * follows its data set log-log and is floored at 0.1 s for the same reason.
 */
export function operatingTimeS(device: Device, currentA: number, fuses: FuseDataSet): number | null {
  if (device.type === 'fuseGG') {
    const row = fuseRow(fuses, device.ratingA);
    if (!row || currentA < row.ia5sA) return null;
    const slope = Math.log(0.4 / 5) / Math.log(row.ia04sA / row.ia5sA);
    return Math.max(0.1, 5 * Math.pow(currentA / row.ia5sA, slope));
  }
  const ia = operatingCurrentA(device, 5, fuses);
  // NaN means "no Ia known" only for a device read as a fuse (a type this module does not know).
  const breaker = device.type === 'mcb' || device.type === 'rcbo' || device.type === 'mccb';
  if ((!breaker && Number.isNaN(ia)) || currentA < ia) return null;
  return 0.1;
}
