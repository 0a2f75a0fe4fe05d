/**
 * Sizing the whole tree for the least conductor volume (cross-section x length) that passes every
 * claimed check on every path, and the comparison with sizing each cable alone under a fixed split
 * of the drop budget. A generator, so the editor can run it in slices and show progress.
 */
import type { Cable, Id, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../results.ts';
import { solve } from '../solve.ts';
import { resistance20OhmPerM } from '../../catalogue/iec60228.ts';
import { conventionalOperatingMultiple, settingA } from '../../catalogue/devices.ts';
import { cableCapacity } from '../protection/capacity.ts';
import { BUILT_IN_CAPACITY_TABLES } from '../../catalogue/capacityTables.ts';
import {
  candidateSizes,
  DEFAULT_SIZING,
  diffSizes,
  failingBreaking,
  sizeCeilings,
  failingSizingChecks,
  resized,
  totalVolume,
  volumeMm2M,
  withSizes,
  type SizeChange,
  type SizingOptions,
} from './sizingCore.ts';
import { dropBudgets, smallestPassingSize } from './proposeCableSize.ts';

export interface SizingProgress {
  phase: 'perCable' | 'tree' | 'trim';
  done: number;
  total: number;
}

export interface TreeSizingResult {
  changes: SizeChange[];
  passes: boolean;
  /** Claimed checks still failing in the proposed design (empty when it passes). */
  failing: { id: Id; key: string }[];
  volumeBeforeMm2M: number;
  volumeTreeMm2M: number;
  /** Volume of sizing each cable alone under the fixed split, and whether that design passes. */
  volumePerCableMm2M: number;
  perCablePasses: boolean;
  /** Conductor saved by tree sizing against per-cable sizing, mm² m and percent of the per-cable volume. */
  savedMm2M: number;
  savedPct: number;
  /** Which search produced the proposal (per-cable wins when the tree search finds nothing better). */
  method: 'tree' | 'perCable';
  /**
   * Cables whose device would fail its breaking-capacity check with the proposal and passes it as
   * drawn: sizing does not claim breaking capacity (a larger cable raises the fault level).
   */
  newBreakingFailures: Id[];
  /** The largest size final circuits were allowed (SizingOptions.maxFinalMm2), null for none. */
  maxFinalMm2: number | null;
}

/** The largest size each cable may be given (sizeCeilings). */
type Ceiling = (cable: Cable) => number;

/** Smallest size that carries the device setting (In <= Iz, I2 <= 1.45 Iz): a local lower bound. */
function capacityFloor(cable: Cable, ibA: number, ceiling: Ceiling): number | undefined {
  const device = cable.device;
  const inA = device ? settingA(device) : ibA;
  const i2 = device ? conventionalOperatingMultiple(device.type, inA) * inA : 0;
  for (const s of candidateSizes(cable, ceiling(cable))) {
    const cap = cableCapacity(resized(cable, s), BUILT_IN_CAPACITY_TABLES);
    if (!('error' in cap) && inA <= cap.izA && i2 <= 1.45 * cap.izA) return s;
  }
  return undefined;
}

function stepUp(cable: Cable, ceiling: Ceiling): number | undefined {
  return candidateSizes(cable, ceiling(cable)).find((s) => s > cable.sizeMm2);
}

function stepDown(cable: Cable, ceiling: Ceiling): number | undefined {
  const sizes = candidateSizes(cable, ceiling(cable)).filter((s) => s < cable.sizeMm2);
  return sizes[sizes.length - 1];
}

/**
 * The starting dip is the starting current times the path's impedance, so each cable on the path is
 * credited with the share of the needed cut that one size up would give: its resistance saved over
 * the path's conductor resistance, against the share the dip must fall by.
 */
function creditMotorDip(
  node: Results['nodes'][Id],
  byId: ReadonlyMap<Id, Cable>,
  credit: (c: Cable, amount: number) => void,
  ceiling: Ceiling,
): void {
  const dip = node.protection?.checks.find((c) => c.key === 'motorDip');
  if (!dip || dip.value === null || dip.limit === null || !(dip.value > 0)) return;
  const needed = (dip.value - dip.limit) / dip.value;
  const ohms = (c: Cable, size: number) =>
    ((resistance20OhmPerM(c.material, size) ?? 0) * c.lengthM) / Math.max(1, c.parallel);
  let pathOhm = 0;
  for (const id of node.path) {
    const c = byId.get(id);
    if (c) pathOhm += ohms(c, c.sizeMm2);
  }
  if (!(pathOhm > 0)) return;
  for (const id of node.path) {
    const c = byId.get(id);
    const up = c && stepUp(c, ceiling);
    if (!c || up === undefined) continue;
    const saved = (ohms(c, c.sizeMm2) - ohms(c, up)) / pathOhm;
    credit(c, Math.min(1, saved / Math.max(needed, 1e-9)));
  }
}

/** How much a one-step upsizing of each cable helps the failing checks, per unit of added volume. */
function bestUpgrade(
  doc: ProjectDocument,
  results: Results,
  failing: { id: Id; key: string }[],
  ceiling: Ceiling,
): Cable | undefined {
  const byId = new Map(doc.cables.map((c) => [c.id, c]));
  const score = new Map<Id, number>();
  const credit = (c: Cable, amount: number) => score.set(c.id, (score.get(c.id) ?? 0) + amount);
  for (const f of failing) {
    const cable = byId.get(f.id);
    if (cable) {
      credit(cable, 1);
      continue;
    }
    const node = results.nodes[f.id];
    if (!node) continue;
    if (f.key === 'motorDip') {
      creditMotorDip(node, byId, credit, ceiling);
      continue;
    }
    const zsCheck = node.protection?.checks.find((c) => c.key === 'zs');
    const lr = results.loads[f.id];
    const violation =
      f.key === 'zs' && zsCheck?.value != null && zsCheck.limit != null
        ? zsCheck.value - zsCheck.limit
        : lr
          ? lr.cumulativePct.value - lr.limitPct.value
          : 0;
    for (const id of node.path) {
      const c = byId.get(id);
      const up = c && stepUp(c, ceiling);
      const cr = results.cables[id];
      if (!c || up === undefined || !cr) continue;
      const r0 = resistance20OhmPerM(c.material, c.sizeMm2) ?? 0;
      const r1 = resistance20OhmPerM(c.material, up) ?? r0;
      const part = f.key === 'zs' ? (cr.protection?.r1r2HotOhm ?? 0) : cr.dropPct.value;
      const gain = part * (1 - r1 / (r0 || 1));
      credit(c, Math.min(1, gain / Math.max(violation, 1e-9)));
    }
  }
  let best: Cable | undefined;
  let bestRatio = 0;
  for (const [id, s] of score) {
    const c = byId.get(id)!;
    const up = stepUp(c, ceiling);
    if (up === undefined) continue;
    const ratio = s / Math.max(1e-9, volumeMm2M(c, up) - volumeMm2M(c));
    if (ratio > bestRatio) [best, bestRatio] = [c, ratio];
  }
  return best;
}

/** Tries each cable one size down, largest volume first, keeping any step that still passes. */
function* trim(doc: ProjectDocument, ceiling: Ceiling): Generator<SizingProgress, ProjectDocument> {
  let current = doc;
  const order = [...doc.cables].sort((a, b) => volumeMm2M(b) - volumeMm2M(a)).map((c) => c.id);
  let changed = true;
  for (let pass = 0; pass < 3 && changed; pass++) {
    changed = false;
    for (let i = 0; i < order.length; i++) {
      const c = current.cables.find((x) => x.id === order[i])!;
      const down = stepDown(c, ceiling);
      if (down !== undefined) {
        const trial = withSizes(current, new Map([[c.id, down]]));
        if (failingSizingChecks(solve(trial)).length === 0) {
          current = trial;
          changed = true;
        }
      }
      yield { phase: 'trim', done: i + 1, total: order.length };
    }
  }
  return current;
}

function* perCable(
  doc: ProjectDocument,
  first: Results,
  options: SizingOptions,
  ceiling: Ceiling,
): Generator<SizingProgress, ProjectDocument> {
  const budgets = dropBudgets(doc, first, options);
  const order = [...doc.cables].sort(
    (a, b) => (first.nodes[a.to]?.path.length ?? 0) - (first.nodes[b.to]?.path.length ?? 0),
  );
  let current = doc;
  for (let i = 0; i < order.length; i++) {
    const c = order[i]!;
    const found = smallestPassingSize(current, c.id, budgets.get(c.id), ceiling(c));
    if (found) current = found.doc;
    yield { phase: 'perCable', done: i + 1, total: order.length };
  }
  return current;
}

/**
 * Runs the search step by step; each `yield` is a progress report. The return value is the result.
 * @example
 *   const it = sizeTreeSteps(doc); let r = it.next(); while (!r.done) r = it.next(); r.value.changes
 */
export function* sizeTreeSteps(
  doc: ProjectDocument,
  options: SizingOptions = DEFAULT_SIZING,
): Generator<SizingProgress, TreeSizingResult> {
  const base = solve(doc);
  // Final or distribution follows the drawing, not the sizes, so the solve as drawn classes them.
  const ceiling = sizeCeilings(base, options);
  const baseline = yield* perCable(doc, base, options, ceiling);
  const baselineFails = failingSizingChecks(solve(baseline));

  // Tree search: every cable at its capacity floor, then upsize where it helps most per volume.
  const floors = new Map<Id, number>();
  for (const c of doc.cables) {
    const f = capacityFloor(c, base.cables[c.id]?.ibA ?? 0, ceiling);
    if (f !== undefined) floors.set(c.id, f);
  }
  let tree = withSizes(doc, floors);
  const limit = doc.cables.length * 20;
  for (let step = 0; step < limit; step++) {
    const results = solve(tree);
    const failing = failingSizingChecks(results);
    if (failing.length === 0) break;
    const up = bestUpgrade(tree, results, failing, ceiling);
    if (!up) break;
    tree = withSizes(tree, new Map([[up.id, stepUp(up, ceiling)!]]));
    yield { phase: 'tree', done: step + 1, total: limit };
  }
  tree = yield* trim(tree, ceiling);
  const treeFails = failingSizingChecks(solve(tree));

  const vBaseline = totalVolume(baseline);
  let chosen = tree;
  let method: TreeSizingResult['method'] = 'tree';
  if (baselineFails.length === 0 && (treeFails.length > 0 || totalVolume(tree) > vBaseline)) {
    chosen = yield* trim(baseline, ceiling);
    method = 'perCable';
  }
  const chosenResults = solve(chosen);
  const failing = failingSizingChecks(chosenResults);
  const breakingBefore = new Set(failingBreaking(base));
  const newBreakingFailures = failingBreaking(chosenResults).filter((id) => !breakingBefore.has(id));
  const vChosen = totalVolume(chosen);
  const reason =
    method === 'tree' ? 'least-volume tree sizing' : 'per-cable sizing (tree search found nothing smaller)';
  return {
    changes: diffSizes(doc, chosen, () => reason),
    passes: failing.length === 0,
    failing,
    volumeBeforeMm2M: totalVolume(doc),
    volumeTreeMm2M: vChosen,
    volumePerCableMm2M: vBaseline,
    perCablePasses: baselineFails.length === 0,
    savedMm2M: vBaseline - vChosen,
    savedPct: vBaseline > 0 ? (100 * (vBaseline - vChosen)) / vBaseline : 0,
    method,
    newBreakingFailures,
    maxFinalMm2: options.maxFinalMm2,
  };
}

/**
 * Sizes the whole tree at once and reports against per-cable sizing.
 * @example proposeTreeSizing(doc, undefined, (p) => bar.set(p.done / p.total)).savedPct
 */
export function proposeTreeSizing(
  doc: ProjectDocument,
  options: SizingOptions = DEFAULT_SIZING,
  onProgress?: (p: SizingProgress) => void,
): TreeSizingResult {
  const it = sizeTreeSteps(doc, options);
  let r = it.next();
  while (!r.done) {
    onProgress?.(r.value);
    r = it.next();
  }
  return r.value;
}
