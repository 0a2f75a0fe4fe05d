/**
 * Independent check with a general-purpose library: the same radial network solved as a nodal
 * admittance system with mathjs complex matrices, one unknown per conductor (L1, L2, L3, N) per
 * node, loads as constant-current injections, the supply as fixed phase voltages and a zero
 * neutral. Node voltages (phase to neutral) must match the solver's phasors.
 */
import { describe, expect, it } from 'vitest';
import { complex, add, multiply, divide, subtract, zeros, lusolve, type Complex, type Matrix } from 'mathjs';
import { solveDrop } from '../../../src/solver/solveDrop.ts';
import { BUILTIN_CATALOGUE } from '../../../src/catalogue/builtinConductors.ts';
import { findConductor } from '../../../src/catalogue/conductorLookup.ts';
import type { ProjectDocument, Load } from '../../../src/model/types.ts';
import { network } from '../../fixtures/build.ts';

const ANGLE = { L1: 0, L2: (-2 * Math.PI) / 3, L3: (2 * Math.PI) / 3 } as const;
type Conductor = 'L1' | 'L2' | 'L3' | 'N';

function nodal(doc: ProjectDocument, u0: number) {
  const supply = doc.nodes.find((n) => n.kind === 'supply')!;
  // Conductors present at each node: from the cable feeding it.
  const present = new Map<string, Conductor[]>([[supply.id, ['L1', 'L2', 'L3', 'N']]]);
  const loads = new Map(doc.nodes.filter((n): n is Load => n.kind === 'load').map((n) => [n.id, n]));
  const phaseOfBranch = (to: string): Conductor[] => {
    // single-phase cable: the phase of the loads below it
    const stack = [to];
    while (stack.length) {
      const id = stack.pop()!;
      const l = loads.get(id);
      if (l) return [l.phase, 'N'];
      for (const c of doc.cables) if (c.from === id) stack.push(c.to);
    }
    return ['L1', 'N'];
  };
  for (const c of doc.cables)
    present.set(c.to, c.phases === 3 ? ['L1', 'L2', 'L3', 'N'] : phaseOfBranch(c.to));
  const unknown = new Map<string, number>();
  for (const [id, cs] of present)
    if (id !== supply.id) for (const k of cs) unknown.set(`${id}|${k}`, unknown.size);
  const n = unknown.size;
  const Y = zeros(n, n, 'dense') as Matrix;
  const J = zeros(n, 1, 'dense') as Matrix;
  const fixed = (key: string): Complex | undefined => {
    const [id, k] = key.split('|') as [string, Conductor];
    if (id !== supply.id) return undefined;
    return k === 'N' ? complex(0, 0) : complex({ r: u0, phi: ANGLE[k] });
  };
  const addY = (i: number, j: number, y: Complex) => Y.set([i, j], add(Y.get([i, j]), y));
  const addJ = (i: number, v: Complex) => J.set([i, 0], add(J.get([i, 0]), v));
  for (const c of doc.cables) {
    const row = findConductor(BUILTIN_CATALOGUE, c.material, c.insulation, c.construction, c.sizeMm2)!;
    const z = complex((row.rOhmPerM * c.lengthM) / c.parallel, (row.xOhmPerM * c.lengthM) / c.parallel);
    const y = divide(1, z) as Complex;
    for (const k of present.get(c.to)!) {
      const a = `${c.from}|${k}`;
      const b = `${c.to}|${k}`;
      const ia = unknown.get(a);
      const ib = unknown.get(b)!;
      addY(ib, ib, y);
      if (ia !== undefined) {
        addY(ia, ia, y);
        addY(ia, ib, multiply(-1, y) as Complex);
        addY(ib, ia, multiply(-1, y) as Complex);
      } else addJ(ib, multiply(y, fixed(a)!) as Complex);
    }
  }
  for (const l of loads.values()) {
    const amps = l.demand.value * l.demandFactor;
    const phi = Math.acos(l.powerFactor);
    for (const p of l.phases === 3 ? (['L1', 'L2', 'L3'] as const) : [l.phase]) {
      const i = complex({ r: amps, phi: ANGLE[p] - phi });
      addJ(unknown.get(`${l.id}|${p}`)!, multiply(-1, i) as Complex);
      addJ(unknown.get(`${l.id}|N`)!, i);
    }
  }
  const V = lusolve(Y, J) as Matrix;
  return (id: string, p: 'L1' | 'L2' | 'L3'): Complex =>
    subtract(V.get([unknown.get(`${id}|${p}`)!, 0]), V.get([unknown.get(`${id}|N`)!, 0])) as Complex;
}

describe('node voltages agree with a nodal admittance solution (mathjs)', () => {
  it('an unbalanced four-wire sub-main with single- and three-phase loads and a junction', () => {
    const doc = network()
      .supply('S')
      .board('DB1')
      .cable('SM1', 'S', 'DB1', { lengthM: 40, sizeMm2: 25, phases: 3 })
      .board('DB2')
      .cable('SM2', 'DB1', 'DB2', {
        lengthM: 70,
        sizeMm2: 10,
        phases: 3,
        construction: 'armouredMulticore',
        insulation: 'thermosetting90',
      })
      .load('A', { amps: 32, phase: 'L1', powerFactor: 0.9 })
      .cable('CA', 'DB1', 'A', { lengthM: 18, sizeMm2: 4 })
      .load('B', { amps: 12, phase: 'L2', powerFactor: 0.7 })
      .junction('J')
      .cable('CJ', 'DB2', 'J', { lengthM: 10, sizeMm2: 6 })
      .cable('CB', 'J', 'B', { lengthM: 12, sizeMm2: 2.5 })
      .load('M', { amps: 15, phases: 3, powerFactor: 0.8 })
      .cable('CM', 'DB2', 'M', { lengthM: 25, sizeMm2: 4, phases: 3 })
      .load('C', { amps: 7, phase: 'L3', demandFactor: 0.5 })
      .cable('CC', 'DB2', 'C', { lengthM: 30, sizeMm2: 1.5, parallel: 2 })
      .doc();
    const r = solveDrop(doc);
    expect(r.findings).toEqual([]);
    const v = nodal(doc, 230);
    for (const [id, phases] of [
      ['DB1', ['L1', 'L2', 'L3']],
      ['DB2', ['L1', 'L2', 'L3']],
      ['A', ['L1']],
      ['B', ['L2']],
      ['J', ['L2']],
      ['M', ['L1', 'L2', 'L3']],
      ['C', ['L3']],
    ] as const) {
      for (const p of phases) {
        const mine = r.nodes[id]!.voltagePhasorV![p]!;
        const ref = v(id, p);
        expect(Math.abs(mine.re - ref.re), `${id} ${p} re`).toBeLessThan(1e-9);
        expect(Math.abs(mine.im - ref.im), `${id} ${p} im`).toBeLessThan(1e-9);
        // the reported voltage (U0 minus the projected drops) differs from |V| only by the quadrature
        // part of the drops, second order: well under 0.2 % of U0 here
        expect(Math.abs(r.nodes[id]!.voltageV[p]! - Math.hypot(ref.re, ref.im))).toBeLessThan(0.002 * 230);
      }
    }
  });
});
