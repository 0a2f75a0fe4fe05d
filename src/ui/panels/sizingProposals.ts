/**
 * Cable sizing proposals for the review dialog, from the engine's whole-tree sizing. The search is
 * a generator; it runs here in slices of a few milliseconds between paints, so the dialog shows its
 * progress and stays responsive, and it stops when the dialog no longer wants the result.
 */
import type { Id, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import {
  sizeTreeSteps,
  type SizingProgress,
  type TreeSizingResult,
} from '../../solver/sizing/proposeTreeSizing.ts';
import { DEFAULT_SIZING, type SizeChange, type SizingOptions } from '../../solver/sizing/sizingCore.ts';
import { fmt } from '../../export/format.ts';
import type { ProposalRow, ProposalSet } from './proposals.ts';

const SLICE_MS = 30;

const STAGE: Record<SizingProgress['phase'], { text: string; from: number; span: number }> = {
  perCable: { text: 'Sizing each cable alone under a fixed split of the budget…', from: 0, span: 0.4 },
  tree: { text: 'Searching the whole tree for the least conductor…', from: 0.4, span: 0.45 },
  trim: { text: 'Trimming sizes that can come down…', from: 0.85, span: 0.15 },
};

/** Overall share done, for the progress bar: each stage fills its own part of the bar. */
export function progressFraction(p: SizingProgress): number {
  const st = STAGE[p.phase];
  return st.from + st.span * (p.total > 0 ? Math.min(1, p.done / p.total) : 1);
}

/** One row per cable: the line size and the cpc that goes with it change together. */
export function sizingRows(doc: ProjectDocument, changes: SizeChange[]): ProposalRow[] {
  const byCable = new Map<Id, SizeChange[]>();
  for (const c of changes) byCable.set(c.cableId, [...(byCable.get(c.cableId) ?? []), c]);
  const rows: ProposalRow[] = [];
  for (const [cableId, list] of byCable) {
    const cable = doc.cables.find((c) => c.id === cableId);
    if (!cable) continue;
    const line = list.find((c) => c.field === 'sizeMm2');
    const cpc = list.find((c) => c.field === 'cpc.sizeMm2');
    const toLine = line?.to ?? cable.sizeMm2;
    const toCpc = cpc?.to ?? cable.cpc.sizeMm2;
    rows.push({
      key: `${cableId}.size`,
      elementId: cableId,
      elementName: cable.name || cableId,
      // An armoured cable's cpc is its armour: name it, so "4 / 35" is not read as a 35 mm² cpc.
      field: cable.cpc.kind === 'armour' ? 'Size (line / armour)' : 'Size (line / cpc)',
      from: `${cable.sizeMm2} / ${cable.cpc.sizeMm2} mm²`,
      to: `${toLine} / ${toCpc} mm²`,
      reason: (line ?? cpc)!.reason,
      change: {
        target: 'cable',
        id: cableId,
        patch: { sizeMm2: toLine, ...(cpc ? { cpc: { ...cable.cpc, sizeMm2: toCpc } } : {}) },
      },
    });
  }
  return rows;
}

/** The engine's own comparison, worded for the dialog. */
export function sizingSummary(r: TreeSizingResult): string[] {
  const lines = [
    `Conductor volume (cross-section × length): now ${fmt(r.volumeBeforeMm2M, 0)} mm²·m; proposed ${fmt(r.volumeTreeMm2M, 0)} mm²·m.`,
    `Sizing each cable alone under a fixed split of the drop budget would use ${fmt(r.volumePerCableMm2M, 0)} mm²·m` +
      `${r.perCablePasses ? '' : ' and would still fail a check'}; the proposal saves ${fmt(r.savedMm2M, 0)} mm²·m (${fmt(r.savedPct, 1)} % of that).`,
    r.method === 'tree'
      ? 'Found by the whole-tree search.'
      : 'The whole-tree search found nothing smaller, so this is the per-cable sizing.',
  ];
  if (r.passes)
    lines.push(
      'With the proposal in full, every capacity, overload, cpc, Zs, drop and motor-starting check passes.',
    );
  else
    lines.push(
      `Even in full, ${r.failing.length} check${r.failing.length === 1 ? '' : 's'} would still fail (${r.failing
        .slice(0, 6)
        .map((f) => `${f.id} ${f.key}`)
        .join(', ')}${r.failing.length > 6 ? ', …' : ''}); sizes alone cannot fix them.`,
    );
  if (r.maxFinalMm2 !== null)
    lines.push(
      `Final circuits were kept at or below ${r.maxFinalMm2} mm²; where that is not enough, a larger sub-main carries the drop instead, or the check stays failing.`,
    );
  if (r.newBreakingFailures.length > 0)
    lines.push(
      `Larger cables raise the fault level: the device on ${r.newBreakingFailures.join(', ')} would then fall short of its breaking capacity; choose a device with a higher breaking capacity there.`,
    );
  if (r.changes.length === 0) lines.push('No size needs to change.');
  return lines;
}

export function sizingProposals(
  doc: ProjectDocument,
  _results: Results,
  progress: (fraction: number, text: string) => void,
  cancelled: () => boolean,
  options: SizingOptions = DEFAULT_SIZING,
): Promise<ProposalSet> {
  const steps = sizeTreeSteps(doc, options);
  return new Promise((resolve, reject) => {
    const slice = () => {
      if (cancelled()) return;
      try {
        const end = performance.now() + SLICE_MS;
        let step = steps.next();
        while (!step.done && performance.now() < end) step = steps.next();
        if (step.done) {
          resolve({ rows: sizingRows(doc, step.value.changes), summary: sizingSummary(step.value) });
          return;
        }
        progress(progressFraction(step.value), STAGE[step.value.phase].text);
        setTimeout(slice, 0);
      } catch (e) {
        reject(e);
      }
    };
    slice();
  });
}
