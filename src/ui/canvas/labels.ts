/**
 * The compact text on each cable and node, by label mode. Pure: figures come from the solver's
 * results as they are; nothing is computed here beyond rounding for display.
 */
import type { CableResult, NodeResult } from '../../solver/results.ts';
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
