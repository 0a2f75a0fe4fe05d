/**
 * Phase balance at three-phase boards, and a proposed re-allocation of single-phase loads that
 * lowers each board's worst phase current. Proposals are plain data; the editor applies accepted
 * ones as undoable commands.
 */
import { PHASES, type Id, type Load, type Phase, type ProjectDocument } from '../model/types.ts';
import type { PhaseCurrents, Results } from './results.ts';
import type { BoardBalance } from './protection/protectionResults.ts';

/**
 * Imbalance as the largest deviation from the average, percent of the average phase current
 * (the usual definition, common practice).
 * @example imbalancePct({ L1: 60, L2: 45, L3: 30 }) // 33.3
 */
export function imbalancePct(c: Record<Phase, number>): number {
  const avg = (c.L1 + c.L2 + c.L3) / 3;
  if (avg <= 0) return 0;
  return (100 * (Math.max(c.L1, c.L2, c.L3) - avg)) / avg;
}

/**
 * Neutral current of three phase currents at equal power factor, 120° apart:
 * IN = sqrt(IA² + IB² + IC² − IA·IB − IB·IC − IC·IA).
 * @example neutralCurrentA(60, 45, 30) // 25.98
 */
export function neutralCurrentA(a: number, b: number, c: number): number {
  return Math.sqrt(Math.max(0, a * a + b * b + c * c - a * b - b * c - c * a));
}

function worst(c: Record<Phase, number>): Phase {
  return c.L1 >= c.L2 && c.L1 >= c.L3 ? 'L1' : c.L2 >= c.L3 ? 'L2' : 'L3';
}

/** Balance figures for every board fed by a three-phase cable. */
export function boardBalances(doc: ProjectDocument, results: Results): Record<Id, BoardBalance> {
  const out: Record<Id, BoardBalance> = {};
  const threePhaseFeed = new Set<Id>();
  for (const c of doc.cables) if (c.phases === 3) threePhaseFeed.add(c.to);
  for (const n of doc.nodes) {
    if (n.kind !== 'board' || !threePhaseFeed.has(n.id)) continue;
    const r = results.nodes[n.id];
    if (!r) continue;
    const c: PhaseCurrents = r.currentsA;
    out[n.id] = { boardId: n.id, currentsA: { ...c }, imbalancePct: imbalancePct(c), worstPhase: worst(c) };
  }
  return out;
}

export interface PhaseChange {
  loadId: Id;
  field: 'phase';
  from: Phase;
  to: Phase;
  reason: string;
}

/**
 * The single-phase loads each three-phase board feeds directly or through junctions (not through a
 * further board, whose balance is its own), with their design current.
 */
function loadsByBoard(doc: ProjectDocument, results: Results): Map<Id, { load: Load; currentA: number }[]> {
  const kind = new Map<Id, string>();
  for (const n of doc.nodes) kind.set(n.id, n.kind);
  const fromOf = new Map<Id, Id>();
  for (const c of doc.cables) fromOf.set(c.id, c.from);
  const out = new Map<Id, { load: Load; currentA: number }[]>();
  for (const n of doc.nodes) {
    if (n.kind !== 'load' || n.phases !== 1) continue;
    const r = results.loads[n.id];
    if (!r || r.path.length === 0) continue;
    let board: Id | undefined;
    for (let i = r.path.length - 1; i >= 0; i--) {
      const from = fromOf.get(r.path[i]!);
      if (from && kind.get(from) === 'board') {
        board = from;
        break;
      }
      if (from && kind.get(from) !== 'junction') break;
    }
    if (!board) continue;
    const currentA = Math.max(r.currentsA.L1, r.currentsA.L2, r.currentsA.L3);
    (out.get(board) ?? out.set(board, []).get(board)!).push({ load: n, currentA });
  }
  return out;
}

const PERMUTATIONS: readonly (readonly Phase[])[] = [
  ['L1', 'L2', 'L3'],
  ['L1', 'L3', 'L2'],
  ['L2', 'L1', 'L3'],
  ['L2', 'L3', 'L1'],
  ['L3', 'L1', 'L2'],
  ['L3', 'L2', 'L1'],
];

/**
 * Proposes phase changes for single-phase loads that lower the worst phase current at each
 * three-phase board. Largest loads are placed first on the least-loaded phase (on top of what the
 * board's other outgoing ways draw), then the phase labels are permuted to keep as many loads where
 * they are as possible. A board is left alone unless its worst phase improves.
 * @example proposePhaseBalance(doc, solve(doc)) // [{ loadId: 'L7', field: 'phase', from: 'L1', to: 'L3', ... }]
 */
export function proposePhaseBalance(doc: ProjectDocument, results: Results): PhaseChange[] {
  const balances = boardBalances(doc, results);
  const changes: PhaseChange[] = [];
  const outgoing = new Map<Id, Id[]>();
  for (const c of doc.cables) (outgoing.get(c.from) ?? outgoing.set(c.from, []).get(c.from)!).push(c.id);
  for (const [boardId, items] of loadsByBoard(doc, results)) {
    const bal = balances[boardId];
    if (!bal || items.length < 2) continue;
    // Work on the sum of the board's outgoing ways (before the board's diversity, which scales all
    // three phases alike and so does not change which allocation is best).
    const ways: Record<Phase, number> = { L1: 0, L2: 0, L3: 0 };
    for (const id of outgoing.get(boardId) ?? []) {
      const cr = results.cables[id];
      if (cr) for (const p of PHASES) ways[p] += cr.currentsA[p];
    }
    const fixed: Record<Phase, number> = { ...ways };
    for (const it of items) fixed[it.load.phase] = Math.max(0, fixed[it.load.phase] - it.currentA);
    const sorted = [...items].sort((a, b) => b.currentA - a.currentA || a.load.id.localeCompare(b.load.id));
    const totals = { ...fixed };
    const assigned = new Map<Id, Phase>();
    for (const it of sorted) {
      let best: Phase = 'L1';
      for (const p of PHASES) if (totals[p] < totals[best]) best = p;
      totals[best] += it.currentA;
      assigned.set(it.load.id, best);
    }
    // Relabelling phases keeps the same balance; choose the labelling that moves the fewest loads,
    // only where the fixed currents allow it (all three equal fixed parts, to within 1 mA).
    const symmetric = Math.max(fixed.L1, fixed.L2, fixed.L3) - Math.min(fixed.L1, fixed.L2, fixed.L3) < 1e-3;
    let perm: readonly Phase[] = PERMUTATIONS[0]!;
    if (symmetric) {
      let bestKept = -1;
      for (const p of PERMUTATIONS) {
        let kept = 0;
        for (const it of items) if (p[PHASES.indexOf(assigned.get(it.load.id)!)] === it.load.phase) kept++;
        if (kept > bestKept) [bestKept, perm] = [kept, p];
      }
    }
    const final: Record<Phase, number> = { L1: 0, L2: 0, L3: 0 };
    for (const p of PHASES) final[perm[PHASES.indexOf(p)]!] = totals[p];
    const boardName = doc.nodes.find((n) => n.id === boardId)?.name ?? boardId;
    const before = Math.max(ways.L1, ways.L2, ways.L3);
    const after = Math.max(final.L1, final.L2, final.L3);
    if (after >= before - 1e-9) continue;
    for (const it of items) {
      const to = perm[PHASES.indexOf(assigned.get(it.load.id)!)]!;
      if (to !== it.load.phase) {
        changes.push({
          loadId: it.load.id,
          field: 'phase',
          from: it.load.phase,
          to,
          reason: `${boardName === boardId ? `board ${boardId}` : `${boardName} (${boardId})`}: worst phase of the outgoing ways ${before.toFixed(1)} A -> ${after.toFixed(1)} A`,
        });
      }
    }
  }
  return changes;
}
