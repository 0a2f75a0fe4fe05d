/**
 * A terminal limit on final circuits: sizing then carries the drop in the sub-main rather than give
 * a final circuit a cable its device and equipment cannot take.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { solve } from '../../../src/solver/solve.ts';
import { proposeTreeSizing } from '../../../src/solver/sizing/proposeTreeSizing.ts';
import { proposeCableSize } from '../../../src/solver/sizing/proposeCableSize.ts';
import {
  DEFAULT_SIZING,
  candidateSizes,
  failingSizingChecks,
  withSizes,
} from '../../../src/solver/sizing/sizingCore.ts';

function demo() {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

const finals = (doc: ReturnType<typeof demo>) => {
  const r = solve(doc);
  return new Set(doc.cables.filter((c) => r.cables[c.id]?.protection?.circuit === 'final').map((c) => c.id));
};

describe('largest size for final circuits', () => {
  it('without a limit the demo van charger circuit is given more than 16 mm²; with 16 it is not, and the design still passes', () => {
    const doc = demo();
    const free = proposeTreeSizing(doc);
    const vanFree = free.changes.find((c) => c.cableId === 'C32' && c.field === 'sizeMm2');
    expect(vanFree!.to).toBeGreaterThan(16);
    expect(free.maxFinalMm2).toBeNull();

    const capped = proposeTreeSizing(doc, { ...DEFAULT_SIZING, maxFinalMm2: 16 });
    expect(capped.maxFinalMm2).toBe(16);
    const finalIds = finals(doc);
    for (const ch of capped.changes)
      if (ch.field === 'sizeMm2' && finalIds.has(ch.cableId)) expect(ch.to).toBeLessThanOrEqual(16);
    expect(capped.passes).toBe(true);
    const sizes = new Map(capped.changes.filter((c) => c.field === 'sizeMm2').map((c) => [c.cableId, c.to]));
    expect(failingSizingChecks(solve(withSizes(doc, sizes)))).toEqual([]);
    // The drop the final circuit may no longer take goes to the sub-main feeding its board.
    const subMain = capped.changes.find((c) => c.cableId === 'C28' && c.field === 'sizeMm2');
    expect(subMain!.to).toBeGreaterThan(16);
  });

  it('single-cable sizing keeps to the limit and says so when nothing within it passes', () => {
    const doc = demo();
    const out = proposeCableSize(doc, 'C32', { ...DEFAULT_SIZING, maxFinalMm2: 2.5 });
    expect(out.changes).toEqual([]);
    expect(out.error).toMatch(
      /cable C32: no size in the capacity tables up to the 2\.5 mm² set for final circuits/,
    );
  });

  it('the limit cuts the candidate sizes, the rest of the list unchanged', () => {
    const c = demo().cables.find((x) => x.id === 'C32')!;
    const all = candidateSizes(c);
    expect(candidateSizes(c, 16)).toEqual(all.filter((s) => s <= 16));
    expect(candidateSizes(c, 16).length).toBeLessThan(all.length);
  });
});
