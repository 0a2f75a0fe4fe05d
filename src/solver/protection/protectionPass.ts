/**
 * The numeric protection pass: one walk outwards from the origin over flat arrays, accumulating
 * R1 + R2, Zs (R and X, hot and cold) and the fault loop, and deciding every check. It builds no
 * check or working object; a check that fails or cannot be assessed becomes a finding straight
 * away (its message from the same function the check object uses), everything else is read later
 * by the lazy protection objects (protectionViews.ts).
 */
import type { Cable, Device, Load, Supply } from '../../model/types.ts';
import type { Finding, Results } from '../results.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import { CMIN, conventionalOperatingMultiple, settingA, type FuseDataSet } from '../../catalogue/devices.ts';
import { cpcK, tableMinimumCpcMm2 } from '../../catalogue/kValues.ts';
import { atTemperature, resistance20OhmPerM } from '../../catalogue/iec60228.ts';
import type { Check, CheckKey, MotorStartResult } from './protectionResults.ts';
import type { Topology } from './topology.ts';
import * as msg from './cableChecks.ts';
import { zsFailMessage, zsIaErrorMessage, zsNoDeviceMessage } from './zsCheck.ts';
import { ttFailMessage, ttNoRaMessage, ttNoRcdMessage } from './zsCheck.ts';
import { capacityFigures } from './capacity.ts';
import {
  fuseRow,
  operatingCurrent,
  operatingCurrentA,
  operatingTimeS,
  requiredDisconnectionS,
} from './disconnection.ts';
import {
  cpcAtTemperature,
  cpcResistance20OhmPerM,
  operatingTempC,
  type SourceImpedance,
} from './impedance.ts';
import { FAIL_CODES } from './protectionWorking.ts';
import { KIND_BOARD, KIND_JUNCTION, type TreeInputs } from './treeInputs.ts';
import { motorStartFor } from '../motorStart.ts';
import { faultMaxA, nodeName, PassArrays } from './passArrays.ts';

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
  findings: Finding[];
  failed: number;
  unassessed: number;
  motors: Map<number, { result: MotorStartResult; check: Check }>;
}

/** Own device or, through a junction, the one upstream; final or distribution circuit. */
function circuits(t: TreeInputs, a: PassArrays): void {
  const { order, cables, cableFrom, cableTo, nodeKind, feeding } = t;
  for (let k = 0; k < t.orderLength; k++) {
    const j = order[k]!;
    if (cables[j]!.device) a.protBy[j] = j;
    else {
      const u = cableFrom[j]!;
      const parent = nodeKind[u] === KIND_JUNCTION ? feeding[u]! : -1;
      a.protBy[j] = parent >= 0 ? a.protBy[parent]! : -1;
    }
  }
  const distJunction = new Uint8Array(t.nodes.length);
  for (let k = t.orderLength - 1; k >= 0; k--) {
    const j = order[k]!;
    const v = cableTo[j]!;
    const dist = nodeKind[v] === KIND_BOARD || (nodeKind[v] === KIND_JUNCTION && distJunction[v] === 1);
    a.circuit[j] = dist ? 1 : 0;
    const u = cableFrom[j]!;
    if (dist && nodeKind[u] === KIND_JUNCTION) distJunction[u] = 1;
  }
}

/** Where the fuse data or the required time give no Ia (operatingCurrent answers with a reason). */
function iaUnknown(device: Device, requiredS: number, fuses: FuseDataSet): boolean {
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

export function protectionPass(ctx: PassContext, findings: Finding[]): PassOutcome {
  const { t, supply, u0V, fuses, tables } = ctx;
  const a = new PassArrays(t.nodes.length, t.cables.length);
  const motors = new Map<number, { result: MotorStartResult; check: Check }>();
  let failed = 0;
  let unassessed = 0;
  const fail = (key: CheckKey, elementId: string, message: string) => {
    failed++;
    findings.push({ code: FAIL_CODES[key], severity: 'error', elementId, message });
  };
  const unknown = (elementId: string, message: string) => {
    unassessed++;
    findings.push({ code: 'checkNotAssessed', severity: 'warning', elementId, message });
  };
  const out = { a, findings, failed, unassessed, motors };
  const root = t.root;
  if (root < 0) return out;
  a.seedSupply(root, supply, ctx.source);
  circuits(t, a);
  const { cables, nodes, order, cableFrom, cableTo } = t;
  const earthing = supply.earthing;
  let topo: Topology | undefined;
  const tt = earthing === 'TT';

  for (let k = 0; k < t.orderLength; k++) {
    const j = order[k]!;
    const u = cableFrom[j]!;
    const v = cableTo[j]!;
    if (!a.acc[u] || !t.cableHasResult[j]) continue;
    const cable: Cable = cables[j]!;
    const r1 = resistance20OhmPerM(cable.material, cable.sizeMm2);
    const r2 = cpcResistance20OhmPerM(cable.cpc);
    if (r1 === undefined || r2 === undefined) {
      findings.push({
        code: 'noResistance',
        severity: 'warning',
        elementId: cable.id,
        message: `cable ${cable.name}: IEC 60228 lists no resistance for ${cable.material} ${cable.sizeMm2} mm² or cpc ${cable.cpc.sizeMm2} mm²; choose a standard size`,
      });
      continue;
    }
    // The same expressions as segmentLoop, so the figures agree to the last bit.
    const tempC = operatingTempC(cable.insulation);
    const n = Math.max(1, cable.parallel);
    const lengthM = cable.lengthM;
    const hot = (atTemperature(r1, cable.material, tempC) + cpcAtTemperature(r2, cable.cpc, tempC)) * lengthM;
    const r1r2Hot = hot / n;
    const r1r2Cold = ((r1 + r2) * lengthM) / n;
    const r1Cold = (r1 * lengthM) / n;
    const xLen = (t.xOhmPerM[j]! * lengthM) / n;
    a.r1r2Hot[j] = r1r2Hot;
    a.r1r2Cold[j] = r1r2Cold;
    // The earth loop is line out and cpc back: its reactance is taken as twice the line's.
    a.zhR[v] = a.zhR[u]! + r1r2Hot;
    a.zhX[v] = a.zhX[u]! + 2 * xLen;
    a.zcR[v] = a.zcR[u]! + r1r2Cold;
    a.zcX[v] = a.zcX[u]! + 2 * xLen;
    a.flR[v] = a.flR[u]! + 2 * r1Cold;
    a.flX[v] = a.flX[u]! + 2 * xLen;
    a.fpR[v] = a.fpR[u]! + r1Cold;
    a.fpX[v] = a.fpX[u]! + xLen;
    a.three[v] = a.three[u] === 1 && cable.phases === 3 ? 1 : 0;
    a.acc[v] = 1;

    const by = a.protBy[j]!;
    const device = by >= 0 ? (cables[by]!.device ?? null) : null;
    const inA = device ? settingA(device) : null;
    const requiredS =
      device && inA !== null
        ? requiredDisconnectionS(earthing, a.circuit[j] ? 'distribution' : 'final', inA, u0V)
        : 0;
    a.requiredS[j] = requiredS;
    const ibA = t.ibA[j]!;
    const id = cable.id;
    const src = `cable ${cable.name}`;

    // Ib <= In, In (or Ib) <= Iz, I2 <= 1.45 Iz, as capacityChecks decides them.
    if (device && inA !== null && !(ibA <= inA)) fail('ibIn', id, msg.ibInFailMessage(src, ibA, inA));
    const cap = capacityFigures(cable, tables);
    if ('error' in cap) unknown(id, msg.capacityErrorMessage(src, cap.error));
    else {
      a.capOk[j] = 1;
      a.itA[j] = cap.itA;
      a.izA[j] = cap.izA;
      a.ca[j] = cap.ca;
      a.cg[j] = cap.cg;
      a.ci[j] = cap.ci;
      const base = inA ?? ibA;
      if (!(base <= cap.izA))
        fail('inIz', id, msg.inIzFailMessage(src, inA === null ? 'Ib' : 'In', base, cap.izA));
      if (device && inA !== null) {
        const i2 = conventionalOperatingMultiple(device.type, inA) * inA;
        const lim = 1.45 * cap.izA;
        if (!(i2 <= lim)) fail('i2', id, msg.i2FailMessage(src, i2, lim));
      }
    }
    if (cable.device) {
      const kA = faultMaxA(a, u, u0V) / 1000;
      if (!(cable.device.breakingKa >= kA))
        fail(
          'breaking',
          id,
          msg.breakingFailMessage(cable.name, kA, msg.sendingEnd(cable.name), cable.device.breakingKa),
        );
    }
    // Adiabatic check on the cpc at the far end's earth fault current, as cpcCheck decides it.
    const zsOhm = Math.hypot(a.zhR[v]!, a.zhX[v]!);
    const earthFaultA = (CMIN * u0V) / zsOhm;
    const cpcMm2 = cable.cpc.sizeMm2 * Math.max(1, cable.parallel);
    const byTable =
      cable.cpc.kind !== 'armour' &&
      cable.cpc.material === cable.material &&
      cable.cpc.sizeMm2 >= tableMinimumCpcMm2(cable.sizeMm2);
    const tS = device ? operatingTimeS(device, earthFaultA, fuses) : null;
    if (tS === null) {
      if (!byTable)
        unknown(id, msg.cpcNotAssessedMessage(cable.name, device ? msg.CPC_WHY_SLOW : msg.CPC_WHY_NO_DEVICE));
    } else {
      const sMin = msg.adiabaticMinimumMm2(earthFaultA, tS, cpcK(cable.cpc, cable.insulation).k);
      if (!(cpcMm2 >= sMin || byTable)) fail('cpc', id, msg.cpcFailMessage(cable.name, cpcMm2, sMin));
    }
    a.hasCable[j] = 1;

    // The node at the far end: Zs against the device's maximum (zsChecks), TT touch voltage, motor dip.
    a.hasNode[v] = 1;
    const node = nodes[v]!;
    const nid = cable.to;
    if (!device) unknown(nid, zsNoDeviceMessage(nodeName(node, nid)));
    else {
      const rcd = device.rcd;
      const rcdLimit = rcd && rcd.idnMa > 0 ? 50 / (rcd.idnMa / 1000) : null;
      if (iaUnknown(device, requiredS, fuses)) {
        const pass = rcdLimit !== null ? zsOhm <= rcdLimit : null;
        if (pass !== true) {
          const ia = operatingCurrent(device, requiredS, fuses);
          const text = zsIaErrorMessage(nodeName(node, nid), 'error' in ia ? ia.error : '');
          if (pass === false) fail('zs', nid, text);
          else unknown(nid, text);
        }
      } else {
        const zsMax = (CMIN * u0V) / operatingCurrentA(device, requiredS, fuses);
        a.zsMax[v] = zsMax;
        a.zsMaxKnown[v] = 1;
        const ok = zsOhm <= zsMax || (rcdLimit !== null && zsOhm <= rcdLimit);
        if (!ok) fail('zs', nid, zsFailMessage(nodeName(node, nid), zsOhm, zsMax, requiredS));
      }
      if (tt) {
        const ra = supply.raOhm;
        if (!rcd || !(rcd.idnMa > 0)) unknown(nid, ttNoRcdMessage(nodeName(node, nid)));
        else if (ra === undefined) unknown(nid, ttNoRaMessage(nodeName(node, nid)));
        else {
          const volts = ra * (rcd.idnMa / 1000);
          if (!(volts <= 50)) fail('rcdTouch', nid, ttFailMessage(nodeName(node, nid), volts));
        }
      }
    }
    if (node.kind === 'load' && (node as Load).motor && ctx.results.loads[nid]) {
      const motor = motorStartFor(node as Load, ctx.results, (topo ??= motorTopology(t)), ctx.source, u0V);
      if (motor) {
        motors.set(v, motor);
        if (motor.check.pass === false) fail('motorDip', nid, motor.check.message);
        else if (motor.check.pass === null) unknown(nid, motor.check.message);
      }
    }
  }
  out.failed = failed;
  out.unassessed = unassessed;
  return out;
}
