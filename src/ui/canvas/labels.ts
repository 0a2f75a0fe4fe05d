/**
 * The compact text on each cable and node, by label mode. Pure: figures come from the solver's
 * results as they are; nothing is computed here beyond rounding for display.
 */
import type { CableResult, NodeResult, Status } from '../../solver/results.ts';
import type { Check } from '../../solver/protection/protectionResults.ts';
import type { LabelMode } from '../../store/viewTypes.ts';

export function fmt(value: number | null | undefined, digits: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  return value.toFixed(digits);
}

/** Current with sensible precision: 3 significant figures, at least whole amperes above 100 A. */
export function fmtAmps(a: number | null | undefined): string {
  if (a === null || a === undefined || !Number.isFinite(a)) return '–';
  return a >= 100 ? a.toFixed(0) : a >= 10 ? a.toFixed(1) : a.toFixed(2);
}

export function cableLabel(
  r: CableResult | undefined,
  mode: LabelMode,
  far: NodeResult | undefined,
): string[] {
  if (!r) return ['no result'];
  if (r.status === null && !(r.dropV > 0)) return ['no result: see findings'];
  switch (mode) {
    case 'drop':
      // Two short lines rather than one long one, so labels of loads side by side do not collide.
      return [
        `${fmtAmps(r.ibA)} A · ${fmt(r.dropV, 2)} V`,
        `Σ ${fmt(r.cumulativePct.value, 2)} % (+${fmt(r.dropPct.value, 2)} %)`,
      ];
    case 'current': {
      const c = r.currentsA;
      const phases = r.phases.map((p) => `${p} ${fmtAmps(c[p])}`).join('  ');
      return [`Ib ${fmtAmps(r.ibA)} A`, `${phases}${c.N > 0 ? `  N ${fmtAmps(c.N)}` : ''}`];
    }
    case 'zs':
    case 'fault':
      // Loop impedance and fault level belong to points, not segments: the cable shows its far end.
      return [nodeLabel(far, mode)];
    case 'capacity': {
      const p = r.protection;
      const use = p?.capacityUse;
      return [
        `Ib ${fmtAmps(r.ibA)} A · Iz ${fmtAmps(p?.izA)} A`,
        use === null || use === undefined ? 'Ib/Iz –' : `Ib/Iz ${fmt(use * 100, 0)} %`,
      ];
    }
  }
}

export function nodeLabel(r: NodeResult | undefined, mode: LabelMode): string {
  if (!r) return '';
  switch (mode) {
    case 'drop':
    case 'capacity':
      return r.status === null ? 'not solved' : `Σ ${fmt(r.cumulativePct.value, 2)} %`;
    case 'current': {
      const worst = Math.max(r.currentsA.L1, r.currentsA.L2, r.currentsA.L3);
      return `${fmtAmps(worst)} A`;
    }
    case 'zs': {
      const p = r.protection;
      if (!p) return 'Zs –';
      return `Zs ${fmt(p.zsOhm, 3)} Ω${p.zsMaxOhm !== null ? ` / ${fmt(p.zsMaxOhm, 2)}` : ''}`;
    }
    case 'fault': {
      const f = r.protection?.fault;
      return `Ipf ${f ? fmt(f.maxA / 1000, 2) : '–'} kA`;
    }
  }
}

/** The one figure a cable shows at middle zoom, where a full label would crowd its neighbours. */
export function cableShortLabel(
  r: CableResult | undefined,
  mode: LabelMode,
  far: NodeResult | undefined,
): string {
  if (!r || (r.status === null && !(r.dropV > 0))) return 'no result';
  switch (mode) {
    case 'drop':
      // The far end's badge already shows Σ; the cable says what it carries and adds.
      return `${fmtAmps(r.ibA)} A · +${fmt(r.dropPct.value, 2)} %`;
    case 'current':
      return `Ib ${fmtAmps(r.ibA)} A`;
    case 'zs':
    case 'fault':
      return nodeLabel(far, mode);
    case 'capacity': {
      const use = r.protection?.capacityUse;
      return use === null || use === undefined ? 'Ib/Iz –' : `Ib/Iz ${fmt(use * 100, 0)} %`;
    }
  }
}

/** What the label's figures mean, for its tooltip: each percentage with its basis. */
export function cableLabelTitle(mode: LabelMode): string {
  switch (mode) {
    case 'drop':
      return "Design current Ib · drop along this cable in V; Σ drop from the origin to its far end, in % of U0 (+ this cable's share)";
    case 'current':
      return 'Design current Ib, and the current in each line conductor and the neutral';
    case 'zs':
      return 'Earth fault loop impedance Zs at the far end / the largest Zs its device allows';
    case 'fault':
      return 'Prospective fault current at the far end';
    case 'capacity':
      return 'Design current Ib and current-carrying capacity Iz; Ib/Iz in % of Iz';
  }
}

/**
 * The status a label's colour, glyph and line style show, so they never contradict its figures:
 * drop and current show the drop status (a cable or board takes the worst load it feeds); loop
 * impedance shows Zs against the device's maximum at the point; fault level shows the breaking
 * capacity of the device against the fault where it sits; capacity shows Ib <= In <= Iz and
 * I2 <= 1.45 Iz. A passing check whose figure uses at least `closeShare` of its allowance is
 * "close", as a drop past the close-to-limit share is. null: the check could not be assessed.
 */
export function cableStatus(
  r: CableResult | undefined,
  mode: LabelMode,
  far: NodeResult | undefined,
  closeShare: number,
): Status | null {
  if (!r) return null;
  switch (mode) {
    case 'drop':
    case 'current':
      return r.status;
    case 'zs':
      return nodeStatus(far, 'zs', closeShare);
    case 'fault':
      return checksStatus(r.protection?.checks, ['breaking'], null, closeShare);
    case 'capacity':
      return checksStatus(
        r.protection?.checks,
        ['ibIn', 'inIz', 'i2'],
        r.protection?.capacityUse ?? null,
        closeShare,
      );
  }
}

export function nodeStatus(r: NodeResult | undefined, mode: LabelMode, closeShare: number): Status | null {
  if (!r) return null;
  const p = r.protection;
  switch (mode) {
    case 'zs':
      return checksStatus(
        p?.checks,
        ['zs', 'rcdTouch'],
        p && p.zsMaxOhm !== null && p.zsMaxOhm > 0 ? p.zsOhm / p.zsMaxOhm : null,
        closeShare,
      );
    default:
      return r.status;
  }
}

const RANK: Record<Status, number> = { within: 0, close: 1, over: 2 };

/** The worse of two statuses; an unassessed one (null) gives way to any assessed one. */
export function worseStatus(a: Status | null, b: Status | null): Status | null {
  if (a === null) return b;
  if (b === null) return a;
  return RANK[b] > RANK[a] ? b : a;
}

/** Worst of the named checks; a pass is "close" when the share of its allowance used reaches closeShare. */
function checksStatus(
  checks: readonly Check[] | undefined,
  keys: readonly Check['key'][],
  share: number | null,
  closeShare: number,
): Status | null {
  const relevant = (checks ?? []).filter((c) => keys.includes(c.key));
  if (relevant.length === 0) return null;
  if (relevant.some((c) => c.pass === false)) return 'over';
  if (relevant.some((c) => c.pass === null)) return null;
  let used = share ?? 0;
  if (share === null) {
    for (const c of relevant) {
      if (c.value !== null && c.limit !== null && c.limit > 0) used = Math.max(used, c.value / c.limit);
    }
  }
  return used >= closeShare ? 'close' : 'within';
}

/** What the status styling means in each label mode, for the key under the canvas. */
export function statusBasis(mode: LabelMode): { short: string; long: string } {
  switch (mode) {
    case 'drop':
    case 'current':
      return {
        short: 'drop; cables and boards: worst load fed',
        long: 'Voltage drop against the limit. A cable or board is shown with the worst status of the loads it feeds, so an over-limit load far down marks its whole path.',
      };
    case 'zs':
      return {
        short: 'loop impedance Zs against the device maximum',
        long: 'Earth fault loop impedance at each point against the largest Zs its protective device allows (or the RCD touch-voltage check); a cable shows its far end.',
      };
    case 'fault':
      return {
        short: 'fault level against breaking capacity',
        long: 'Prospective fault current where each device sits against its breaking capacity; a board shows the worst device it holds, a load or a cable beyond a junction the device protecting it.',
      };
    case 'capacity':
      return {
        short: 'cables: Ib ≤ In ≤ Iz and I2 ≤ 1.45 Iz',
        long: 'Cables: design current, device rating and current-carrying capacity (Ib ≤ In ≤ Iz, I2 ≤ 1.45 Iz); boards and loads keep their drop status.',
      };
  }
}
