/**
 * The numeric protection pass over flat arrays:
 *  1. circuits, leaves first over the arrays only: final or distribution circuit per segment;
 *  2. one walk outwards from the origin, parents first. Each segment's cable (with its cpc,
 *     installation and device) is read once, right where it is needed: R1 + R2, reactance,
 *     capacity, the device that protects it, the accumulated Zs (R and X, hot and cold) and fault
 *     loop at its far node, and then the segment's checks and the far node's checks
 *     (protectionFindings.ts).
 * The walk is in document order when the drop solver found it parents first (memory is then read
 * front to back), so the findings are put back in breadth-first order at the end. It builds no check
 * or working object; the lazy protection objects (protectionViews.ts) read the arrays when asked.
 */
import type { Cable, Supply } from '../../model/types.ts';
import type { Finding, Results } from '../results.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import type { FuseDataSet } from '../../catalogue/devices.ts';
import type { Check, MotorStartResult } from './protectionResults.ts';
import type { SourceImpedance } from './impedance.ts';
import { KIND_BOARD, KIND_JUNCTION, type TreeInputs } from './treeInputs.ts';
import { dropXOhmPerM } from './treeInputs.ts';
import { PassArrays } from './passArrays.ts';
import { CapacityMemo } from './capacityMemo.ts';
import { cableFindings, nodeFindings, Tagged } from './protectionFindings.ts';

export interface PassContext {
  t: TreeInputs;
  results: Results;
  supply: Supply;
  u0V: number;
  source: SourceImpedance;
  fuses: FuseDataSet;
  tables: readonly CapacityTable[];
}

export interface PassOutcome {
  a: PassArrays;
  /** The per-solve memo the protection results read their capacity and conductor figures from. */
  memo: CapacityMemo;
  failed: number;
  unassessed: number;
  motors: Map<number, { result: MotorStartResult; check: Check }>;
}

/** Final or distribution circuit: a segment into a junction is distribution if any beyond it is. */
function circuits(t: TreeInputs, a: PassArrays): void {
  const { walk, feeding, cableFrom, cableTo, nodeKind } = t;
  const distJunction = new Uint8Array(t.nodes.length);
  for (let k = t.orderEnd - 1; k >= t.orderStart; k--) {
    const j = feeding[walk[k]!]!;
    const v = cableTo[j]!;
    const dist = nodeKind[v] === KIND_BOARD || (nodeKind[v] === KIND_JUNCTION && distJunction[v] === 1);
    a.circuit[j] = dist ? 1 : 0;
    const u = cableFrom[j]!;
    if (dist && nodeKind[u] === KIND_JUNCTION) distJunction[u] = 1;
  }
}

/**
 * The walk: for each segment, what its cable contributes on its own (the same expressions as
 * segmentLoop: the per-metre figures of its conductors, from the memo, times its length over its
 * parallel count), the loop impedances at its far node, then the checks of both.
 */
function walkTree(ctx: PassContext, a: PassArrays, memo: CapacityMemo, out: Tagged): void {
  const { t } = ctx;
  const { walk, feeding, cableFrom, nodeKind, cableHasResult, cables, drop } = t;
  for (let k = t.orderStart; k < t.orderEnd; k++) {
    const v = walk[k]!;
    const j = feeding[v]!;
    const u = cableFrom[j]!;
    if (!a.acc[u] || (cableHasResult && !cableHasResult[j])) continue;
    const cable: Cable = cables[j]!;
    // Own device or, through a junction, the one upstream (parents come first).
    const parent = nodeKind[u] === KIND_JUNCTION ? feeding[u]! : -1;
    a.protBy[j] = cable.device ? j : parent >= 0 ? a.protBy[parent]! : -1;
    const conductor = memo.conductor(cable);
    if (!conductor.known) {
      a.hasCable[j] = 2;
      out.noResistance(t, j, cable);
      continue;
    }
    const n = Math.max(1, cable.parallel);
    const lengthM = cable.lengthM;
    const r1r2Hot = (conductor.r1r2HotPerM * lengthM) / n;
    const r1r2Cold = (conductor.r1r2ColdPerM * lengthM) / n;
    const r1Cold = (conductor.r1PerM * lengthM) / n;
    // The reactance per metre already combines parallel cables; dividing again would understate X.
    const xLen = (drop ? dropXOhmPerM(drop, j, cable.parallel) : t.xOhmPerM(j)) * lengthM;
    // The earth loop is line out and cpc back: its reactance is taken as twice the line's.
    a.zhR[v] = a.zhR[u]! + r1r2Hot;
    a.zhX[v] = a.zhX[u]! + 2 * xLen;
    a.zcR[v] = a.zcR[u]! + r1r2Cold;
    a.flR[v] = a.flR[u]! + 2 * r1Cold;
    a.flX[v] = a.flX[u]! + 2 * xLen;
    a.fpR[v] = a.fpR[u]! + r1Cold;
    a.fpX[v] = a.fpX[u]! + xLen;
    a.three[v] = a.three[u] === 1 && cable.phases === 3 ? 1 : 0;
    a.acc[v] = 1;
    a.hasCable[j] = 1;
    a.hasNode[v] = 1;
    a.capAt[j] = memo.figuresAt(cable);
    cableFindings(ctx, a, memo, out, j, v, u, cable, conductor);
    nodeFindings(ctx, a, out, j, v);
  }
}

/** Runs the sweeps; findings for failed and unassessed checks are appended in breadth-first order. */
export function protectionPass(ctx: PassContext, findings: Finding[]): PassOutcome {
  const { t } = ctx;
  const a = new PassArrays(t.nodes.length, t.cables.length);
  const out = new Tagged();
  const memo = new CapacityMemo(ctx.tables);
  if (t.root < 0) return { a, memo, failed: 0, unassessed: 0, motors: out.motors };
  a.seedSupply(t.root, ctx.supply, ctx.source);
  a.hasNode[t.root] = 1;
  circuits(t, a);
  walkTree(ctx, a, memo, out);
  out.appendSorted(findings, 2 * t.orderEnd + 2);
  return { a, memo, failed: out.failed, unassessed: out.unassessed, motors: out.motors };
}
