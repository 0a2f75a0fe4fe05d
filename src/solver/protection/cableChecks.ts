/**
 * Per-segment checks: Ib <= In <= Iz, I2 <= 1.45 Iz, breaking capacity and the protective
 * conductor's adiabatic withstand.
 */
import type { Cable, Device } from '../../model/types.ts';
import { conventionalOperatingMultiple, settingA, type FuseDataSet } from '../../catalogue/devices.ts';
import { cpcK, tableMinimumCpcMm2 } from '../../catalogue/kValues.ts';
import type { Working } from '../results.ts';
import type { Check, CheckKey } from './protectionResults.ts';
import type { CapacityOk } from './capacity.ts';
import { operatingTimeS } from './disconnection.ts';
import { fmt, working } from './working.ts';
import { cableLabel } from '../elementLabel.ts';

// Messages of checks that fail or cannot be assessed: shared with the fast pass, which builds
// findings without building the checks.
export const ibInFailMessage = (src: string, ibA: number, inA: number): string =>
  `${src}: Ib ${fmt(ibA)} A exceeds In ${inA} A; choose a larger device`;
export const capacityErrorMessage = (src: string, error: string): string => `${src}: ${error}`;
export const inIzFailMessage = (src: string, label: string, base: number, izA: number): string =>
  `${src}: ${label} ${fmt(base)} A exceeds Iz ${fmt(izA)} A; increase the size or improve the installation conditions`;
export const i2FailMessage = (src: string, i2: number, lim: number): string =>
  `${src}: I2 ${fmt(i2)} A exceeds 1.45 Iz ${fmt(lim)} A; use a larger cable or a smaller device`;
export const breakingFailMessage = (label: string, kA: number, where: string, breakingKa: number): string =>
  `${label}: prospective fault current ${fmt(kA)} kA at ${where} exceeds the device's ${breakingKa} kA; choose a device with a higher breaking capacity`;
export const CPC_WHY_SLOW = 'the device does not operate within 5 s at this fault current';
export const CPC_WHY_NO_DEVICE = 'no protective device given';
export const cpcNotAssessedMessage = (label: string, why: string): string =>
  `${label}: adiabatic check not possible: ${why}`;
export const cpcFailMessage = (label: string, cpcMm2: number, sMin: number): string =>
  `${label}: cpc ${fmt(cpcMm2)} mm² is below the ${fmt(sMin)} mm² the adiabatic equation needs; increase the cpc`;
/** Where a breaking-capacity check applies, for its message and working. */
export const sendingEnd = (label: string): string => `the sending end of ${label}`;

export function check(
  key: CheckKey,
  title: string,
  pass: boolean | null,
  value: number | null,
  limit: number | null,
  unit: string,
  message: string,
  w: Working,
): Check {
  return { key, title, pass, value, limit, unit, message, working: w };
}

/** Ib <= In, In <= Iz (Ib <= Iz where no device is given) and I2 <= 1.45 Iz. */
export function capacityChecks(
  cable: Cable,
  ibA: number,
  device: Device | null,
  cap: CapacityOk | { error: string },
): Check[] {
  const out: Check[] = [];
  const src = cableLabel(cable);
  const inA = device ? settingA(device) : null;
  if (device && inA !== null) {
    out.push(
      check(
        'ibIn',
        'Design current within device rating (Ib <= In)',
        ibA <= inA,
        ibA,
        inA,
        'A',
        ibA <= inA ? `Ib ${fmt(ibA)} A <= In ${inA} A` : ibInFailMessage(src, ibA, inA),
        working(
          'ibIn',
          'Ib <= In',
          'Ib <= In',
          [
            ['Ib', ibA, 'A', 'drop solver design current'],
            ['In', inA, 'A', device.type === 'mccb' ? 'Ir = irMultiple x rating' : 'device.ratingA'],
          ],
          ibA <= inA ? 'pass' : 'fail',
          '',
        ),
      ),
    );
  }
  if ('error' in cap) {
    out.push(
      check(
        'inIz',
        'Device rating within cable capacity (In <= Iz)',
        null,
        null,
        null,
        'A',
        capacityErrorMessage(src, cap.error),
        working('inIz', 'In <= Iz', 'In <= Iz', [], 'not assessed', '', cap.error),
      ),
    );
    return out;
  }
  const base = inA ?? ibA;
  const label = inA === null ? 'Ib' : 'In';
  const okIz = base <= cap.izA;
  out.push(
    check(
      'inIz',
      `${label} within cable capacity (${label} <= Iz)`,
      okIz,
      base,
      cap.izA,
      'A',
      okIz ? `${label} ${fmt(base)} A <= Iz ${fmt(cap.izA)} A` : inIzFailMessage(src, label, base, cap.izA),
      working(
        'inIz',
        `${label} <= Iz`,
        `${label} <= Iz = It x Ca x Cg x Ci`,
        [
          [label, base, 'A', inA === null ? 'design current (no device given)' : 'device setting'],
          ['Iz', cap.izA, 'A', 'see the Iz working'],
        ],
        okIz ? 'pass' : 'fail',
        '',
        inA === null ? 'no protective device given: Ib is compared instead of In' : undefined,
      ),
    ),
  );
  if (device && inA !== null) {
    const m = conventionalOperatingMultiple(device.type, inA);
    const i2 = m * inA;
    const lim = 1.45 * cap.izA;
    out.push(
      check(
        'i2',
        'Overload operating current (I2 <= 1.45 Iz)',
        i2 <= lim,
        i2,
        lim,
        'A',
        i2 <= lim ? `I2 ${fmt(i2)} A <= 1.45 Iz ${fmt(lim)} A` : i2FailMessage(src, i2, lim),
        working(
          'i2',
          'I2 <= 1.45 Iz',
          'I2 = m x In <= 1.45 x Iz',
          [
            [
              'm',
              m,
              '',
              device.type === 'fuseGG'
                ? 'IEC 60269-1 conventional fusing current'
                : device.type === 'mccb'
                  ? 'IEC 60947-2 conventional tripping current'
                  : 'IEC 60898-1 conventional tripping current',
            ],
            ['In', inA, 'A', 'device setting'],
            ['Iz', cap.izA, 'A', 'see the Iz working'],
          ],
          i2,
          'A',
        ),
      ),
    );
  }
  return out;
}

/** Breaking capacity of the device against the largest prospective fault current at its terminals. */
export function breakingCheck(cable: Cable, device: Device, pfcA: number, where: string): Check {
  const kA = pfcA / 1000;
  const ok = device.breakingKa >= kA;
  return check(
    'breaking',
    'Breaking capacity >= prospective fault current',
    ok,
    kA,
    device.breakingKa,
    'kA',
    ok
      ? `${fmt(kA)} kA <= ${device.breakingKa} kA`
      : breakingFailMessage(cableLabel(cable), kA, where, device.breakingKa),
    working(
      'breaking',
      'Breaking capacity',
      'Ipf(max) <= Icn',
      [
        ['Ipf', kA, 'kA', `prospective fault current at ${where}`],
        ['Icn', device.breakingKa, 'kA', 'device.breakingKa'],
      ],
      ok ? 'pass' : 'fail',
      '',
    ),
  );
}

/**
 * Smallest conductor that withstands a fault adiabatically: S = sqrt(I² t) / k.
 * @example adiabaticMinimumMm2(3000, 0.4, 115) // 16.50
 */
export function adiabaticMinimumMm2(currentA: number, timeS: number, k: number): number {
  return Math.sqrt(currentA * currentA * timeS) / k;
}

/**
 * Adiabatic check on the cpc, S >= sqrt(I²t)/k (IEC 60364-5-54 543.1.2), at the earth fault current
 * at the far end of the segment, where it is least and the disconnection slowest. A cpc chosen by the
 * table method (Table 54.7, same material as the line) passes without calculation.
 */
export function cpcCheck(
  cable: Cable,
  device: Device | null,
  earthFaultA: number,
  fuses: FuseDataSet,
): Check {
  const { k, source } = cpcK(cable.cpc, cable.insulation);
  const cpcMm2 = cable.cpc.sizeMm2 * Math.max(1, cable.parallel);
  const tableMin = tableMinimumCpcMm2(cable.sizeMm2);
  const byTable =
    cable.cpc.kind !== 'armour' && cable.cpc.material === cable.material && cable.cpc.sizeMm2 >= tableMin;
  const t = device ? operatingTimeS(device, earthFaultA, fuses) : null;
  const title = 'Protective conductor withstand (adiabatic)';
  if (t === null) {
    const why = device ? CPC_WHY_SLOW : CPC_WHY_NO_DEVICE;
    return check(
      'cpc',
      title,
      byTable ? true : null,
      null,
      cpcMm2,
      'mm²',
      byTable
        ? `cpc ${cable.cpc.sizeMm2} mm² meets the table minimum ${tableMin} mm²`
        : cpcNotAssessedMessage(cableLabel(cable), why),
      working(
        'cpc',
        title,
        'S >= sqrt(I² t) / k',
        [['I', earthFaultA, 'A', 'earth fault current at the far end']],
        'not assessed',
        '',
        why,
      ),
    );
  }
  const sMin = adiabaticMinimumMm2(earthFaultA, t, k);
  const ok = cpcMm2 >= sMin || byTable;
  return check(
    'cpc',
    title,
    ok,
    sMin,
    cpcMm2,
    'mm²',
    ok
      ? `needs ${fmt(sMin)} mm², has ${fmt(cpcMm2)} mm²${cpcMm2 < sMin ? ' (table method)' : ''}`
      : cpcFailMessage(cableLabel(cable), cpcMm2, sMin),
    working(
      'cpc',
      title,
      'S = sqrt(I² t) / k',
      [
        ['I', earthFaultA, 'A', 'earth fault current Cmin x U0 / Zs at the far end'],
        ['t', t, 's', 'device operating time at I'],
        ['k', k, '', source],
        ['table minimum', tableMin, 'mm²', 'IEC 60364-5-54 Table 54.2 / BS 7671 Table 54.7'],
      ],
      sMin,
      'mm²',
      t === 0.1
        ? "t = 0.1 s is a conservative bound; the manufacturer's let-through I²t is usually lower"
        : undefined,
    ),
  );
}
