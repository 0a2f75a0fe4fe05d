/**
 * Voltage-drop limit profiles: the share of the nominal voltage a load may lose between the
 * origin and its terminals. Sources per check-values §3.
 */
import type { CustomLimits, LimitProfileId, LoadCategory } from '../model/types.ts';

export interface LimitProfile {
  id: LimitProfileId;
  title: string;
  source: string;
  /** Origin-to-load limit, percent of nominal voltage, by load category. */
  totalPct: Record<LoadCategory, number>;
  /**
   * Extra limit on the branch circuit alone (from the last board upstream to the load), percent;
   * only the NEC profile sets one.
   */
  branchPct?: number;
  /** Whether the IEC +0.005 %/m allowance beyond 100 m (at most +0.5 %) may apply. */
  allowsLongRunAllowance: boolean;
  /** How the profile is applied, in words for the working. */
  note: string;
}

const IEC_NOTE =
  'Origin-to-load drop against IEC 60364-5-52 Table G.52.1 (informative); the drop is computed from the design demand.';

export const LIMIT_PROFILES: Readonly<Record<Exclude<LimitProfileId, 'custom'>, LimitProfile>> = {
  iecPublic: {
    id: 'iecPublic',
    title: 'IEC 60364-5-52 Annex G, public LV supply (type A)',
    source: 'IEC 60364-5-52:2009 Table G.52.1, type A',
    totalPct: { lighting: 3, other: 5 },
    allowsLongRunAllowance: true,
    note: IEC_NOTE,
  },
  iecPrivate: {
    id: 'iecPrivate',
    title: 'IEC 60364-5-52 Annex G, private LV supply (type B)',
    source: 'IEC 60364-5-52:2009 Table G.52.1, type B',
    totalPct: { lighting: 6, other: 8 },
    allowsLongRunAllowance: true,
    note: `${IEC_NOTE} As far as possible final circuits should also meet the type A values (not checked).`,
  },
  nec: {
    id: 'nec',
    title: 'NEC informational notes (3 % branch, 5 % feeder plus branch)',
    source: 'NFPA 70 210.19(A) Informational Note No. 4 and 215.2(A) Informational Note No. 2',
    totalPct: { lighting: 5, other: 5 },
    branchPct: 3,
    allowsLongRunAllowance: false,
    note:
      'Applied as two budgets: the whole path from the origin within 5 %, and the branch circuit ' +
      '(from the last board upstream of the load to the load) within 3 %; the load takes the worse of ' +
      'the two. These notes are informational, not enforceable (NEC 90.5(C)).',
  },
  asnzs: {
    id: 'asnzs',
    title: 'AS/NZS 3000 clause 3.6.2 (5 %)',
    source: 'AS/NZS 3000:2018 clause 3.6.2',
    totalPct: { lighting: 5, other: 5 },
    allowsLongRunAllowance: false,
    note: 'From the point of supply to any point of the installation, of nominal voltage.',
  },
};

/**
 * The profile a project uses; `custom` takes its percentages from the document.
 * @example limitProfile('iecPublic').totalPct.lighting // 3
 */
export function limitProfile(id: LimitProfileId, custom?: CustomLimits): LimitProfile {
  if (id === 'custom') {
    return {
      id: 'custom',
      title: 'Custom limits',
      source: 'project settings customLimits',
      totalPct: { lighting: custom?.lightingPct ?? 3, other: custom?.otherPct ?? 5 },
      allowsLongRunAllowance: false,
      note: 'Limits set by the designer in the project settings.',
    };
  }
  return LIMIT_PROFILES[id];
}

/**
 * IEC 60364-5-52 G.52.1 note: beyond 100 m of wiring the limit may rise by 0.005 % per metre,
 * by at most 0.5 %. Applied to the route length from the origin to the load.
 * @example longRunAllowancePct(250) // 0.5 (capped); longRunAllowancePct(160) // 0.3
 */
export function longRunAllowancePct(pathLengthM: number): number {
  if (!(pathLengthM > 100)) return 0;
  return Math.min(0.5, 0.005 * (pathLengthM - 100));
}
