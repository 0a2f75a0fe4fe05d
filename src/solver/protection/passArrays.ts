/**
 * The protection pass's working memory: the accumulated loop impedances (R and X apart) of the nodes
 * that feed segments, per cable its capacity figures and the device that protects it, as flat typed
 * arrays. Only what the protection results cannot cheaply work out again is kept: they work out a
 * load's loops, R1 + R2, the required time and Zs max from the memo and the device when built.
 */
import type { NodeElement, Supply } from '../../model/types.ts';
import { elementLabel } from '../elementLabel.ts';
import type { FaultLevel } from './protectionResults.ts';
import { C_MAX, type SourceImpedance } from './impedance.ts';
import { hypot } from '../hypot.ts';

/** A node's accumulated loops: Zs hot (R, X) and cold (R), the line-neutral fault loop, the per-phase fault impedance. */
export interface Loops {
  zhR: number;
  zhX: number;
  zcR: number;
  flR: number;
  flX: number;
  fpR: number;
  fpX: number;
  /** Every segment from the origin three-phase. */
  three: boolean;
}

export class PassArrays {
  /** 1 where the node has loop impedance figures (the supply and every node reached through a segment with resistances). */
  readonly acc: Uint8Array;
  /** 1 where the node gets a protection result. */
  readonly hasNode: Uint8Array;
  /**
   * Where a node's loops are kept: only the origin and the nodes that feed a segment (boards and
   * junctions) have a place, -1 elsewhere. A load's loops are its parent's plus its own segment,
   * worked out again when its result is built (loopsAt), so most nodes cost no figures here.
   */
  readonly slot: Int32Array;
  /** By slot: Zs hot and cold, the line-neutral fault loop and the per-phase fault impedance, ohms. */
  readonly zhR: Float64Array;
  readonly zhX: Float64Array;
  /** The cold loop's resistance (its reactance is the hot loop's, zhX). */
  readonly zcR: Float64Array;
  readonly flR: Float64Array;
  readonly flX: Float64Array;
  readonly fpR: Float64Array;
  readonly fpX: Float64Array;
  /** By slot, scratch: the fault level at a sending end, kA, worked out once (NaN until then). */
  readonly sendingKa: Float64Array;
  /** By node: 1 where every segment from the origin is three-phase. */
  readonly three: Uint8Array;

  /** 1 where the cable gets a protection result, 2 where it is reached but has no resistance data. */
  readonly hasCable: Uint8Array;
  /** The cable whose device protects this one, -1 where none. */
  readonly protBy: Int32Array;
  /** 1 distribution circuit, 0 final circuit. */
  readonly circuit: Uint8Array;
  /** Position in the memo's list of the cable's capacity figures (or the reason there are none). */
  readonly capAt: Int32Array;

  /** Arrays for `n` nodes and `m` cables, `slots` of them with a place (see `slot`, filled by the caller). */
  constructor(n: number, m: number, slot: Int32Array, slots: number) {
    // One buffer for every array: one allocation per solve, not twenty.
    const f64 = 8 * slots;
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
    this.slot = slot;
    this.zhR = f(slots);
    this.zhX = f(slots);
    this.zcR = f(slots);
    this.flR = f(slots);
    this.flX = f(slots);
    this.fpR = f(slots);
    this.fpX = f(slots);
    this.sendingKa = f(slots).fill(Number.NaN);
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
    const r = this.slot[root]!;
    this.acc[root] = 1;
    this.zhR[r] = ze;
    this.zcR[r] = ze;
    this.flR[r] = source.loop.rOhm;
    this.flX[r] = source.loop.xOhm;
    this.fpR[r] = source.phase.rOhm;
    this.fpX[r] = source.phase.xOhm;
    this.three[root] = supply.phases === 3 ? 1 : 0;
  }

  /** The loops kept for a node with a place. */
  kept(v: number): Loops {
    const r = this.slot[v]!;
    return {
      zhR: this.zhR[r]!,
      zhX: this.zhX[r]!,
      zcR: this.zcR[r]!,
      flR: this.flR[r]!,
      flX: this.flX[r]!,
      fpR: this.fpR[r]!,
      fpX: this.fpX[r]!,
      three: this.three[v] === 1,
    };
  }
}

/** The larger of the line-neutral and three-phase fault currents at a sending end (cables at 20 °C, cmax): what breaking capacity meets. */
export function faultMaxA(a: PassArrays, u: number, u0V: number): number {
  const r = a.slot[u]!;
  const lnA = (C_MAX * u0V) / hypot(a.flR[r]!, a.flX[r]!);
  const lllA = a.three[u] ? (C_MAX * u0V) / hypot(a.fpR[r]!, a.fpX[r]!) : 0;
  return Math.max(lnA, lllA);
}

/** Prospective fault currents at a node from its loops (cables at 20 °C, cmax). */
export function faultLevelOf(loops: Loops, u0V: number): FaultLevel {
  const lnA = (C_MAX * u0V) / hypot(loops.flR, loops.flX);
  const lllA = loops.three ? (C_MAX * u0V) / hypot(loops.fpR, loops.fpX) : null;
  return { lnA, lllA, maxA: Math.max(lnA, lllA ?? 0), cMax: C_MAX };
}

/** "board DB2 (Offices board)" for check messages. */
export function nodeName(node: NodeElement | undefined, id: string): string {
  return elementLabel(node?.kind ?? 'node', id, node?.name);
}
