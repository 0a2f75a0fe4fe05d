/**
 * The disconnection check at a node: Zs against the maximum for the device that protects the circuit
 * feeding it, with an RCD as the alternative means (Zs x IΔn <= 50 V, or RA x IΔn <= 50 V on TT).
 */
import type { Device, Supply } from '../../model/types.ts';
import { TEST_ZS_FACTOR, type FuseDataSet } from '../../catalogue/devices.ts';
import type { Check } from './protectionResults.ts';
import { check } from './cableChecks.ts';
import { maxZsOhm, operatingCurrent } from './disconnection.ts';
import { fmt, working } from './working.ts';

// Messages of checks that fail or cannot be assessed: shared with the fast pass, which builds
// findings without building the checks.
export const zsNoDeviceMessage = (nodeName: string): string =>
  `${nodeName}: no protective device on the circuit feeding it; add one to the cable's sending end`;
export const zsIaErrorMessage = (nodeName: string, error: string): string => `${nodeName}: ${error}`;
export const zsFailMessage = (nodeName: string, zsOhm: number, zsMax: number, requiredS: number): string =>
  `${nodeName}: Zs ${fmt(zsOhm)} ohm exceeds ${fmt(zsMax)} ohm for disconnection in ${requiredS} s; increase the cable or cpc size, shorten the run, or fit an RCD`;
export const ttNoRcdMessage = (nodeName: string): string =>
  `${nodeName}: a TT installation relies on an RCD; fit one (device.rcd) to the circuit`;
export const ttNoRaMessage = (nodeName: string): string =>
  `${nodeName}: supply.raOhm (earth electrode resistance) is not given; enter it to check RA x IΔn`;
export const ttFailMessage = (nodeName: string, v: number): string =>
  `${nodeName}: RA x IΔn = ${fmt(v)} V exceeds 50 V; lower RA or use a more sensitive RCD`;

export interface ZsOutcome {
  zsMaxOhm: number | null;
  testZsMaxOhm: number | null;
  checks: Check[];
}

export function zsChecks(
  nodeName: string,
  zsOhm: number,
  device: Device | null,
  requiredS: number,
  supply: Supply,
  fuses: FuseDataSet,
): ZsOutcome {
  const title = `Earth fault loop impedance (disconnection in ${requiredS} s)`;
  if (!device) {
    return {
      zsMaxOhm: null,
      testZsMaxOhm: null,
      checks: [
        check(
          'zs',
          title,
          null,
          zsOhm,
          null,
          'ohm',
          zsNoDeviceMessage(nodeName),
          working(
            'zs',
            title,
            'Zs <= Cmin x U0 / Ia',
            [['Zs', zsOhm, 'ohm', 'Ze + sum of R1 + R2']],
            'not assessed',
            '',
          ),
        ),
      ],
    };
  }
  const ia = operatingCurrent(device, requiredS, fuses);
  const checks: Check[] = [];
  const rcd = device.rcd;
  const rcdLimit = rcd && rcd.idnMa > 0 ? 50 / (rcd.idnMa / 1000) : null;
  let zsMax: number | null = null;
  if ('error' in ia) {
    checks.push(
      check(
        'zs',
        title,
        rcdLimit !== null ? zsOhm <= rcdLimit : null,
        zsOhm,
        rcdLimit,
        'ohm',
        zsIaErrorMessage(nodeName, ia.error),
        working(
          'zs',
          title,
          'Zs <= Cmin x U0 / Ia',
          [['Zs', zsOhm, 'ohm', 'Ze + sum of R1 + R2']],
          'not assessed',
          '',
          ia.error,
        ),
      ),
    );
  } else {
    zsMax = maxZsOhm(ia.iaA, supply.u0V);
    const byDevice = zsOhm <= zsMax;
    const byRcd = !byDevice && rcdLimit !== null && zsOhm <= rcdLimit;
    const ok = byDevice || byRcd;
    checks.push(
      check(
        'zs',
        title,
        ok,
        zsOhm,
        byRcd ? rcdLimit : zsMax,
        'ohm',
        byDevice
          ? `Zs ${fmt(zsOhm)} ohm <= ${fmt(zsMax)} ohm`
          : byRcd
            ? `Zs ${fmt(zsOhm)} ohm exceeds the overcurrent limit ${fmt(zsMax)} ohm; the RCD disconnects (Zs <= 50 V / IΔn = ${fmt(rcdLimit!)} ohm)`
            : zsFailMessage(nodeName, zsOhm, zsMax, requiredS),
        working(
          'zs',
          title,
          'Zs = Ze + sum(R1 + R2) <= Zs max = Cmin x U0 / Ia',
          [
            ['Zs', zsOhm, 'ohm', 'Ze plus R1 + R2 of every segment at operating temperature'],
            ['Cmin', 0.95, '', 'BS 7671 Reg 411.4.4'],
            ['U0', supply.u0V, 'V', 'supply.u0V'],
            ['Ia', ia.iaA, 'A', ia.basis],
            ['required time', requiredS, 's', 'IEC 60364-4-41 Table 41.1 / 411.3.2.3'],
          ],
          zsMax,
          'ohm',
          'IEC 60364-4-41 itself uses Zs x Ia <= U0 (no Cmin); the Cmin form is the more demanding',
        ),
      ),
    );
  }
  if (supply.earthing === 'TT') {
    const ra = supply.raOhm;
    if (!rcd || !(rcd.idnMa > 0)) {
      checks.push(
        check(
          'rcdTouch',
          'TT: RCD touch-voltage condition (RA x IΔn <= 50 V)',
          null,
          null,
          50,
          'V',
          ttNoRcdMessage(nodeName),
          working('rcdTouch', 'RA x IΔn <= 50 V', 'RA x IΔn <= 50 V', [], 'not assessed', ''),
        ),
      );
    } else if (ra === undefined) {
      checks.push(
        check(
          'rcdTouch',
          'TT: RCD touch-voltage condition (RA x IΔn <= 50 V)',
          null,
          null,
          50,
          'V',
          ttNoRaMessage(nodeName),
          working('rcdTouch', 'RA x IΔn <= 50 V', 'RA x IΔn <= 50 V', [], 'not assessed', ''),
        ),
      );
    } else {
      const v = ra * (rcd.idnMa / 1000);
      checks.push(
        check(
          'rcdTouch',
          'TT: RCD touch-voltage condition (RA x IΔn <= 50 V)',
          v <= 50,
          v,
          50,
          'V',
          v <= 50 ? `RA x IΔn = ${fmt(v)} V <= 50 V` : ttFailMessage(nodeName, v),
          working(
            'rcdTouch',
            'RA x IΔn <= 50 V',
            'RA x IΔn <= 50 V (IEC 60364-4-41 411.5.3)',
            [
              ['RA', ra, 'ohm', 'supply.raOhm'],
              ['IΔn', rcd.idnMa / 1000, 'A', 'device.rcd.idnMa'],
            ],
            v,
            'V',
          ),
        ),
      );
    }
  }
  return { zsMaxOhm: zsMax, testZsMaxOhm: zsMax === null ? null : TEST_ZS_FACTOR * zsMax, checks };
}
