/**
 * Sizing one cable on its own: the smallest size that passes Iz, overload, the cpc withstand, Zs at
 * its far end, and its fixed share of the drop budget of every load beyond it.
 */
import type { Id, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../results.ts';
import { solve } from '../solve.ts';
import {
  candidateSizes,
  DEFAULT_SIZING,
  diffSizes,
  sizeCeilings,
  withSizes,
  type SizeChange,
  type SizingOptions,
} from './sizingCore.ts';

/**
 * Drop budget of each cable under the fixed split, percent: distribution segments on a load's path
 * share `distributionShare` of its limit and final segments the rest, each in proportion to length;
 * a cable takes the smallest budget any load beyond it gives it.
 */
export function dropBudgets(doc: ProjectDocument, results: Results, options: SizingOptions): Map<Id, number> {
  const len = new Map(doc.cables.map((c) => [c.id, c.lengthM]));
  const budgets = new Map<Id, number>();
  for (const lr of Object.values(results.loads)) {
    const path = lr.path;
    if (path.length === 0) continue;
    const isDist = path.map((id) => results.cables[id]?.protection?.circuit === 'distribution');
    let distLen = 0;
    let finalLen = 0;
    path.forEach((id, i) => (isDist[i] ? (distLen += len.get(id) ?? 0) : (finalLen += len.get(id) ?? 0)));
    const distShare = finalLen > 0 ? options.distributionShare : 1;
    const finalShare = distLen > 0 ? 1 - options.distributionShare : 1;
    const limit = lr.limitPct.value;
    path.forEach((id, i) => {
      const l = len.get(id) ?? 0;
      const b = isDist[i]
        ? (limit * distShare * l) / (distLen || 1)
        : (limit * finalShare * l) / (finalLen || 1);
      budgets.set(id, Math.min(budgets.get(id) ?? Infinity, b));
    });
  }
  return budgets;
}

/** Whether a cable passes everything single-cable sizing claims, in a solved document. */
export function cablePasses(cableId: Id, toId: Id, results: Results, budgetPct: number | undefined): boolean {
  const cr = results.cables[cableId];
  if (!cr?.protection) return false;
  for (const c of cr.protection.checks) {
    if ((c.key === 'inIz' || c.key === 'i2' || c.key === 'cpc') && c.pass !== true) return false;
  }
  const zs = results.nodes[toId]?.protection?.checks.find((c) => c.key === 'zs');
  if (zs && zs.pass === false) return false;
  return budgetPct === undefined || cr.dropPct.value <= budgetPct + 1e-9;
}

/** Smallest passing size for one cable in a document, or null if none of the candidates passes. */
export function smallestPassingSize(
  doc: ProjectDocument,
  cableId: Id,
  budgetPct: number | undefined,
  ceilingMm2 = Number.POSITIVE_INFINITY,
): { sizeMm2: number; doc: ProjectDocument } | null {
  const cable = doc.cables.find((c) => c.id === cableId);
  if (!cable) return null;
  for (const s of candidateSizes(cable, ceilingMm2)) {
    const trial = withSizes(doc, new Map([[cableId, s]]));
    if (cablePasses(cableId, cable.to, solve(trial), budgetPct)) return { sizeMm2: s, doc: trial };
  }
  return null;
}

/**
 * Proposes the smallest size for one cable that passes Iz, I2, the cpc adiabatic check, Zs at its
 * far end and its share of the drop budget (the other cables as drawn).
 * @example proposeCableSize(doc, 'C2') // [{ cableId: 'C2', field: 'sizeMm2', from: 2.5, to: 4, reason: ... }]
 */
export function proposeCableSize(
  doc: ProjectDocument,
  cableId: Id,
  options: SizingOptions = DEFAULT_SIZING,
): { changes: SizeChange[]; error?: string } {
  const results = solve(doc);
  const budget = dropBudgets(doc, results, options).get(cableId);
  const cable = doc.cables.find((c) => c.id === cableId);
  const ceiling = cable ? sizeCeilings(results, options)(cable) : Number.POSITIVE_INFINITY;
  const found = smallestPassingSize(doc, cableId, budget, ceiling);
  if (!found) {
    const within = Number.isFinite(ceiling) ? ` up to the ${ceiling} mm² set for final circuits` : '';
    return {
      changes: [],
      error: `cable ${cableId}: no size in the capacity tables${within} passes every check; change the device, installation method or route`,
    };
  }
  const reason = `smallest size passing Iz, I2, cpc, Zs and ${budget === undefined ? 'no drop budget' : `a drop budget of ${budget.toFixed(2)} %`}`;
  return { changes: diffSizes(doc, found.doc, () => reason) };
}
