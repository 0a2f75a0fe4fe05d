/**
 * Working records of R1 + R2, Zs and the prospective fault current, the finding code of each failed
 * check and the references protection adds: shared by the fast pass and the reference implementation.
 */
import type { Cable, Supply } from '../../model/types.ts';
import type { Working } from '../results.ts';
import type { Check, NodeProtection } from './protectionResults.ts';
import type { SegmentLoop } from './impedance.ts';
import { fmt, working } from './working.ts';

/** Finding code of each check when it fails. */
export const FAIL_CODES: Record<Check['key'], string> = {
  ibIn: 'ibOverIn',
  inIz: 'overCapacity',
  i2: 'i2OverIz',
  zs: 'zsOverMax',
  rcdTouch: 'touchVoltage',
  breaking: 'breakingCapacity',
  cpc: 'cpcAdiabatic',
  motorDip: 'motorDip',
};

/** Standards the protection figures rely on, added to the results' references. */
export const REFERENCES = [
  'IEC 60364-4-41:2005 and BS 7671:2018 Chapter 41 (Cmin 0.95) for disconnection and maximum Zs',
  'IEC 60364-5-52:2009 Annex B and BS 7671 Appendix 4 for current-carrying capacity and correction factors',
  'IEC 60364-5-54 / BS 7671 Tables 54.2-54.7 for k values and protective conductor sizes',
  'IEC 60909-0:2016 cmax 1.05 for maximum prospective fault current',
];

export function r1r2Working(cable: Cable, seg: SegmentLoop): Working {
  return working(
    'r1r2',
    'R1 + R2 of this segment',
    '(R1 + R2) = (r1 + r2) at θ x L / n',
    [
      [
        'r1 at 20 °C',
        seg.r1PerM20 * 1000,
        'mohm/m',
        `IEC 60228 Table 2, ${cable.material} ${cable.sizeMm2} mm²`,
      ],
      [
        'r2 at 20 °C',
        seg.r2PerM20 * 1000,
        'mohm/m',
        `cpc ${cable.cpc.kind} ${cable.cpc.material} ${cable.cpc.sizeMm2} mm²`,
      ],
      ['L', cable.lengthM, 'm', 'cable.lengthM (one way)'],
      ['n', Math.max(1, cable.parallel), '', 'cable.parallel'],
    ],
    seg.r1r2HotOhm,
    'ohm',
    `at 20 °C: ${fmt(seg.r1r2ColdOhm, 4)} ohm; hot at the insulation's maximum operating temperature (α20 from IEC 60228)`,
  );
}

export function zsWorking(supply: Supply, p: NodeProtection): Working {
  return working(
    'zs',
    'Earth fault loop impedance Zs',
    'Zs = Ze + sum of (R1 + R2), R and X summed separately',
    [
      ['Ze', supply.zeOhm, 'ohm', `supply.zeOhm (${supply.zeSource})`],
      ['R', p.zs.rOhm, 'ohm', 'Ze plus R1 + R2 at operating temperature along the path'],
      ['X', p.zs.xOhm, 'ohm', 'path reactance (twice the line conductor reactance)'],
      ['Zs cold', p.zsColdOhm, 'ohm', 'same path at 20 °C'],
    ],
    p.zsOhm,
    'ohm',
    p.testZsMaxOhm !== null
      ? `largest value to accept when testing with conductors cold: 0.8 x Zs max = ${fmt(p.testZsMaxOhm)} ohm`
      : undefined,
  );
}

export function pfcWorking(basis: string, p: NodeProtection, u0V: number): Working {
  return working(
    'pfc',
    'Prospective fault current',
    'I = cmax x U0 / |Zsource + Zcables at 20 °C| (line-neutral loop; per phase for three-phase)',
    [
      ['cmax', p.fault.cMax, '', 'IEC 60909-0 Table 1, LV +6 % systems'],
      ['U0', u0V, 'V', 'supply.u0V'],
      ['source', basis, '', 'supply'],
      ['I L-N', p.fault.lnA, 'A', 'line-neutral fault'],
      ['I 3-phase', p.fault.lllA ?? '-', 'A', 'three-phase symmetrical fault'],
    ],
    p.fault.maxA,
    'A',
    'The neutral is taken the same size as the line conductor.',
  );
}
