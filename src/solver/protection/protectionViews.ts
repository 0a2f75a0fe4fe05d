/**
 * Protection results built when they are first read. A cable's or node's `protection` is attached
 * the first time its result is read through the returned records; its figures come from the pass
 * arrays, and its `checks` and `working` are built on first read of each (then kept). All are own
 * enumerable properties, so spreading, `JSON.stringify` and deep equality see every field.
 */
import type { Cable, Id, Supply } from '../../model/types.ts';
import type { CableResult, LoadResult, NodeResult, Results } from '../results.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import { CMIN, TEST_ZS_FACTOR, type FuseDataSet } from '../../catalogue/devices.ts';
import type { CableProtection, Check, MotorStartResult, NodeProtection } from './protectionResults.ts';
import type { Working } from '../results.ts';
import { cableCapacity } from './capacity.ts';
import { breakingCheck, capacityChecks, cpcCheck, sendingEnd } from './cableChecks.ts';
import { zsChecks } from './zsCheck.ts';
import { segmentLoop, type SourceImpedance } from './impedance.ts';
import { pfcWorking, r1r2Working, zsWorking } from './protectionWorking.ts';
import type { TreeInputs } from './treeInputs.ts';
import { faultLevelAt, faultMaxA, nodeName, type PassArrays } from './passArrays.ts';

export interface ViewContext {
  t: TreeInputs;
  a: PassArrays;
  supply: Supply;
  u0V: number;
  source: SourceImpedance;
  fuses: FuseDataSet;
  tables: readonly CapacityTable[];
  motors: ReadonlyMap<number, { result: MotorStartResult; check: Check }>;
}

function deviceOf(c: ViewContext, j: number) {
  const by = c.a.protBy[j]!;
  return by >= 0 ? (c.t.cables[by]!.device ?? null) : null;
}

export function cableProtection(c: ViewContext, j: number): CableProtection {
  const { a, t } = c;
  const cable: Cable = t.cables[j]!;
  const by = a.protBy[j]!;
  const device = deviceOf(c, j);
  const ibA = t.ibA(j);
  const capOk = a.capOk[j] === 1;
  const izA = capOk ? a.izA[j]! : null;
  let cap: ReturnType<typeof cableCapacity> | undefined;
  const capacity = () => (cap ??= cableCapacity(cable, c.tables));
  let checks: Check[] | undefined;
  let working: Working[] | undefined;
  return {
    device,
    deviceCableId: by >= 0 ? t.cables[by]!.id : null,
    circuit: a.circuit[j] ? 'distribution' : 'final',
    itA: capOk ? a.itA[j]! : null,
    izA,
    factors: capOk ? { ca: a.ca[j]!, cg: a.cg[j]!, ci: a.ci[j]! } : null,
    capacityUse: izA ? ibA / izA : null,
    r1r2HotOhm: a.r1r2Hot[j]!,
    r1r2ColdOhm: a.r1r2Cold[j]!,
    requiredTimeS: device ? a.requiredS[j]! : null,
    get checks(): Check[] {
      if (!checks) {
        checks = capacityChecks(cable, ibA, device, capacity());
        if (cable.device) {
          const maxA = faultMaxA(a, t.cableFrom[j]!, c.u0V);
          checks.push(breakingCheck(cable, cable.device, maxA, sendingEnd(cable.name)));
        }
        const v = t.cableTo[j]!;
        const earthFaultA = (CMIN * c.u0V) / Math.hypot(a.zhR[v]!, a.zhX[v]!);
        checks.push(cpcCheck(cable, device, earthFaultA, c.fuses));
      }
      return checks;
    },
    set checks(value: Check[]) {
      checks = value;
    },
    get working(): Working[] {
      if (!working) {
        const cp = capacity();
        working = [...('error' in cp ? [] : [cp.working]), r1r2Working(cable, segmentLoop(cable)!)];
      }
      return working;
    },
    set working(value: Working[]) {
      working = value;
    },
  };
}

export function nodeProtection(c: ViewContext, v: number): NodeProtection {
  const { a, t, u0V } = c;
  const zsOhm = Math.hypot(a.zhR[v]!, a.zhX[v]!);
  const zsMax = a.zsMaxKnown[v] ? a.zsMax[v]! : null;
  let checks: Check[] | undefined;
  let working: Working[] | undefined;
  const p: NodeProtection = {
    zsOhm,
    zs: { rOhm: a.zhR[v]!, xOhm: a.zhX[v]! },
    zsColdOhm: Math.hypot(a.zcR[v]!, a.zhX[v]!),
    zsMaxOhm: zsMax,
    testZsMaxOhm: zsMax === null ? null : TEST_ZS_FACTOR * zsMax,
    earthFaultA: (CMIN * u0V) / zsOhm,
    fault: faultLevelAt(a, v, u0V),
    get checks(): Check[] {
      if (!checks) {
        const j = v === t.root ? -1 : t.feeding[v]!;
        if (j < 0) checks = [];
        else {
          const device = deviceOf(c, j);
          const requiredS = device ? a.requiredS[j]! : 5;
          const id = t.cables[j]!.to;
          const name = nodeName(t.nodes[v], id);
          checks = zsChecks(name, zsOhm, device, requiredS, c.supply, c.fuses).checks;
          const motor = c.motors.get(v);
          if (motor) checks.push(motor.check);
        }
      }
      return checks;
    },
    set checks(value: Check[]) {
      checks = value;
    },
    get working(): Working[] {
      return (working ??= [zsWorking(c.supply, p), pfcWorking(c.source.basis, p, u0V)]);
    },
    set working(value: Working[]) {
      working = value;
    },
  };
  return p;
}

/**
 * A record over the drop results' record that attaches protection to each entry the first time it
 * is read. Writes and deletions go to the underlying record.
 */
function attachingRecord<T extends object>(
  inner: Record<Id, T>,
  done: WeakSet<object>,
  attach: (key: string, value: T) => void,
): Record<Id, T> {
  const read = (key: string | symbol): T | undefined => {
    const value = (inner as Record<string | symbol, T | undefined>)[key];
    if (typeof key === 'string' && typeof value === 'object' && value !== null && !done.has(value)) {
      done.add(value);
      attach(key, value);
    }
    return value;
  };
  return new Proxy(Object.create(null) as Record<Id, T>, {
    get: (_t, key) => read(key),
    has: (_t, key) => key in inner,
    ownKeys: () => Reflect.ownKeys(inner),
    getOwnPropertyDescriptor: (_t, key) => {
      if (!Object.prototype.hasOwnProperty.call(inner, key)) return undefined;
      return { value: read(key), writable: true, enumerable: true, configurable: true };
    },
    set: (_t, key, value: T) => Reflect.set(inner, key, value),
    defineProperty: (_t, key, descriptor) => Reflect.defineProperty(inner, key, descriptor),
    deleteProperty: (_t, key) => Reflect.deleteProperty(inner, key),
  });
}

/** The cables, nodes and loads records of the protected results. */
export function protectedRecords(
  c: ViewContext,
  results: Results,
): Pick<Results, 'cables' | 'nodes' | 'loads'> {
  const { a, t } = c;
  const done = new WeakSet<object>();
  const attachNode = (key: string, r: NodeResult) => {
    const v = t.nodeOf(key);
    if (v < 0 || !a.hasNode[v]) return;
    r.protection = nodeProtection(c, v);
    const motor = c.motors.get(v);
    if (motor) (r as LoadResult).motorStart = motor.result;
  };
  return {
    cables: attachingRecord<CableResult>(results.cables, done, (key, r) => {
      const j = t.cableOf(key);
      if (j >= 0 && a.hasCable[j] === 1) r.protection = cableProtection(c, j);
    }),
    nodes: attachingRecord<NodeResult>(results.nodes, done, attachNode),
    loads: attachingRecord<LoadResult>(results.loads, done, attachNode),
  };
}
