/**
 * Protection results built when they are first read. A cable's or node's `protection` is attached
 * the first time its result is read through the returned records; its figures come from the pass
 * arrays, and its `checks` and `working` are built on first read of each (then kept).
 */
import type { Cable, Device, Id, Supply } from '../../model/types.ts';
import type { CableResult, LoadResult, NodeResult, Results } from '../results.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import { CMIN, TEST_ZS_FACTOR, settingA, type FuseDataSet } from '../../catalogue/devices.ts';
import type {
  CableProtection,
  Check,
  FaultLevel,
  Impedance,
  MotorStartResult,
  NodeProtection,
} from './protectionResults.ts';
import type { Working } from '../results.ts';
import { cableCapacity } from './capacity.ts';
import { breakingCheck, capacityChecks, cpcCheck, sendingEnd } from './cableChecks.ts';
import { cableLabel } from '../elementLabel.ts';
import { zsChecks } from './zsCheck.ts';
import { segmentLoop, type SourceImpedance } from './impedance.ts';
import { pfcWorking, r1r2Working, zsWorking } from './protectionWorking.ts';
import type { TreeInputs } from './treeInputs.ts';
import { faultLevelOf, faultMaxA, nodeName, type Loops, type PassArrays } from './passArrays.ts';
import { loopsBeyond, segmentLoops, type SegmentLoops } from './protectionPass.ts';
import { hypot } from '../hypot.ts';
import type { CapacityMemo } from './capacityMemo.ts';
import { operatingCurrentA, requiredDisconnectionS } from './disconnection.ts';
import { iaUnknown } from './protectionFindings.ts';

export interface ViewContext {
  t: TreeInputs;
  a: PassArrays;
  memo: CapacityMemo;
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

/**
 * The loops at node `v`: kept where it feeds segments, else its parent's plus its own segment (the
 * same expressions as the pass's walk, so the same figures).
 */
function loopsAt(c: ViewContext, v: number): Loops {
  const { a, t } = c;
  if (a.slot[v]! >= 0) return a.kept(v);
  const j = t.feeding[v]!;
  const cable = t.cables[j]!;
  const seg: SegmentLoops = { r1r2Hot: 0, r1r2Cold: 0, r1Cold: 0, xLen: 0 };
  segmentLoops(t, cable, j, c.memo.conductor(cable), seg);
  const at: Loops = { zhR: 0, zhX: 0, zcR: 0, flR: 0, flX: 0, fpR: 0, fpX: 0, three: a.three[v] === 1 };
  loopsBeyond(a, t.cableFrom[j]!, seg, at);
  return at;
}

/** The disconnection time segment `j`'s circuit needs with its device (as the pass decided it). */
function requiredTimeS(c: ViewContext, j: number, device: Device): number {
  return requiredDisconnectionS(
    c.supply.earthing,
    c.a.circuit[j] ? 'distribution' : 'final',
    settingA(device),
    c.u0V,
  );
}

/**
 * A segment's protection result. The figures are own fields (spreading copies them); `checks` and
 * `working` are built on first read and kept, like the drop results' `working` (read them, they are
 * not copied by `{...p}`); `toJSON` includes both.
 */
export class CableProtectionView implements CableProtection {
  device: Device | null;
  deviceCableId: Id | null;
  circuit: 'final' | 'distribution';
  itA: number | null;
  izA: number | null;
  factors: { ca: number; cg: number; ci: number } | null;
  capacityUse: number | null;
  r1r2HotOhm: number;
  r1r2ColdOhm: number;
  requiredTimeS: number | null;
  readonly #c: ViewContext;
  readonly #j: number;
  #ibA: number;
  #cap: ReturnType<typeof cableCapacity> | undefined;
  #checks: Check[] | undefined;
  #working: Working[] | undefined;

  constructor(c: ViewContext, j: number) {
    const { a, t } = c;
    this.#c = c;
    this.#j = j;
    const by = a.protBy[j]!;
    const device = deviceOf(c, j);
    const ibA = t.ibA(j);
    this.#ibA = ibA;
    const cap = c.memo.list[a.capAt[j]!];
    const figures = cap && !('error' in cap) ? cap : null;
    const izA = figures ? figures.izA : null;
    this.device = device;
    this.deviceCableId = by >= 0 ? t.cables[by]!.id : null;
    this.circuit = a.circuit[j] ? 'distribution' : 'final';
    this.itA = figures ? figures.itA : null;
    this.izA = izA;
    this.factors = figures ? { ca: figures.ca, cg: figures.cg, ci: figures.ci } : null;
    this.capacityUse = izA ? ibA / izA : null;
    // The same expressions as the pass's walk, from the same per-metre figures.
    const cable = t.cables[j]!;
    const conductor = c.memo.conductor(cable);
    const n = Math.max(1, cable.parallel);
    this.r1r2HotOhm = (conductor.r1r2HotPerM * cable.lengthM) / n;
    this.r1r2ColdOhm = (conductor.r1r2ColdPerM * cable.lengthM) / n;
    this.requiredTimeS = device ? requiredTimeS(c, j, device) : null;
  }

  #capacity() {
    return (this.#cap ??= cableCapacity(this.#c.t.cables[this.#j]!, this.#c.tables));
  }

  /** Ib <= In, In <= Iz, I2 <= 1.45 Iz, breaking capacity and the cpc, each with its working. */
  get checks(): Check[] {
    if (!this.#checks) {
      const { a, t, u0V, fuses } = this.#c;
      const j = this.#j;
      const cable: Cable = t.cables[j]!;
      const checks = capacityChecks(cable, this.#ibA, this.device, this.#capacity());
      if (cable.device) {
        const maxA = faultMaxA(a, t.cableFrom[j]!, u0V);
        checks.push(breakingCheck(cable, cable.device, maxA, sendingEnd(cableLabel(cable))));
      }
      const v = t.cableTo[j]!;
      const far = loopsAt(this.#c, v);
      const earthFaultA = (CMIN * u0V) / hypot(far.zhR, far.zhX);
      checks.push(cpcCheck(cable, this.device, earthFaultA, fuses));
      this.#checks = checks;
    }
    return this.#checks;
  }
  set checks(value: Check[]) {
    this.#checks = value;
  }

  /** Working of Iz and R1 + R2. */
  get working(): Working[] {
    if (!this.#working) {
      const cable = this.#c.t.cables[this.#j]!;
      const cp = this.#capacity();
      this.#working = [...('error' in cp ? [] : [cp.working]), r1r2Working(cable, segmentLoop(cable)!)];
    }
    return this.#working;
  }
  set working(value: Working[]) {
    this.#working = value;
  }

  toJSON(): Record<string, unknown> {
    return { ...(this as object), checks: this.checks, working: this.working };
  }
}

/** A node's loop impedance and fault level; `checks` and `working` as for CableProtectionView. */
export class NodeProtectionView implements NodeProtection {
  zsOhm: number;
  zs: Impedance;
  zsColdOhm: number;
  zsMaxOhm: number | null;
  testZsMaxOhm: number | null;
  earthFaultA: number;
  fault: FaultLevel;
  readonly #c: ViewContext;
  readonly #v: number;
  #checks: Check[] | undefined;
  #working: Working[] | undefined;

  constructor(c: ViewContext, v: number) {
    const { t, u0V, fuses } = c;
    this.#c = c;
    this.#v = v;
    const loops = loopsAt(c, v);
    const zsOhm = hypot(loops.zhR, loops.zhX);
    // Zs max for the protecting device, as the pass's node check works it out.
    const j = v === t.root ? -1 : t.feeding[v]!;
    const device = j >= 0 ? deviceOf(c, j) : null;
    const requiredS = device ? requiredTimeS(c, j, device) : 5;
    const zsMax =
      device && !iaUnknown(device, requiredS, fuses)
        ? (CMIN * u0V) / operatingCurrentA(device, requiredS, fuses)
        : null;
    this.zsOhm = zsOhm;
    this.zs = { rOhm: loops.zhR, xOhm: loops.zhX };
    // The cold loop has the hot loop's reactance.
    this.zsColdOhm = hypot(loops.zcR, loops.zhX);
    this.zsMaxOhm = zsMax;
    this.testZsMaxOhm = zsMax === null ? null : TEST_ZS_FACTOR * zsMax;
    this.earthFaultA = (CMIN * u0V) / zsOhm;
    this.fault = faultLevelOf(loops, u0V);
  }

  /** Zs against the device's maximum, the TT touch-voltage condition and a motor's starting dip. */
  get checks(): Check[] {
    if (!this.#checks) {
      const c = this.#c;
      const { t } = c;
      const v = this.#v;
      const j = v === t.root ? -1 : t.feeding[v]!;
      if (j < 0) this.#checks = [];
      else {
        const device = deviceOf(c, j);
        const requiredS = device ? requiredTimeS(c, j, device) : 5;
        const name = nodeName(t.nodes[v], t.cables[j]!.to);
        const checks = zsChecks(name, this.zsOhm, device, requiredS, c.supply, c.fuses).checks;
        const motor = c.motors.get(v);
        if (motor) checks.push(motor.check);
        this.#checks = checks;
      }
    }
    return this.#checks;
  }
  set checks(value: Check[]) {
    this.#checks = value;
  }

  /** Working of Zs and the prospective fault current. */
  get working(): Working[] {
    return (this.#working ??= [
      zsWorking(this.#c.supply, this),
      pfcWorking(this.#c.source.basis, this, this.#c.u0V),
    ]);
  }
  set working(value: Working[]) {
    this.#working = value;
  }

  toJSON(): Record<string, unknown> {
    return { ...(this as object), checks: this.checks, working: this.working };
  }
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
  const attachOnce = (key: string | symbol, value: unknown) => {
    if (typeof key === 'string' && typeof value === 'object' && value !== null && !done.has(value)) {
      done.add(value);
      attach(key, value as T);
    }
  };
  const read = (key: string | symbol): T | undefined => {
    const value = (inner as Record<string | symbol, T | undefined>)[key];
    attachOnce(key, value);
    return value;
  };
  return new Proxy(Object.create(null) as Record<Id, T>, {
    get: (_t, key) => read(key),
    has: (_t, key) => key in inner,
    ownKeys: () => Reflect.ownKeys(inner),
    getOwnPropertyDescriptor: (_t, key) => {
      // One look-up in the underlying record (which builds the entry), not a test and a read.
      const d = Reflect.getOwnPropertyDescriptor(inner, key);
      if (!d) return undefined;
      const value = 'value' in d ? (d.value as unknown) : read(key);
      attachOnce(key, value);
      return { value, writable: true, enumerable: true, configurable: true };
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
    r.protection = new NodeProtectionView(c, v);
    const motor = c.motors.get(v);
    if (motor) (r as LoadResult).motorStart = motor.result;
  };
  return {
    cables: attachingRecord<CableResult>(results.cables, done, (key, r) => {
      const j = t.cableOf(key);
      if (j >= 0 && a.hasCable[j] === 1) r.protection = new CableProtectionView(c, j);
    }),
    nodes: attachingRecord<NodeResult>(results.nodes, done, attachNode),
    loads: attachingRecord<LoadResult>(results.loads, done, attachNode),
  };
}
