/**
 * The protection pass's working memory: per node the accumulated loop impedances (R and X apart),
 * per cable R1 + R2, capacity and the device that protects it, as flat typed arrays.
 */
import type { NodeElement, Supply } from '../../model/types.ts';
import type { FaultLevel } from './protectionResults.ts';
import { C_MAX, type SourceImpedance } from './impedance.ts';

export class PassArrays {
  /** 1 where the node has loop impedance figures (the supply and every node reached through a segment with resistances). */
  readonly acc: Uint8Array;
  /** 1 where the node gets a protection result. */
  readonly hasNode: Uint8Array;
  /** Zs hot and cold, the line-neutral fault loop and the per-phase fault impedance, ohms. */
  readonly zhR: Float64Array;
  readonly zhX: Float64Array;
  readonly zcR: Float64Array;
  readonly zcX: Float64Array;
  readonly flR: Float64Array;
  readonly flX: Float64Array;
  readonly fpR: Float64Array;
  readonly fpX: Float64Array;
  /** 1 where every segment from the origin is three-phase. */
  readonly three: Uint8Array;
  readonly zsMax: Float64Array;
  readonly zsMaxKnown: Uint8Array;

  /** 1 where the cable gets a protection result. */
  readonly hasCable: Uint8Array;
  /** The cable whose device protects this one, -1 where none. */
  readonly protBy: Int32Array;
  /** 1 distribution circuit, 0 final circuit. */
  readonly circuit: Uint8Array;
  readonly requiredS: Float64Array;
  readonly r1r2Hot: Float64Array;
  readonly r1r2Cold: Float64Array;
  readonly capOk: Uint8Array;
  readonly itA: Float64Array;
  readonly izA: Float64Array;
  readonly ca: Float64Array;
  readonly cg: Float64Array;
  readonly ci: Float64Array;

  constructor(n: number, m: number) {
    this.acc = new Uint8Array(n);
    this.hasNode = new Uint8Array(n);
    this.zhR = new Float64Array(n);
    this.zhX = new Float64Array(n);
    this.zcR = new Float64Array(n);
    this.zcX = new Float64Array(n);
    this.flR = new Float64Array(n);
    this.flX = new Float64Array(n);
    this.fpR = new Float64Array(n);
    this.fpX = new Float64Array(n);
    this.three = new Uint8Array(n);
    this.zsMax = new Float64Array(n);
    this.zsMaxKnown = new Uint8Array(n);
    this.hasCable = new Uint8Array(m);
    this.protBy = new Int32Array(m).fill(-1);
    this.circuit = new Uint8Array(m);
    this.requiredS = new Float64Array(m);
    this.r1r2Hot = new Float64Array(m);
    this.r1r2Cold = new Float64Array(m);
    this.capOk = new Uint8Array(m);
    this.itA = new Float64Array(m);
    this.izA = new Float64Array(m);
    this.ca = new Float64Array(m);
    this.cg = new Float64Array(m);
    this.ci = new Float64Array(m);
  }

  /** The origin: Ze for the earth loop, the source impedance for fault level. */
  seedSupply(root: number, supply: Supply, source: SourceImpedance): void {
    const ze = Math.max(0, supply.zeOhm);
    this.acc[root] = 1;
    this.zhR[root] = ze;
    this.zcR[root] = ze;
    this.flR[root] = source.loop.rOhm;
    this.flX[root] = source.loop.xOhm;
    this.fpR[root] = source.phase.rOhm;
    this.fpX[root] = source.phase.xOhm;
    this.three[root] = supply.phases === 3 ? 1 : 0;
  }
}

/** Line-neutral prospective fault current at a node (cables at 20 °C, cmax). */
function lineNeutralA(a: PassArrays, v: number, u0V: number): number {
  return (C_MAX * u0V) / Math.hypot(a.flR[v]!, a.flX[v]!);
}

/** The larger of the line-neutral and three-phase fault currents: what breaking capacity meets. */
export function faultMaxA(a: PassArrays, v: number, u0V: number): number {
  const lnA = lineNeutralA(a, v, u0V);
  const lllA = a.three[v] ? (C_MAX * u0V) / Math.hypot(a.fpR[v]!, a.fpX[v]!) : null;
  return Math.max(lnA, lllA ?? 0);
}

export function faultLevelAt(a: PassArrays, v: number, u0V: number): FaultLevel {
  const lnA = lineNeutralA(a, v, u0V);
  const lllA = a.three[v] ? (C_MAX * u0V) / Math.hypot(a.fpR[v]!, a.fpX[v]!) : null;
  return { lnA, lllA, maxA: Math.max(lnA, lllA ?? 0), cMax: C_MAX };
}

/** "board DB2" for check messages. */
export function nodeName(node: NodeElement | undefined, id: string): string {
  return `${node?.kind ?? 'node'} ${node?.name ?? id}`;
}
