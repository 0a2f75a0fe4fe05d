/**
 * The revision table: the next revision label after the ones a design is issued under (A, B, C …;
 * P01, P02 …; 1, 2 …: common practice for drawings and calculations), the command that keeps the
 * table, the file's checks, and the tender pack's summary listing it.
 */
import { describe, expect, test } from 'vitest';
import { nextRevision } from '../../../src/model/revisions.ts';
import { applyCommand } from '../../../src/model/commands.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { revisionRowsProblem } from '../../../src/ui/panels/ProjectDialog.tsx';
import type { RevisionEntry } from '../../../src/model/types.ts';
import { smallNetwork } from '../commands/fixture.ts';

const row = (revision: string, description = 'Issued for tender'): RevisionEntry => ({
  revision,
  date: '2025-03-14',
  description,
  by: 'D. Marsh',
  checked: '',
});

describe('revision labels', () => {
  test('the next label follows the pattern of the last', () => {
    expect(nextRevision('')).toBe('A');
    expect(nextRevision('A')).toBe('B');
    expect(nextRevision('Z')).toBe('AA');
    expect(nextRevision('AZ')).toBe('BA');
    expect(nextRevision('rev c')).toBe('rev d');
    expect(nextRevision('P01')).toBe('P02');
    expect(nextRevision('P09')).toBe('P10');
    expect(nextRevision('C1')).toBe('C2');
    expect(nextRevision('9')).toBe('10');
    expect(nextRevision('–')).toBe('–.1');
  });
});

describe('the revision table', () => {
  test('is kept by updateDetails as one step; an empty table leaves the file as before', () => {
    const doc = smallNetwork();
    const out = applyCommand(doc, {
      type: 'updateDetails',
      patch: { revisions: [row('A'), row('B', 'Sub-main upsized')], revision: 'B' },
    });
    if (!out.ok) throw new Error(out.error);
    expect(out.doc.details.revisions).toHaveLength(2);
    expect(out.doc.details.revision).toBe('B');
    const back = parseDocument(serializeDocument(out.doc));
    expect(back.ok && back.doc.details.revisions).toEqual(out.doc.details.revisions);
    const cleared = applyCommand(out.doc, { type: 'updateDetails', patch: { revisions: [] } });
    expect(cleared.ok && 'revisions' in cleared.doc.details).toBe(false);
  });

  test('bad rows are refused by the command, the dialog and the file, naming the row and the fix', () => {
    const doc = smallNetwork();
    const bad = applyCommand(doc, {
      type: 'updateDetails',
      patch: { revisions: [row('A'), { ...row('B'), by: 7 } as unknown as RevisionEntry] },
    });
    expect(!bad.ok && bad.error).toBe('Revision row 2: by must be text.');
    const extra = applyCommand(doc, {
      type: 'updateDetails',
      patch: { revisions: [{ ...row('A'), approved: 'X' } as unknown as RevisionEntry] },
    });
    expect(!extra.ok && extra.error).toBe('Revision row 1 has no field "approved".');
    expect(revisionRowsProblem([row('A'), row('B', ' ')])).toBe(
      'Revision B: say what changed in this issue.',
    );
    expect(revisionRowsProblem([{ ...row('C'), date: '2025-02-30' }])).toMatch(
      /^Revision C: date 2025-02-30 is not a calendar day/,
    );
    expect(revisionRowsProblem([row(' ')])).toMatch(/no revision label/);
    expect(revisionRowsProblem([row('A'), row('B')])).toBeNull();
    const file = JSON.parse(serializeDocument(doc));
    file.details.revisions = [{ ...row('A'), description: 42 }];
    const parsed = parseDocument(JSON.stringify(file));
    expect(parsed.ok).toBe(false);
    expect(parsed.ok ? '' : parsed.errors.join('\n')).toMatch(/revisions\.0\.description/);
  });
});
