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
import { PassArrays, type Loops } from './passArrays.ts';
import { CapacityMemo, type ConductorFigures } from './capacityMemo.ts';
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

/** What a segment adds to the loops at its sending end: R1 + R2 hot and cold, R1 cold, X, ohms. */
export interface SegmentLoops {
  r1r2Hot: number;
  r1r2Cold: number;
  r1Cold: number;
  xLen: number;
}

/**
 * What cable `j` contributes on its own (the same expressions as segmentLoop: the per-metre
 * figures of its conductors, from the memo, times its length over its parallel count), into `seg`.
 */
export function segmentLoops(
  t: TreeInputs,
  cable: Cable,
  j: number,
  conductor: ConductorFigures,
  seg: SegmentLoops,
): void {
  const n = Math.max(1, cable.parallel);
  const lengthM = cable.lengthM;
  seg.r1r2Hot = (conductor.r1r2HotPerM * lengthM) / n;
  seg.r1r2Cold = (conductor.r1r2ColdPerM * lengthM) / n;
  seg.r1Cold = (conductor.r1PerM * lengthM) / n;
  // The reactance per metre already combines parallel cables; dividing again would understate X.
  seg.xLen = (t.drop ? dropXOhmPerM(t.drop, j, cable.parallel) : t.xOhmPerM(j)) * lengthM;
}

/**
 * The loops at the far node of cable `j`: those at its sending end `u` (kept) plus the segment's,
 * into `at`. The earth loop is line out and cpc back: its reactance is taken as twice the line's.
 */
export function loopsBeyond(a: PassArrays, u: number, seg: SegmentLoops, at: Loops): void {
  const r = a.slot[u]!;
  at.zhR = a.zhR[r]! + seg.r1r2Hot;
  at.zhX = a.zhX[r]! + 2 * seg.xLen;
  at.zcR = a.zcR[r]! + seg.r1r2Cold;
  at.flR = a.flR[r]! + 2 * seg.r1Cold;
  at.flX = a.flX[r]! + 2 * seg.xLen;
  at.fpR = a.fpR[r]! + seg.r1Cold;
  at.fpX = a.fpX[r]! + seg.xLen;
}

/**
 * The walk: for each segment, its own loops, the loops at its far node (kept where that node
 * feeds others), then the checks of both (which read the far node's loops from `out.loops`).
 */
function walkTree(ctx: PassContext, a: PassArrays, memo: CapacityMemo, out: Tagged): void {
  const { t } = ctx;
  const { walk, feeding, cableFrom, nodeKind, cableHasResult, cables } = t;
  const seg = out.segment;
  const at = out.loops;
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
    segmentLoops(t, cable, j, conductor, seg);
    loopsBeyond(a, u, seg, at);
    const r = a.slot[v]!;
    if (r >= 0) {
      a.zhR[r] = at.zhR;
      a.zhX[r] = at.zhX;
      a.zcR[r] = at.zcR;
      a.flR[r] = at.flR;
      a.flX[r] = at.flX;
      a.fpR[r] = at.fpR;
      a.fpX[r] = at.fpX;
    }
    a.three[v] = a.three[u] === 1 && cable.phases === 3 ? 1 : 0;
    a.acc[v] = 1;
    a.hasCable[j] = 1;
    a.hasNode[v] = 1;
    a.capAt[j] = memo.figuresAt(cable);
    cableFindings(ctx, a, memo, out, j, v, u, cable, conductor);
    nodeFindings(ctx, a, out, j, v);
  }
}

/** A place for the origin and every node that feeds a segment (PassArrays.slot), in walk order. */
function slots(t: TreeInputs): { slot: Int32Array; count: number } {
  const slot = new Int32Array(t.nodes.length).fill(-1);
  let count = 0;
  if (t.root >= 0) slot[t.root] = count++;
  const { walk, feeding, cableFrom } = t;
  for (let k = t.orderStart; k < t.orderEnd; k++) {
    const u = cableFrom[feeding[walk[k]!]!]!;
    if (slot[u]! < 0) slot[u] = count++;
  }
  return { slot, count };
}

/** Runs the sweeps; findings for failed and unassessed checks are appended in breadth-first order. */
export function protectionPass(ctx: PassContext, findings: Finding[]): PassOutcome {
  const { t } = ctx;
  const places = slots(t);
  const a = new PassArrays(t.nodes.length, t.cables.length, places.slot, places.count);
  const out = new Tagged();
  const memo = new CapacityMemo(ctx.tables);
  if (t.root < 0) return { a, memo, failed: 0, unassessed: 0, motors: out.motors };
  a.seedSupply(t.root, ctx.supply, ctx.source);
  a.hasNode[t.root] = 1;
  circuits(t, a);
  walkTree(ctx, a, memo, out);
  out.appendSorted(findings, t.rank, 2 * t.orderEnd + 2);
  return { a, memo, failed: out.failed, unassessed: out.unassessed, motors: out.motors };
}
