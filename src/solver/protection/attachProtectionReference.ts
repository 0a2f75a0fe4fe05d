/**
 * The straightforward eager form of attachProtection: every protection object, check and working
 * record is built as it goes. Kept as the oracle the fast pass is tested against
 * (tests/property/protectionOracle.test.ts); solve uses attachProtection.
 */
import type { Id, ProjectDocument, Supply } from '../../model/types.ts';
import type { Finding, Results } from '../results.ts';
import type { CatalogueSet } from '../../catalogue/catalogueSet.ts';
import { BUILT_IN_GG_FUSES, CMIN, settingA, type FuseDataSet } from '../../catalogue/devices.ts';
import { BUILT_IN_CAPACITY_TABLES, type CapacityTable } from '../../catalogue/capacityTables.ts';
import type { Check, FaultLevel, Impedance, NodeProtection } from './protectionResults.ts';
import { buildTopology } from './topology.ts';
import { cableCapacity } from './capacity.ts';
import { breakingCheck, capacityChecks, cpcCheck, sendingEnd } from './cableChecks.ts';
import { cableLabel, elementLabel } from '../elementLabel.ts';
import { zsChecks } from './zsCheck.ts';
import { requiredDisconnectionS } from './disconnection.ts';
import { C_MAX, magnitude, segmentLoop, sourceImpedance } from './impedance.ts';
import { FAIL_CODES, REFERENCES, pfcWorking, r1r2Working, zsWorking } from './protectionWorking.ts';
import { motorStartFor } from '../motorStart.ts';
import { boardBalances } from '../balancePhases.ts';

/** Optional protection data a catalogue may carry; the built-in sets are used where absent. */
interface ProtectionData {
  ggFuses?: FuseDataSet;
  capacityTables?: readonly CapacityTable[];
}

interface Acc {
  zsHot: Impedance;
  zsCold: Impedance;
  faultLoop: Impedance;
  faultPhase: Impedance;
  threePhase: boolean;
}

function add(a: Impedance, r: number, x: number): Impedance {
  return { rOhm: a.rOhm + r, xOhm: a.xOhm + x };
}

function faultLevel(acc: Acc, u0V: number): FaultLevel {
  const lnA = (C_MAX * u0V) / magnitude(acc.faultLoop);
  const lllA = acc.threePhase ? (C_MAX * u0V) / magnitude(acc.faultPhase) : null;
  return { lnA, lllA, maxA: Math.max(lnA, lllA ?? 0), cMax: C_MAX };
}

/**
 * Adds `protection` to every fed cable and node, `motorStart` to motor loads and a summary with
 * failed-check counts and phase balance; each failed check also becomes an error finding.
 * @example attachProtectionReference(doc, solveDrop(doc)).nodes['DB1'].protection?.zsOhm
 */
export function attachProtectionReference(
  doc: ProjectDocument,
  results: Results,
  catalogue?: CatalogueSet,
): Results {
  const data = (catalogue ?? {}) as ProtectionData;
  const fuses = data.ggFuses ?? BUILT_IN_GG_FUSES;
  const tables = data.capacityTables ?? BUILT_IN_CAPACITY_TABLES;
  const findings: Finding[] = [...results.findings];
  const supply = doc.nodes.find((n): n is Supply => n.kind === 'supply');
  const source = supply ? sourceImpedance(supply, doc.settings) : undefined;
  if (!supply || !source) {
    findings.push({
      code: 'noFaultLevel',
      severity: 'warning',
      elementId: supply?.id,
      message: supply
        ? `${elementLabel('supply', supply.id, supply.name)}: pfcKa must be above 0 (or give a transformer for a private supply) to compute fault levels and loop impedance`
        : 'no supply: loop impedance and fault level cannot be computed',
    });
    return { ...results, findings };
  }
  const topo = buildTopology(doc, results);
  const u0 = supply.u0V;
  // The drop results are objects with computed getters: spreading would lose them, so the
  // protection fields are added to each object in place (solve builds fresh results every time).
  const { cables, nodes, loads } = results;
  const acc = new Map<Id, Acc>();
  const ze = Math.max(0, supply.zeOhm);
  acc.set(supply.id, {
    zsHot: { rOhm: ze, xOhm: 0 },
    zsCold: { rOhm: ze, xOhm: 0 },
    faultLoop: source.loop,
    faultPhase: source.phase,
    threePhase: supply.phases === 3,
  });
  let failed = 0;
  let unassessed = 0;
  const tally = (checks: Check[], elementId: Id) => {
    for (const c of checks) {
      if (c.pass === false) {
        failed++;
        findings.push({ code: FAIL_CODES[c.key], severity: 'error', elementId, message: c.message });
      } else if (c.pass === null) {
        unassessed++;
        findings.push({ code: 'checkNotAssessed', severity: 'warning', elementId, message: c.message });
      }
    }
  };
  const nodeProtection = (a: Acc, checks: Check[], zsMax: number | null, testMax: number | null) => {
    const zsOhm = magnitude(a.zsHot);
    const p: NodeProtection = {
      zsOhm,
      zs: a.zsHot,
      zsColdOhm: magnitude(a.zsCold),
      zsMaxOhm: zsMax,
      testZsMaxOhm: testMax,
      earthFaultA: (CMIN * u0) / zsOhm,
      fault: faultLevel(a, u0),
      checks,
      working: [],
    };
    p.working.push(zsWorking(supply, p), pfcWorking(source.basis, p, u0));
    return p;
  };
  const supplyResult = nodes[supply.id];
  const supplyAcc = acc.get(supply.id)!;
  if (supplyResult) supplyResult.protection = nodeProtection(supplyAcc, [], null, null);

  for (const cable of topo.order) {
    const up = acc.get(cable.from);
    const cr = cables[cable.id];
    if (!up || !cr) continue;
    const seg = segmentLoop(cable);
    if (!seg) {
      findings.push({
        code: 'noResistance',
        severity: 'warning',
        elementId: cable.id,
        message: `${cableLabel(cable)}: IEC 60228 lists no resistance for ${cable.material} ${cable.sizeMm2} mm² or cpc ${cable.cpc.sizeMm2} mm²; choose a standard size`,
      });
      continue;
    }
    // cr.xOhmPerM already combines parallel cables (the drop solver divides by their number).
    const xLen = cr.xOhmPerM * cable.lengthM;
    const a: Acc = {
      // The earth loop is line out and cpc back: its reactance is taken as twice the line's.
      zsHot: add(up.zsHot, seg.r1r2HotOhm, 2 * xLen),
      zsCold: add(up.zsCold, seg.r1r2ColdOhm, 2 * xLen),
      faultLoop: add(up.faultLoop, 2 * seg.r1ColdOhm, 2 * xLen),
      faultPhase: add(up.faultPhase, seg.r1ColdOhm, xLen),
      threePhase: up.threePhase && cable.phases === 3,
    };
    acc.set(cable.to, a);
    const prot = topo.protecting.get(cable.id) ?? { device: null, cableId: null };
    const device = prot.device;
    const circuit = topo.circuit.get(cable.id) ?? 'final';
    const requiredS = device ? requiredDisconnectionS(supply.earthing, circuit, settingA(device), u0) : null;
    const toNode = topo.nodeById.get(cable.to);
    const nodeName = elementLabel(toNode?.kind ?? 'node', cable.to, toNode?.name);

    const cap = cableCapacity(cable, tables);
    const checks = capacityChecks(cable, cr.ibA, device, cap);
    if (cable.device) {
      const f = faultLevel(up, u0);
      checks.push(breakingCheck(cable, cable.device, f.maxA, sendingEnd(cableLabel(cable))));
    }
    const zsOhm = magnitude(a.zsHot);
    const earthFaultA = (CMIN * u0) / zsOhm;
    checks.push(cpcCheck(cable, device, earthFaultA, fuses));
    tally(checks, cable.id);
    const izA = 'error' in cap ? null : cap.izA;
    cr.protection = {
      device,
      deviceCableId: prot.cableId,
      circuit,
      itA: 'error' in cap ? null : cap.itA,
      izA,
      factors: 'error' in cap ? null : { ca: cap.ca, cg: cap.cg, ci: cap.ci },
      capacityUse: izA ? cr.ibA / izA : null,
      r1r2HotOhm: seg.r1r2HotOhm,
      r1r2ColdOhm: seg.r1r2ColdOhm,
      requiredTimeS: requiredS,
      checks,
      working: [...('error' in cap ? [] : [cap.working]), r1r2Working(cable, seg)],
    };

    const nr = nodes[cable.to];
    if (!nr) continue;
    const zs = zsChecks(nodeName, zsOhm, device, requiredS ?? 5, supply, fuses);
    const nodeChecks = zs.checks;
    nr.protection = nodeProtection(a, nodeChecks, zs.zsMaxOhm, zs.testZsMaxOhm);
    const lr = loads[cable.to];
    const ld = toNode?.kind === 'load' ? toNode : undefined;
    if (lr && ld?.motor) {
      const motor = motorStartFor(ld, results, topo, source, u0);
      if (motor) {
        lr.motorStart = motor.result;
        nodeChecks.push(motor.check);
      }
    }
    tally(nodeChecks, cable.to);
  }

  return {
    ...results,
    findings,
    references: [...results.references, ...REFERENCES.filter((r) => !results.references.includes(r))],
    protection: {
      failedChecks: failed,
      unassessedChecks: unassessed,
      balance: boardBalances(doc, results),
      fuseDataSet: { id: fuses.id, title: fuses.title, source: fuses.source },
      capacityDataSets: [...new Set(tables.map((t) => t.title))],
    },
  };
}
