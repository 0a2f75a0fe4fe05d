/**
 * Field checks the solver needs on each reached element: lengths, conductor rows, parallel
 * counts, load demand, board diversity. The fast read (readFields.ts) accepted the well-formed
 * ones; here the flagged ones get their findings. A bad cable marks its segment unsolvable (the
 * loads below are then not judged); a bad load is left out of the demand (and said so); a bad
 * diversity falls back to 1.
 */
import { sizesFor } from '../catalogue/conductorLookup.ts';
import { MAX_PARALLEL } from '../model/bounds.ts';
import type { DropState } from './dropState.ts';
import { KIND_BOARD, PHASE_ANGLE } from './dropState.ts';
import { shown } from './findings.ts';
import { nodeLabel } from './topology.ts';
import { UNIT_A, UNIT_KVA, UNIT_KW } from './readFields.ts';

type Loose = Record<string, unknown>;

function positive(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v) && v > 0;
}

/**
 * The careful check of every reached cable the fast read flagged, in document order: names each
 * bad field and marks the segment unsolvable. Cables the supply does not reach keep no figures.
 */
export function validateCables(s: DropState): void {
  const { findings, cableTo, reached, cableCheck } = s;
  for (let j = 0; j < s.cableCount; j++) {
    const to = cableTo[j] as number;
    if (to < 0 || !reached[to] || !cableCheck[j]) continue;
    const c = s.cables[j] as unknown as Loose;
    const id = s.cableIds.at(j);
    if (!positive(c.lengthM))
      findings.push({
        code: 'badLength',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: length must be a positive number of metres, got ${shown(c.lengthM)}. Loads below it are not judged until it is set.`,
      });
    const parallel = c.parallel;
    if (!(
      typeof parallel === 'number' &&
      Number.isInteger(parallel) &&
      parallel >= 1 &&
      parallel <= MAX_PARALLEL
    ))
      findings.push({
        code: 'badParallel',
        severity: 'error',
        elementId: id,
        message: `cable ${id}: parallel must be a whole number of cables from 1 to ${MAX_PARALLEL}, got ${shown(parallel)}.`,
      });
    if (!s.cableRowAt[j]) {
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
    s.cableBad[j] = 1;
  }
  if (s.orderLength < s.nodeCount) forgetUnreached(s);
}

/** Undoes the fast read for elements outside the fed tree, which carry no figures. */
function forgetUnreached(s: DropState): void {
  const { reached, cableTo } = s;
  for (let i = 0; i < s.nodeCount; i++) if (!reached[i]) s.diversity[i] = 1;
  for (let j = 0; j < s.cableCount; j++) {
    const to = cableTo[j] as number;
    if (to < 0 || reached[to]) continue;
    s.cableLengthM[j] = 0;
    s.cableRowAt[j] = 0;
  }
}

const UNIT_OK: Record<string, true> = Object.assign(Object.create(null) as Record<string, true>, {
  W: true,
  kW: true,
  kVA: true,
  A: true,
});

/**
 * The careful check of every reached node the fast read flagged, in breadth-first order: a bad
 * diversity falls back to 1, a bad load is left out of the demand; each with its finding.
 */
export function validateNodes(s: DropState): void {
  const { findings, order, nodeCheck } = s;
  for (let k = 0; k < s.orderLength; k++) {
    const i = order[k] as number;
    if (!nodeCheck[i]) continue;
    const el = s.nodes[i] as unknown as Loose;
    const id = s.nodeIds.at(i);
    if (s.nodeKind[i] === KIND_BOARD) {
      const d = el.diversity;
      const spare = el.spareCapacityPct;
      if (!(typeof d === 'number' && d > 0 && d <= 1))
        findings.push({
          code: 'badDiversity',
          severity: 'error',
          elementId: id,
          message: `${nodeLabel(s, i)}: diversity must be a number above 0 and at most 1, got ${shown(d)}; 1 (no diversity) is used until it is fixed.`,
        });
      else
        findings.push({
          code: 'badSpareCapacity',
          severity: 'error',
          elementId: id,
          message: `${nodeLabel(s, i)}: spareCapacityPct must be a percentage from 0 to 200, got ${shown(spare)}; no allowance (and the diversity alone) is used until it is fixed.`,
        });
      // Diversity alone where only the allowance is bad.
      if (typeof d === 'number' && d > 0 && d <= 1) s.diversity[i] = d;
      continue;
    }
    const demand = el.demand as Loose | undefined;
    const value = typeof demand === 'object' && demand !== null ? demand.value : undefined;
    const unit = typeof demand === 'object' && demand !== null ? demand.unit : undefined;
    const problem = loadProblem(value, unit, el.powerFactor, el.demandFactor, el.phases, el.phase) ?? [
      'badDemand',
      'demand fields could not be read',
    ];
    findings.push({
      code: problem[0],
      severity: 'error',
      elementId: id,
      message: `${nodeLabel(s, i)}: ${problem[1]}. Its demand is left out of every cable upstream until it is fixed.`,
    });
  }
}

/**
 * A reached load's current and its phasors, lagging each phase voltage by φ, from the fields the
 * fast read stored. `mask` is the phases it draws from.
 */
export function setLoadCurrent(s: DropState, i: number, mask: number): void {
  const v = s.loadValue[i] as number;
  const cosPhi = s.loadPf[i] as number;
  const unit = s.loadUnit[i];
  const volts = s.loadDeclared[i] === 7 ? SQRT3 * s.uLlV : s.u0V;
  let amps: number;
  if (unit === UNIT_A) amps = v;
  else if (unit === UNIT_KVA) amps = (v * 1000) / volts;
  else amps = (unit === UNIT_KW ? v * 1000 : v) / (volts * cosPhi);
  const current = amps * (s.loadDf[i] as number);
  const phi = Math.acos(cosPhi);
  s.loadCurrentA[i] = current;
  s.loadValid[i] = 1;
  const b = i * 3;
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    const a = (PHASE_ANGLE[p] as number) - phi;
    s.iRe[b + p] = current * Math.cos(a);
    s.iIm[b + p] = current * Math.sin(a);
  }
}

const SQRT3 = Math.sqrt(3);

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
