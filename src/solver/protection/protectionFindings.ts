/**
 * The checks of one segment and of its far node, decided from the pass arrays as the walk reaches
 * them (protectionPass.ts). A check that fails or cannot be assessed becomes a finding with the
 * message the check object would carry (the same message functions), made when the message is
 * first read (LazyFinding); passing checks cost no string, and the node is read only to name it in
 * a message. Findings are then put in
 * breadth-first order (each cable's, then its far node's), the order the checks are listed in.
 */
import type { Cable, Device, Load } from '../../model/types.ts';
import type { Finding } from '../results.ts';
import { CMIN, conventionalOperatingMultiple, settingA, type FuseDataSet } from '../../catalogue/devices.ts';
import type { Check, CheckKey, MotorStartResult } from './protectionResults.ts';
import type { Topology } from './topology.ts';
import * as msg from './cableChecks.ts';
import * as zsMsg from './zsCheck.ts';
import {
  fuseRow,
  operatingCurrent,
  operatingCurrentA,
  operatingTimeS,
  requiredDisconnectionS,
} from './disconnection.ts';
import { FAIL_CODES } from './protectionWorking.ts';
import { flattenMessages, LazyFinding } from '../findings.ts';
import { cableLabel } from '../elementLabel.ts';
import type { CapacityMemo, ConductorFigures } from './capacityMemo.ts';
import { KIND_LOAD, type TreeInputs } from './treeInputs.ts';
import { cableIbA } from '../flow.ts';
import { motorStartFor } from '../motorStart.ts';
import { hypot } from '../hypot.ts';
import { faultMaxA, nodeName, type Loops, type PassArrays } from './passArrays.ts';
import type { PassContext, SegmentLoops } from './protectionPass.ts';

// The message makers of the checks, each naming its element when the message is first read.
type NodeEl = TreeInputs['nodes'][number] | undefined;
const ibInText = (c: Cable, ibA: number, inA: number) => msg.ibInFailMessage(cableLabel(c), ibA, inA);
const capacityText = (c: Cable, error: string) => msg.capacityErrorMessage(cableLabel(c), error);
const inIzText = (c: Cable, label: string, base: number, izA: number) =>
  msg.inIzFailMessage(cableLabel(c), label, base, izA);
const i2Text = (c: Cable, i2: number, lim: number) => msg.i2FailMessage(cableLabel(c), i2, lim);
const breakingText = (c: Cable, kA: number, breakingKa: number) =>
  msg.breakingFailMessage(cableLabel(c), kA, msg.sendingEnd(cableLabel(c)), breakingKa);
const cpcUnknownText = (c: Cable, why: string) => msg.cpcNotAssessedMessage(cableLabel(c), why);
const cpcText = (c: Cable, cpcMm2: number, sMin: number) => msg.cpcFailMessage(cableLabel(c), cpcMm2, sMin);
const zsNoDeviceText = (n: NodeEl, id: string) => zsMsg.zsNoDeviceMessage(nodeName(n, id));
const zsIaText = (n: NodeEl, id: string, error: string) => zsMsg.zsIaErrorMessage(nodeName(n, id), error);
const zsText = (n: NodeEl, id: string, zsOhm: number, zsMax: number, requiredS: number) =>
  zsMsg.zsFailMessage(nodeName(n, id), zsOhm, zsMax, requiredS);
const ttNoRcdText = (n: NodeEl, id: string) => zsMsg.ttNoRcdMessage(nodeName(n, id));
const ttNoRaText = (n: NodeEl, id: string) => zsMsg.ttNoRaMessage(nodeName(n, id));
const ttText = (n: NodeEl, id: string, volts: number) => zsMsg.ttFailMessage(nodeName(n, id), volts);
const checkText = (check: Check) => check.message;

/** Where the fuse data or the required time give no Ia (operatingCurrent answers with a reason). */
export function iaUnknown(device: Device, requiredS: number, fuses: FuseDataSet): boolean {
  if (device.type === 'mcb' || device.type === 'rcbo' || device.type === 'mccb') return false;
  if (!fuseRow(fuses, device.ratingA)) return true;
  return !(requiredS === 5 || requiredS === 0.4 || (requiredS > 0.4 && requiredS < 5));
}

/** The id maps motorStartFor reads (built only when a motor is met). */
function motorTopology(t: TreeInputs): Topology {
  return {
    order: [],
    nodeById: new Map(t.nodes.map((n) => [n.id, n])),
    cableById: new Map(t.cables.map((c) => [c.id, c])),
    feeding: new Map(),
    protecting: new Map(),
    circuit: new Map(),
  };
}

/**
 * Findings with the element they belong to (2 x v for the segment into node v, 2 x v + 1 for v
 * itself), put at their breadth-first position (2 x rank + 0 or 1) when sorted; the counts, and the
 * motor starting results met on the way.
 */
export class Tagged {
  readonly list: Finding[] = [];
  readonly tags: number[] = [];
  readonly motors = new Map<number, { result: MotorStartResult; check: Check }>();
  topology: Topology | undefined;
  /** The required disconnection time of the segment just checked, for its far node's check. */
  requiredS = 5;
  /** The segment being walked and the loops at its far node (fields, so figures pass unboxed). */
  readonly segment: SegmentLoops = { r1r2Hot: 0.5, r1r2Cold: 0.5, r1Cold: 0.5, xLen: 0.5 };
  readonly loops: Loops = {
    zhR: 0.5,
    zhX: 0.5,
    zcR: 0.5,
    flR: 0.5,
    flX: 0.5,
    fpR: 0.5,
    fpX: 0.5,
    three: false,
  };
  failed = 0;
  unassessed = 0;
  /** A failed check; its message is made from `args` when first read (see LazyFinding). */
  fail<A extends unknown[]>(
    place: number,
    key: CheckKey,
    elementId: string,
    make: (...args: A) => string,
    ...args: A
  ): void {
    this.failed++;
    this.list.push(new LazyFinding(FAIL_CODES[key], 'error', elementId, make, args));
    this.tags.push(place);
  }
  /** A check that cannot be assessed; its message is made as fail's is. */
  unknown<A extends unknown[]>(
    place: number,
    elementId: string,
    make: (...args: A) => string,
    ...args: A
  ): void {
    this.unassessed++;
    this.list.push(new LazyFinding('checkNotAssessed', 'warning', elementId, make, args));
    this.tags.push(place);
  }
  push(place: number, f: Finding): void {
    this.list.push(f);
    this.tags.push(place);
    // As each message is made, so its parts are garbage at once.
    flattenMessages(this.list, this.list.length - 1);
  }
  /** A reached segment whose conductor or cpc IEC 60228 does not list: no figures, one warning. */
  noResistance(t: TreeInputs, j: number, cable: Cable): void {
    this.push(2 * t.cableTo[j]!, {
      code: 'noResistance',
      severity: 'warning',
      elementId: cable.id,
      message: `${cableLabel(cable)}: IEC 60228 lists no resistance for ${cable.material} ${cable.sizeMm2} mm² or cpc ${cable.cpc.sizeMm2} mm²; choose a standard size`,
    });
  }
  /** A stable counting sort by breadth-first position onto `out` (`rank`: each node's). */
  appendSorted(out: Finding[], rank: Int32Array, tagCount: number): void {
    const n = this.list.length;
    if (n === 0) return;
    const tags = this.tags;
    // The element each finding belongs to, turned into its position: read for findings only.
    for (let i = 0; i < n; i++) tags[i] = 2 * rank[tags[i]! >> 1]! + (tags[i]! & 1);
    const start = new Int32Array(tagCount + 1);
    for (let i = 0; i < n; i++) start[tags[i]! + 1]!++;
    for (let k = 0; k < tagCount; k++) start[k + 1]! += start[k]!;
    const base = out.length;
    out.length = base + n;
    for (let i = 0; i < n; i++) out[base + start[tags[i]!]!++] = this.list[i]!;
  }
}

function deviceOf(cables: readonly Cable[], a: PassArrays, j: number): Device | null {
  const by = a.protBy[j]!;
  return by >= 0 ? (cables[by]!.device ?? null) : null;
}

/**
 * Segment `j` (from `u` to `v`): Ib <= In, In <= Iz, I2 <= 1.45 Iz, breaking capacity, cpc (as
 * cableChecks decides them). Sets the required disconnection time its far node's check uses.
 */
export function cableFindings(
  ctx: PassContext,
  a: PassArrays,
  memo: CapacityMemo,
  out: Tagged,
  j: number,
  v: number,
  u: number,
  cable: Cable,
  conductor: ConductorFigures,
): void {
  const { t, u0V, fuses, supply } = ctx;
  const tag = 2 * v;
  const id = cable.id;
  const device = deviceOf(t.cables, a, j);
  // With no device there is no In (NaN here, never read); kept a plain number for the optimiser.
  const inA = device ? settingA(device) : Number.NaN;
  if (device) {
    out.requiredS = requiredDisconnectionS(
      supply.earthing,
      a.circuit[j] ? 'distribution' : 'final',
      inA,
      u0V,
    );
  }
  const ibA = t.drop ? cableIbA(t.drop, j) : t.ibA(j);
  if (device && !(ibA <= inA)) out.fail(tag, 'ibIn', id, ibInText, cable, ibA, inA);
  const cap = memo.list[a.capAt[j]!]!;
  if ('error' in cap) {
    out.unknown(tag, id, capacityText, cable, cap.error);
  } else {
    const izA = cap.izA;
    const base = device ? inA : ibA;
    if (!(base <= izA)) out.fail(tag, 'inIz', id, inIzText, cable, device ? 'In' : 'Ib', base, izA);
    if (device) {
      const i2 = conventionalOperatingMultiple(device.type, inA) * inA;
      const lim = 1.45 * izA;
      if (!(i2 <= lim)) out.fail(tag, 'i2', id, i2Text, cable, i2, lim);
    }
  }
  const own = cable.device;
  if (own) {
    // The fault level at a sending end, worked out once per node: siblings share it.
    const r = a.slot[u]!;
    let kA = a.sendingKa[r]!;
    if (kA !== kA) {
      kA = faultMaxA(a, u, u0V) / 1000;
      a.sendingKa[r] = kA;
    }
    if (!(own.breakingKa >= kA)) out.fail(tag, 'breaking', id, breakingText, cable, kA, own.breakingKa);
  }
  // Adiabatic check on the cpc at the far end's earth fault current.
  const byTable = conductor.byTable;
  const earthFaultA = (CMIN * u0V) / hypot(out.loops.zhR, out.loops.zhX);
  const tS = device ? operatingTimeS(device, earthFaultA, fuses) : null;
  if (tS === null) {
    if (!byTable)
      out.unknown(tag, id, cpcUnknownText, cable, device ? msg.CPC_WHY_SLOW : msg.CPC_WHY_NO_DEVICE);
  } else {
    const sMin = msg.adiabaticMinimumMm2(earthFaultA, tS, conductor.cpcK);
    const cpcMm2 = cable.cpc.sizeMm2 * Math.max(1, cable.parallel);
    if (!(cpcMm2 >= sMin || byTable)) out.fail(tag, 'cpc', id, cpcText, cable, cpcMm2, sMin);
  }
}

/** Far node `v` of segment `j`: Zs against the device's maximum (zsChecks), TT touch voltage, motor dip. */
export function nodeFindings(ctx: PassContext, a: PassArrays, out: Tagged, j: number, v: number): void {
  const { t, u0V, fuses, supply } = ctx;
  const tag = 2 * v + 1;
  const zsOhm = hypot(out.loops.zhR, out.loops.zhX);
  const device = deviceOf(t.cables, a, j);
  if (!device) out.unknown(tag, t.nodeIds.at(v), zsNoDeviceText, t.nodes[v], t.nodeIds.at(v));
  else {
    const requiredS = out.requiredS;
    const rcd = device.rcd;
    const rcdLimit = rcd && rcd.idnMa > 0 ? 50 / (rcd.idnMa / 1000) : null;
    if (iaUnknown(device, requiredS, fuses)) {
      const pass = rcdLimit !== null ? zsOhm <= rcdLimit : null;
      if (pass !== true) {
        const ia = operatingCurrent(device, requiredS, fuses);
        const error = 'error' in ia ? ia.error : '';
        if (pass === false)
          out.fail(tag, 'zs', t.nodeIds.at(v), zsIaText, t.nodes[v], t.nodeIds.at(v), error);
        else out.unknown(tag, t.nodeIds.at(v), zsIaText, t.nodes[v], t.nodeIds.at(v), error);
      }
    } else {
      const zsMax = (CMIN * u0V) / operatingCurrentA(device, requiredS, fuses);
      const ok = zsOhm <= zsMax || (rcdLimit !== null && zsOhm <= rcdLimit);
      if (!ok)
        out.fail(tag, 'zs', t.nodeIds.at(v), zsText, t.nodes[v], t.nodeIds.at(v), zsOhm, zsMax, requiredS);
    }
    if (supply.earthing === 'TT') {
      const ra = supply.raOhm;
      if (!rcd || !(rcd.idnMa > 0))
        out.unknown(tag, t.nodeIds.at(v), ttNoRcdText, t.nodes[v], t.nodeIds.at(v));
      else if (ra === undefined) out.unknown(tag, t.nodeIds.at(v), ttNoRaText, t.nodes[v], t.nodeIds.at(v));
      else {
        const volts = ra * (rcd.idnMa / 1000);
        if (!(volts <= 50))
          out.fail(tag, 'rcdTouch', t.nodeIds.at(v), ttText, t.nodes[v], t.nodeIds.at(v), volts);
      }
    }
  }
  if (t.loadMotor[v] && t.nodeKind[v] === KIND_LOAD && ctx.results.loads[t.nodeIds.at(v)]) {
    const motor = motorStartFor(
      t.nodes[v] as Load,
      ctx.results,
      (out.topology ??= motorTopology(t)),
      ctx.source,
      u0V,
    );
    if (motor) {
      out.motors.set(v, motor);
      if (motor.check.pass === false) out.fail(tag, 'motorDip', t.nodeIds.at(v), checkText, motor.check);
      else if (motor.check.pass === null) out.unknown(tag, t.nodeIds.at(v), checkText, motor.check);
    }
  }
}
