/**
 * The protection pass's working memory: per node the accumulated loop impedances (R and X apart),
 * per cable its capacity figures and the device that protects it, as flat typed arrays. Only what
 * the protection results cannot cheaply work out again is kept per element: they work out R1 + R2,
 * the required time and Zs max from the memo and the device when they are built.
 */
import type { NodeElement, Supply } from '../../model/types.ts';
import type { FaultLevel } from './protectionResults.ts';
import { C_MAX, type SourceImpedance } from './impedance.ts';
import { hypot } from '../hypot.ts';

export class PassArrays {
  /** 1 where the node has loop impedance figures (the supply and every node reached through a segment with resistances). */
  readonly acc: Uint8Array;
  /** 1 where the node gets a protection result. */
  readonly hasNode: Uint8Array;
  /** Zs hot and cold, the line-neutral fault loop and the per-phase fault impedance, ohms. */
  readonly zhR: Float64Array;
  readonly zhX: Float64Array;
  /** The cold loop's resistance (its reactance is the hot loop's, zhX). */
  readonly zcR: Float64Array;
  readonly flR: Float64Array;
  readonly flX: Float64Array;
  readonly fpR: Float64Array;
  readonly fpX: Float64Array;
  /** 1 where every segment from the origin is three-phase. */
  readonly three: Uint8Array;
  /** Scratch: the fault level at a node as a sending end, kA, worked out once (NaN until then). */
  readonly sendingKa: Float64Array;

  /** 1 where the cable gets a protection result, 2 where it is reached but has no resistance data. */
  readonly hasCable: Uint8Array;
  /** The cable whose device protects this one, -1 where none. */
  readonly protBy: Int32Array;
  /** 1 distribution circuit, 0 final circuit. */
  readonly circuit: Uint8Array;
  /** Position in the memo's list of the cable's capacity figures (or the reason there are none). */
  readonly capAt: Int32Array;

  constructor(n: number, m: number) {
    // One buffer for every array: one allocation per solve, not twenty.
    const f64 = 9 * n;
    const i32 = 2 * m;
    const u8 = 3 * n + 2 * m;
    const buffer = new ArrayBuffer(f64 * 8 + i32 * 4 + u8);
    let at = 0;
    const f = (len: number) => {
      const out = new Float64Array(buffer, at, len);
      at += len * 8;
      return out;
    };
    const i = (len: number) => {
      const out = new Int32Array(buffer, at, len);
      at += len * 4;
      return out;
    };
    const u = (len: number) => {
      const out = new Uint8Array(buffer, at, len);
      at += len;
      return out;
    };
    this.zhR = f(n);
    this.zhX = f(n);
    this.zcR = f(n);
    this.flR = f(n);
    this.flX = f(n);
    this.fpR = f(n);
    this.fpX = f(n);
    this.sendingKa = f(n).fill(NaN);
    this.protBy = i(m).fill(-1);
    this.capAt = i(m).fill(-1);
    this.acc = u(n);
    this.hasNode = u(n);
    this.three = u(n);
    this.hasCable = u(m);
    this.circuit = u(m);
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
  return (C_MAX * u0V) / hypot(a.flR[v]!, a.flX[v]!);
}

/** The larger of the line-neutral and three-phase fault currents: what breaking capacity meets. */
export function faultMaxA(a: PassArrays, v: number, u0V: number): number {
  const lnA = lineNeutralA(a, v, u0V);
  const lllA = a.three[v] ? (C_MAX * u0V) / hypot(a.fpR[v]!, a.fpX[v]!) : null;
  return Math.max(lnA, lllA ?? 0);
}

export function faultLevelAt(a: PassArrays, v: number, u0V: number): FaultLevel {
  const lnA = lineNeutralA(a, v, u0V);
  const lllA = a.three[v] ? (C_MAX * u0V) / hypot(a.fpR[v]!, a.fpX[v]!) : null;
  return { lnA, lllA, maxA: Math.max(lnA, lllA ?? 0), cMax: C_MAX };
}

/** "board DB2" for check messages. */
export function nodeName(node: NodeElement | undefined, id: string): string {
  return `${node?.kind ?? 'node'} ${node?.name ?? id}`;
}
