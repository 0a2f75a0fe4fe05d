/**
 * The numeric protection pass, over flat arrays and in three sweeps:
 *  1. cables in document order (memory order, so reading the element objects is cheap): R1 + R2,
 *     reactance, capacity figures and the cpc's constants;
 *  2. the tree from the origin outwards, arrays only: the device protecting each segment and the
 *     accumulated Zs (R and X, hot and cold) and fault loop at every node;
 *  3. the checks, in document order again (protectionFindings.ts).
 * It builds no check or working object; the lazy protection objects (protectionViews.ts) read
 * these arrays when asked.
 */
import type { Cable, Supply } from '../../model/types.ts';
import type { Finding, Results } from '../results.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import type { FuseDataSet } from '../../catalogue/devices.ts';
import { tableMinimumCpcMm2 } from '../../catalogue/kValues.ts';
import { atTemperature } from '../../catalogue/iec60228.ts';
import type { Check, MotorStartResult } from './protectionResults.ts';
import {
  cpcAtTemperature,
  cpcResistance20OhmPerM,
  lineResistance20OhmPerM,
  operatingTempC,
  type SourceImpedance,
} from './impedance.ts';
import { KIND_BOARD, KIND_JUNCTION, type TreeInputs } from './treeInputs.ts';
import { PassArrays } from './passArrays.ts';
import { CapacityMemo } from './capacityMemo.ts';
import { checkFindings } from './protectionFindings.ts';
import { hypot } from '../hypot.ts';

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

/** Sweep 1: what each fed cable contributes on its own (the same expressions as segmentLoop). */
function cableFigures(t: TreeInputs, a: PassArrays, memo: CapacityMemo): void {
  const { cables, cableTo, feeding, reached } = t;
  for (let j = 0; j < cables.length; j++) {
    const v = cableTo[j]!;
    if (v < 0 || v === t.root || !reached[v] || feeding[v] !== j) continue;
    const cable: Cable = cables[j]!;
    a.ownDevice[j] = cable.device ? 1 : 0;
    const r1 = lineResistance20OhmPerM(cable.material, cable.sizeMm2);
    const r2 = cpcResistance20OhmPerM(cable.cpc);
    if (r1 === undefined || r2 === undefined) {
      a.noResistance[j] = 1;
      continue;
    }
    const tempC = operatingTempC(cable.insulation);
    const n = Math.max(1, cable.parallel);
    const lengthM = cable.lengthM;
    const hot = (atTemperature(r1, cable.material, tempC) + cpcAtTemperature(r2, cable.cpc, tempC)) * lengthM;
    a.r1r2Hot[j] = hot / n;
    a.r1r2Cold[j] = ((r1 + r2) * lengthM) / n;
    a.r1Cold[j] = (r1 * lengthM) / n;
    // t.xOhmPerM already combines parallel cables; dividing again would understate X.
    a.xLen[j] = t.xOhmPerM(j) * lengthM;
    a.cableThree[j] = cable.phases === 3 ? 1 : 0;
    const cap = memo.figures(cable);
    if (!('error' in cap)) {
      a.capOk[j] = 1;
      a.itA[j] = cap.itA;
      a.izA[j] = cap.izA;
      a.ca[j] = cap.ca;
      a.cg[j] = cap.cg;
      a.ci[j] = cap.ci;
    }
    const cpc = cable.cpc;
    a.cpcMm2[j] = cpc.sizeMm2 * Math.max(1, cable.parallel);
    a.cpcK[j] = memo.cpcK(cpc, cable.insulation);
    a.byTable[j] =
      cpc.kind !== 'armour' &&
      cpc.material === cable.material &&
      cpc.sizeMm2 >= tableMinimumCpcMm2(cable.sizeMm2)
        ? 1
        : 0;
  }
}

/** Sweep 2: outwards from the origin, arrays only. */
function accumulate(t: TreeInputs, a: PassArrays): void {
  const { walk, feeding, cableFrom, nodeKind, cableHasResult } = t;
  for (let k = t.orderStart; k < t.orderEnd; k++) {
    const v = walk[k]!;
    const j = feeding[v]!;
    const u = cableFrom[j]!;
    // Own device or, through a junction, the one upstream (parents come first).
    const parent = nodeKind[u] === KIND_JUNCTION ? feeding[u]! : -1;
    a.protBy[j] = a.ownDevice[j] ? j : parent >= 0 ? a.protBy[parent]! : -1;
    if (!a.acc[u] || (cableHasResult && !cableHasResult[j])) continue;
    if (a.noResistance[j]) {
      a.hasCable[j] = 2;
      continue;
    }
    const r1r2Hot = a.r1r2Hot[j]!;
    const r1r2Cold = a.r1r2Cold[j]!;
    const r1Cold = a.r1Cold[j]!;
    const xLen = a.xLen[j]!;
    // The earth loop is line out and cpc back: its reactance is taken as twice the line's.
    const zhR = a.zhR[u]! + r1r2Hot;
    const zhX = a.zhX[u]! + 2 * xLen;
    a.zhR[v] = zhR;
    a.zhX[v] = zhX;
    const zs = hypot(zhR, zhX);
    a.zsNode[v] = zs;
    a.zsCable[j] = zs;
    a.zcR[v] = a.zcR[u]! + r1r2Cold;
    a.flR[v] = a.flR[u]! + 2 * r1Cold;
    a.flX[v] = a.flX[u]! + 2 * xLen;
    a.fpR[v] = a.fpR[u]! + r1Cold;
    a.fpX[v] = a.fpX[u]! + xLen;
    a.three[v] = a.three[u] === 1 && a.cableThree[j] === 1 ? 1 : 0;
    a.acc[v] = 1;
    a.hasCable[j] = 1;
    a.hasNode[v] = 1;
  }
}

/** Runs the three sweeps; findings for failed and unassessed checks are appended in walk order. */
export function protectionPass(ctx: PassContext, findings: Finding[]): PassOutcome {
  const { t } = ctx;
  const a = new PassArrays(t.nodes.length, t.cables.length);
  const motors = new Map<number, { result: MotorStartResult; check: Check }>();
  if (t.root < 0) return { a, failed: 0, unassessed: 0, motors };
  a.seedSupply(t.root, ctx.supply, ctx.source);
  a.hasNode[t.root] = 1;
  circuits(t, a);
  const memo = new CapacityMemo(ctx.tables);
  cableFigures(t, a, memo);
  accumulate(t, a);
  const counts = checkFindings(ctx, a, motors, memo, findings);
  return { a, failed: counts.failed, unassessed: counts.unassessed, motors };
}
