/** One bound on cables in parallel, applied alike by the schema, the edit command, the solver and the editor field. */
import { describe, expect, it } from 'vitest';
import { MAX_PARALLEL } from '../../../src/model/bounds.ts';
import { applyCommand } from '../../../src/model/commands.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { solve } from '../../../src/solver/solve.ts';
import { CABLE_FIELDS } from '../../../src/ui/panels/cableFields.ts';
import { smallNetwork } from '../commands/fixture.ts';

function withParallel(count: number) {
  const doc = smallNetwork();
  doc.cables = doc.cables.map((c) => (c.id === 'C3' ? { ...c, parallel: count } : c));
  return doc;
}

describe('cables in parallel: one bound everywhere', () => {
  it('the bound itself', () => {
    expect(MAX_PARALLEL).toBe(50);
  });
  it('the command takes the bound and refuses one more, naming the cable and the range', () => {
    expect(
      applyCommand(smallNetwork(), { type: 'updateCable', id: 'C3', patch: { parallel: MAX_PARALLEL } }).ok,
    ).toBe(true);
    const out = applyCommand(smallNetwork(), {
      type: 'updateCable',
      id: 'C3',
      patch: { parallel: MAX_PARALLEL + 1 },
    });
    expect(out.ok).toBe(false);
    if (!out.ok)
      expect(out.error).toMatch(/cable C3.*parallel must be a whole number of cables from 1 to 50; got 51/);
  });
  it('the file format takes the bound and refuses one more', () => {
    expect(parseDocument(serializeDocument(withParallel(MAX_PARALLEL))).ok).toBe(true);
    expect(parseDocument(serializeDocument(withParallel(MAX_PARALLEL + 1))).ok).toBe(false);
  });
  it('the solver solves the bound and reports one more as a finding on that cable', () => {
    expect(
      solve(withParallel(MAX_PARALLEL)).findings.some(
        (f) => f.elementId === 'C3' && /parallel/.test(f.message),
      ),
    ).toBe(false);
    const over = solve(withParallel(MAX_PARALLEL + 1)).findings.find(
      (f) => f.elementId === 'C3' && /parallel/.test(f.message),
    );
    expect(over?.message).toBe('cable C3: parallel must be a whole number of cables from 1 to 50, got 51.');
  });
  it('the editor field offers the same range', () => {
    const field = CABLE_FIELDS.flatMap((g) => g.fields).find((f) => f.key === 'parallel');
    expect(field && 'rule' in field ? field.rule : undefined).toMatchObject({ min: 1, max: MAX_PARALLEL });
  });
});
