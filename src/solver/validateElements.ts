/**
 * Field checks the solver needs on each reached element: lengths, conductor rows, parallel
 * counts, load demand, board diversity. A bad cable marks its segment unsolvable (the loads below
 * are then not judged); a bad load is left out of the demand (and said so); a bad diversity
 * falls back to 1.
 */
import { findConductor, sizesFor } from '../catalogue/conductorLookup.ts';
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_LOAD, PHASE_ANGLE } from './dropState.ts';
import { shown } from './findings.ts';
import { nodeLabel } from './topology.ts';

type Loose = Record<string, unknown>;

function positive(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v) && v > 0;
}

export function validateCables(s: DropState): void {
  const { findings } = s;
  for (let j = 0; j < s.cableCount; j++) {
    const to = s.cableTo[j] as number;
    if (to < 0 || !s.reached[to]) continue;
    const c = s.cables[j] as unknown as Loose;
    const id = s.cableIds[j] as string;
    let bad = false;
    if (!positive(c.lengthM)) {
      bad = true;
      findings.push({
        code: 'badLength',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: length must be a positive number of metres, got ${shown(c.lengthM)}. Loads below it are not judged until it is set.`,
      });
    } else {
      s.cableLengthM[j] = c.lengthM;
    }
    const parallel = c.parallel;
    if (!(typeof parallel === 'number' && Number.isInteger(parallel) && parallel >= 1 && parallel <= 100)) {
      bad = true;
      findings.push({
        code: 'badParallel',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: parallel must be a whole number of cables from 1 to 100, got ${shown(parallel)}.`,
      });
    }
    const row = findConductor(s.catalogue, c.material, c.insulation, c.construction, c.sizeMm2);
    if (!row) {
      bad = true;
      const sizes = sizesFor(s.catalogue, c.material, c.insulation, c.construction);
      findings.push(
        sizes.length > 0
          ? {
              code: 'unknownSize',
              severity: 'error',
              elementId: id,
              message: `cable ${id}: size ${shown(c.sizeMm2)} mm² is not in data set "${s.catalogue.title}" for ${String(c.material)} ${String(c.construction)} ${String(c.insulation)}; use one of ${sizes.join(', ')} mm².`,
            }
          : {
              code: 'unknownConductor',
              severity: 'error',
              elementId: id,
              message: `cable ${id}: data set "${s.catalogue.title}" holds no ${shown(c.material)} ${shown(c.construction)} cable with ${shown(c.insulation)} insulation; choose a material, construction and insulation it holds, or load a data set that has them.`,
            },
      );
    }
    s.cableRow[j] = row;
    if (bad || !row) {
      s.cableBad[j] = 1;
      continue;
    }
    const scaleX = row.frequencyHz ? s.frequencyHz / row.frequencyHz : 1;
    const p = parallel as number;
    s.cableZr[j] = (row.rOhmPerM * s.cableLengthM[j]!) / p;
    s.cableZx[j] = (row.xOhmPerM * scaleX * s.cableLengthM[j]!) / p;
  }
}

const UNIT_OK: Record<string, true> = Object.assign(Object.create(null) as Record<string, true>, {
  W: true,
  kW: true,
  kVA: true,
  A: true,
});

export function validateNodes(s: DropState): void {
  const { findings } = s;
  const sqrt3 = Math.sqrt(3);
  const singleSupply = s.root >= 0 && (s.nodes[s.root] as unknown as Loose).phases === 1;
  for (let k = 0; k < s.orderLength; k++) {
    const i = s.order[k] as number;
    const kind = s.nodeKind[i];
    const el = s.nodes[i] as unknown as Loose;
    const id = s.nodeIds[i] as string;
    if (kind === KIND_BOARD) {
      const d = el.diversity;
      if (typeof d === 'number' && d > 0 && d <= 1) s.diversity[i] = d;
      else
        findings.push({
          code: 'badDiversity',
          severity: 'error',
          elementId: id,
          message: `${nodeLabel(s, i)}: diversity must be a number above 0 and at most 1, got ${shown(d)}; 1 (no diversity) is used until it is fixed.`,
        });
      continue;
    }
    if (kind !== KIND_LOAD) continue;
    const declared = el.phases === 3 ? 7 : el.phase === 'L2' ? 2 : el.phase === 'L3' ? 4 : 1;
    s.loadMask[i] = singleSupply && declared !== 7 ? 1 : declared;
    const demand = el.demand as Loose | undefined;
    const value = typeof demand === 'object' && demand !== null ? demand.value : undefined;
    const unit = typeof demand === 'object' && demand !== null ? demand.unit : undefined;
    const pf = el.powerFactor;
    const df = el.demandFactor;
    const phases = el.phases;
    const problem = loadProblem(value, unit, pf, df, phases, el.phase);
    if (problem) {
      findings.push({
        code: problem[0],
        severity: 'error',
        elementId: id,
        message: `${nodeLabel(s, i)}: ${problem[1]}. Its demand is left out of every cable upstream until it is fixed.`,
      });
      continue;
    }
    const v = value as number;
    const cosPhi = pf as number;
    const volts = phases === 1 ? s.u0V : sqrt3 * s.uLlV;
    let amps: number;
    if (unit === 'A') amps = v;
    else if (unit === 'kVA') amps = (v * 1000) / volts;
    else amps = ((unit === 'kW' ? v * 1000 : v) as number) / (volts * cosPhi);
    const current = amps * (df as number);
    const phi = Math.acos(cosPhi);
    s.loadCurrentA[i] = current;
    s.loadPhiRad[i] = phi;
    s.loadValid[i] = 1;
    // The load's own current phasors, lagging each phase voltage by φ.
    const mask = s.loadMask[i] as number;
    for (let p = 0; p < 3; p++) {
      if (!(mask & (1 << p))) continue;
      const a = (PHASE_ANGLE[p] as number) - phi;
      s.iRe[i * 3 + p] = current * Math.cos(a);
      s.iIm[i * 3 + p] = current * Math.sin(a);
    }
  }
}

type LoadProblem = ['badDemand' | 'badPowerFactor' | 'badDemandFactor' | 'badPhases', string];

/** The first thing wrong with a load's demand fields, or undefined. */
function loadProblem(
  value: unknown,
  unit: unknown,
  pf: unknown,
  df: unknown,
  phases: unknown,
  phase: unknown,
): LoadProblem | undefined {
  if (!(typeof value === 'number' && Number.isFinite(value) && value >= 0))
    return ['badDemand', `demand value must be a number of zero or more, got ${shown(value)}`];
  if (typeof unit !== 'string' || !UNIT_OK[unit])
    return ['badDemand', `demand unit must be W, kW, kVA or A, got ${shown(unit)}`];
  if (!(typeof pf === 'number' && pf > 0 && pf <= 1))
    return ['badPowerFactor', `power factor must be above 0 and at most 1, got ${shown(pf)}`];
  if (!(typeof df === 'number' && df >= 0 && df <= 1))
    return ['badDemandFactor', `demand factor must be from 0 to 1, got ${shown(df)}`];
  if (phases !== 1 && phases !== 3) return ['badPhases', `phases must be 1 or 3, got ${shown(phases)}`];
  if (phases === 1 && phase !== 'L1' && phase !== 'L2' && phase !== 'L3')
    return ['badPhases', `phase must be L1, L2 or L3, got ${shown(phase)}`];
  return undefined;
}
