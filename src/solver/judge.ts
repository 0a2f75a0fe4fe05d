/**
 * Limits, statuses and headroom. Each load is judged on its worst relevant phase against the
 * limit for its category; boards, junctions and cables take the worst status below them. The
 * headroom of a cable is its drop formula rearranged for length: with the same current and
 * per-metre impedance, how long it could be before the first load below it reaches its limit.
 */
import { longRunAllowancePct } from '../catalogue/limits.ts';
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_LOAD } from './dropState.ts';
import { LazyFinding, shown } from './findings.ts';
import { nodeLabel } from './topology.ts';
import { FindingTail } from './findingOrder.ts';

const INF = Number.POSITIVE_INFINITY;

export const STATUS_WORDS = ['within', 'close', 'over'] as const;

/** Phases a load is judged on, as a bit mask. */
export function loadPhaseMask(s: DropState, v: number): number {
  return (s.loadMask[v] as number) || 1;
}

/** A load's judged figures: worst phase, cumulative and branch drop (% of U0), limit, budget used. */
export interface LoadVerdict {
  worst: number;
  worstPct: number;
  branchWorst: number;
  limit: number;
  used: number;
  category: 'lighting' | 'other';
}

/**
 * The figures the judge gives reached load `v`, into `out`; the results work them out again with
 * this when built instead of the state keeping four figures per node. Zero for a load not reached.
 */
export function loadVerdict(s: DropState, v: number, out: LoadVerdict): void {
  const { profile, cum } = s;
  const categoryCode = s.loadCategory[v];
  out.category = categoryCode === 1 ? 'other' : 'lighting';
  if (!s.reached[v]) {
    out.worst = -1;
    out.worstPct = 0;
    out.branchWorst = 0;
    out.limit = 0;
    out.used = 0;
    return;
  }
  const pctPerV = 100 / s.u0V;
  const branchLimit = profile.branchPct;
  const b = v * 3;
  // Cumulative drop at the last board upstream (0 at the origin), per phase.
  const bb = (s.branchAt[v] as number) * 3;
  const mask = loadPhaseMask(s, v);
  let worst = -1;
  let worstPct = Number.NEGATIVE_INFINITY;
  let branchWorst = 0;
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    const pct = (cum[b + p] as number) * pctPerV;
    if (pct > worstPct) {
      worstPct = pct;
      worst = p;
    }
    const br = ((cum[b + p] as number) - (cum[bb + p] as number)) * pctPerV;
    if (br > branchWorst) branchWorst = br;
  }
  const allowance =
    profile.allowsLongRunAllowance && s.longRunAllowance
      ? longRunAllowancePct(s.pathLengthM[v] as number)
      : 0;
  const limit = (profile.totalPct[out.category] ?? 3) + allowance;
  let used = worstPct / limit;
  if (branchLimit !== undefined) used = Math.max(used, branchWorst / branchLimit);
  out.worst = worst;
  out.worstPct = worstPct;
  out.branchWorst = branchWorst;
  out.limit = limit;
  out.used = used;
}

/** loadVerdict into a new record, for the results. */
export function judged(s: DropState, v: number): LoadVerdict {
  const out: LoadVerdict = {
    worst: -1,
    worstPct: 0,
    branchWorst: 0,
    limit: 0,
    used: 0,
    category: 'lighting',
  };
  loadVerdict(s, v, out);
  return out;
}

/** The over-limit message, made when first read. */
function overText(
  s: DropState,
  v: number,
  worstPct: number,
  category: string,
  limit: number,
  branchWorst: number,
): string {
  const branchLimit = s.profile.branchPct;
  return `${nodeLabel(s, v)}: drop from the origin ${worstPct.toFixed(2)} % of U0 is over its ${category} limit of ${limit.toFixed(2)} %${branchLimit !== undefined ? ` (or its branch drop ${branchWorst.toFixed(2)} % is over ${branchLimit} %)` : ''}; use a larger cable on the path or shorten it.`;
}

/** The close-to-limit message, made when first read. */
function closeText(s: DropState, v: number, used: number, worstPct: number, limit: number): string {
  return `${nodeLabel(s, v)}: uses ${(used * 100).toFixed(0)} % of its drop budget (${worstPct.toFixed(2)} % of U0 against ${limit.toFixed(2)} %).`;
}

export function judgeLoads(s: DropState): void {
  const { findings, profile } = s;
  const pctPerV = 100 / s.u0V;
  const branchLimit = profile.branchPct;
  const slack = s.slackPct.fill(Infinity);
  // Only a profile with a branch limit needs the branch slack (a scratch array of its own).
  const slackB = branchLimit === undefined ? undefined : new Float64Array(s.nodeCount * 3).fill(Infinity);
  const close = s.closeThreshold;
  const { walk, nodeKind, cum, branchAt, parentCable, cableFrom, status, loadCategory } = s;
  const root = s.root;
  const tail = new FindingTail(findings);
  const verdict: LoadVerdict = {
    worst: -1,
    worstPct: 0.5,
    branchWorst: 0.5,
    limit: 0.5,
    used: 0.5,
    category: 'lighting',
  };

  for (let k = s.orderLength - 1; k >= 0; k--) {
    const v = walk[k] as number;
    const b = v * 3;
    if (nodeKind[v] === KIND_LOAD) {
      // Cumulative drop at the last board upstream (0 at the origin), per phase.
      const bb = (branchAt[v] as number) * 3;
      const mask = loadPhaseMask(s, v);
      loadVerdict(s, v, verdict);
      const { worst, worstPct, branchWorst, limit, used, category } = verdict;
      if (loadCategory[v] === 2)
        findings.push({
          code: 'badCategory',
          severity: 'warning',
          elementId: s.nodeIds.at(v),
          message: `${nodeLabel(s, v)}: category must be lighting or other, got ${shown((s.nodes[v] as { category?: unknown }).category)}; it is judged against the stricter lighting limit.`,
        });
      s.worstPhase[v] = worst;
      if (s.incomplete[v] || !s.loadValid[v]) {
        s.status[v] = -1;
      } else {
        const code = used > 1 ? 2 : used >= close ? 1 : 0;
        s.status[v] = code;
        for (let p = 0; p < 3; p++) {
          if (!(mask & (1 << p))) continue;
          const pct = (cum[b + p] as number) * pctPerV;
          slack[b + p] = limit - pct;
          if (slackB && branchLimit !== undefined)
            slackB[b + p] = branchLimit - ((cum[b + p] as number) - (cum[bb + p] as number)) * pctPerV;
        }
        if (code === 2)
          findings.push(
            new LazyFinding('overLimit', 'error', s.nodeIds.at(v), overText, [
              s,
              v,
              worstPct,
              category,
              limit,
              branchWorst,
            ]),
          );
        else if (code === 1)
          findings.push(
            new LazyFinding('closeToLimit', 'warning', s.nodeIds.at(v), closeText, [
              s,
              v,
              used,
              worstPct,
              limit,
            ]),
          );
      }
    }
    tail.tag(v);
    const j = parentCable[v] as number;
    if (v === root || j < 0) continue;
    const u = cableFrom[j] as number;
    if ((status[v] as number) > (status[u] as number)) status[u] = status[v] as number;
    const ub = u * 3;
    const isBoard = nodeKind[v] === KIND_BOARD;
    for (let p = 0; p < 3; p++) {
      if ((slack[b + p] as number) < (slack[ub + p] as number)) slack[ub + p] = slack[b + p] as number;
      if (slackB && !isBoard && (slackB[b + p] as number) < (slackB[ub + p] as number))
        slackB[ub + p] = slackB[b + p] as number;
    }
    headroom(s, j, v, slack, slackB, pctPerV);
  }
  tail.settle(s, true);
}

function headroom(
  s: DropState,
  j: number,
  v: number,
  slack: Float64Array,
  slackB: Float64Array | undefined,
  pctPerV: number,
): void {
  if (s.cableBad[j]) return;
  const mask = s.cablePhases[j] as number;
  const b = v * 3;
  const isBoard = s.nodeKind[v] === KIND_BOARD;
  // Number.POSITIVE_INFINITY rather than the global Infinity: V8 then keeps `factor` unboxed.
  let factor = INF;
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    const d = (s.dropProj[j * 3 + p] as number) * pctPerV;
    if (!(d > 0)) continue;
    const a = slack[b + p] as number;
    if (a !== INF) factor = Math.min(factor, (a + d) / d);
    if (slackB && !isBoard) {
      const c = slackB[b + p] as number;
      if (c !== INF) factor = Math.min(factor, (c + d) / d);
    }
  }
  if (factor !== INF) s.maxLengthM[j] = Math.max(0, (s.cableLengthM[j] as number) * factor);
}
