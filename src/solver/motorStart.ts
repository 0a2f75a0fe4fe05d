/**
 * Motor starting dip: the starting current drawn through the source and every segment on the motor's
 * path, at the starting power factor, as a share of U0, at the motor and at its board.
 */
import type { Id, Load } from '../model/types.ts';
import { elementLabel } from './elementLabel.ts';
import type { Results } from './results.ts';
import type { Check, Impedance, MotorStartResult } from './protection/protectionResults.ts';
import type { Topology } from './protection/topology.ts';
import { check } from './protection/cableChecks.ts';
import { fmt, working } from './protection/working.ts';

/**
 * Dip in percent of U0 for a current drawn through a series impedance at a power factor:
 * ΔU ≈ I (R cos φ + X sin φ), the usual approximation for small dips.
 * @example dipPct(300, { rOhm: 0.1, xOhm: 0.02 }, 0.3, 230) // ≈ 6.40
 */
export function dipPct(currentA: number, z: Impedance, powerFactor: number, u0V: number): number {
  const sin = Math.sqrt(Math.max(0, 1 - powerFactor * powerFactor));
  return (100 * currentA * (z.rOhm * powerFactor + z.xOhm * sin)) / u0V;
}

export function motorStartFor(
  load: Load,
  results: Results,
  topo: Topology,
  source: { loop: Impedance; phase: Impedance },
  u0V: number,
): { result: MotorStartResult; check: Check } | undefined {
  const m = load.motor;
  const lr = results.loads[load.id];
  if (!m || !lr) return undefined;
  const running = Math.max(lr.currentsA.L1, lr.currentsA.L2, lr.currentsA.L3);
  const fullLoadA = load.demandFactor > 0 ? running / load.demandFactor : running;
  const startA = m.startMultiple * fullLoadA;
  // A single-phase start current flows out on a line and back on the neutral: both count.
  const loopFactor = load.phases === 3 ? 1 : 2;
  const src = load.phases === 3 ? source.phase : source.loop;
  let z: Impedance = { rOhm: src.rOhm, xOhm: src.xOhm };
  let boardZ: Impedance | null = null;
  let boardId: Id | null = null;
  for (const cid of lr.path) {
    const cable = topo.cableById.get(cid);
    const cr = results.cables[cid];
    if (!cable || !cr) continue;
    // The per-metre figures of a cable result already combine its parallel cables.
    z = {
      rOhm: z.rOhm + loopFactor * cr.rOhmPerM * cable.lengthM,
      xOhm: z.xOhm + loopFactor * cr.xOhmPerM * cable.lengthM,
    };
    if (topo.nodeById.get(cable.to)?.kind === 'board') {
      boardZ = { ...z };
      boardId = cable.to;
    }
  }
  const atMotor = dipPct(startA, z, m.startPowerFactor, u0V);
  const atBoard = boardZ ? dipPct(startA, boardZ, m.startPowerFactor, u0V) : null;
  const ok = atMotor <= m.dipLimitPct;
  const w = working(
    'motorDip',
    'Motor starting dip at the motor',
    'ΔU% = 100 x Ist x (R cos φs + X sin φs) / U0',
    [
      [
        'Ist',
        startA,
        'A',
        `${m.startMultiple} x full-load current ${fmt(fullLoadA)} A (design current / demand factor)`,
      ],
      [
        'R',
        z.rOhm,
        'ohm',
        `source plus path conductors at operating temperature, x${loopFactor} for the return`,
      ],
      ['X', z.xOhm, 'ohm', 'source plus path reactance'],
      ['cos φs', m.startPowerFactor, '', 'load.motor.startPowerFactor'],
      ['U0', u0V, 'V', 'supply.u0V'],
    ],
    atMotor,
    '% of U0',
    'Other loads are taken as unchanged during the start; the dip is the approximate (in-phase) one.',
  );
  return {
    result: {
      startCurrentA: startA,
      dipAtMotorPct: atMotor,
      dipAtBoardPct: atBoard,
      boardId,
      limitPct: m.dipLimitPct,
    },
    check: check(
      'motorDip',
      'Motor starting dip',
      ok,
      atMotor,
      m.dipLimitPct,
      '% of U0',
      ok
        ? `dip ${fmt(atMotor)} % <= ${m.dipLimitPct} %${atBoard !== null ? `; ${fmt(atBoard)} % at its board` : ''}`
        : `${elementLabel('load', load.id, load.name)}: starting dip ${fmt(atMotor)} % exceeds the ${m.dipLimitPct} % limit; use a larger or shorter supply, or reduced-voltage starting`,
      w,
    ),
  };
}
