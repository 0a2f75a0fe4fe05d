import { useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import type { ProjectDetails, RevisionEntry } from '../../model/types.ts';
import { nextRevision } from '../../model/revisions.ts';
import { Dialog } from './Dialog.tsx';
import { ElementForm } from './ElementForm.tsx';
import { DETAILS_FIELDS, dateProblem } from './projectFields.ts';

function changed<T extends object>(before: T, after: T): Partial<T> {
  const patch: Partial<T> = {};
  for (const k of Object.keys(after) as (keyof T)[]) {
    if (JSON.stringify(after[k]) !== JSON.stringify(before[k])) patch[k] = after[k];
  }
  return patch;
}

/** Why a revision table cannot be saved, naming the row and the fix; null when it can. */
export function revisionRowsProblem(rows: readonly RevisionEntry[]): string | null {
  for (const r of rows) {
    const which = r.revision.trim() ? `Revision ${r.revision.trim()}` : 'A revision row';
    if (!r.revision.trim()) return `${which} has no revision label; give it one, e.g. C or P02.`;
    const date = dateProblem(r.date);
    if (date) return `${which}: ${date.replace(/^Date of the project: /, 'date ')}`;
    if (!r.date) return `${which}: give the date it was issued, e.g. 2025-03-14.`;
    if (!r.description.trim()) return `${which}: say what changed in this issue.`;
  }
  return null;
}

const today = () => new Date().toISOString().slice(0, 10);

/** The revision table: one row per issue, the last the current revision. */
function RevisionRows({
  draft,
  setDraft,
}: {
  draft: ProjectDetails;
  setDraft: (update: (d: ProjectDetails) => ProjectDetails) => void;
}) {
  const rows = draft.revisions ?? [];
  // The last row is the current issue: the title block's revision and date follow it.
  const withRows = (d: ProjectDetails, next: RevisionEntry[]): ProjectDetails => {
    const last = next[next.length - 1];
    return last
      ? { ...d, revisions: next, revision: last.revision, date: last.date }
      : { ...d, revisions: next };
  };
  const edit = (k: number, patch: Partial<RevisionEntry>) =>
    setDraft((d) =>
      withRows(
        d,
        (d.revisions ?? []).map((r, i) => (i === k ? { ...r, ...patch } : r)),
      ),
    );
  const add = () =>
    setDraft((d) => {
      const list = d.revisions ?? [];
      const last = list[list.length - 1];
      const revision = last ? nextRevision(last.revision) : d.revision.trim() || 'A';
      // The first row records the issue the project is at now, with its date; later ones are new issues.
      const date = last || !d.date || dateProblem(d.date) ? today() : d.date;
      return withRows(d, [...list, { revision, date, description: '', by: d.author, checked: '' }]);
    });
  const remove = (k: number) =>
    setDraft((d) =>
      withRows(
        d,
        (d.revisions ?? []).filter((_r, i) => i !== k),
      ),
    );
  const cell = (k: number, field: keyof RevisionEntry, label: string, className: string) => (
    <td>
      <input
        className={className}
        aria-label={`${label}, row ${k + 1}`}
        value={rows[k]![field]}
        data-testid={`rev-${k}-${field}`}
        onChange={(e) => edit(k, { [field]: e.target.value })}
      />
    </td>
  );
  return (
    <section className="dl-revisions" aria-label="Revisions">
      <h3>Revisions</h3>
      <p className="dl-hint">
        One row per issue of the design, oldest first. The last row is the current revision: the title block
        of every sheet shows it, and the tender pack lists them all.
      </p>
      {rows.length > 0 && (
        <table className="dl-rev-table">
          <thead>
            <tr>
              <th>Rev</th>
              <th>Date</th>
              <th>What changed</th>
              <th>By</th>
              <th>Checked</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.map((_r, k) => (
              <tr key={k}>
                {cell(k, 'revision', 'Revision', 'dl-rev-short')}
                {cell(k, 'date', 'Date', 'dl-rev-date')}
                {cell(k, 'description', 'What changed', 'dl-rev-wide')}
                {cell(k, 'by', 'By', 'dl-rev-name')}
                {cell(k, 'checked', 'Checked by', 'dl-rev-name')}
                <td>
                  <button
                    type="button"
                    aria-label={`Remove revision row ${k + 1}`}
                    data-testid={`rev-remove-${k}`}
                    onClick={() => remove(k)}
                  >
                    ×
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <button type="button" data-testid="rev-add" onClick={add}>
        {rows.length === 0
          ? 'Start the revision table'
          : `Add revision ${nextRevision(rows[rows.length - 1]!.revision)}`}
      </button>
    </section>
  );
}

/** The project's details (title block fields); saved together as one undo step. */
export function ProjectDialog() {
  const open = useEditor((s) => s.view.dialog === 'project');
  if (!open) return null;
  return <ProjectForm />;
}

function ProjectForm() {
  const details = useEditor((s) => s.doc.details);
  const dispatch = useEditor((s) => s.dispatch);
  const close = useEditor((s) => s.closeDialog);
  const [draft, setDraft] = useState<ProjectDetails>(details);
  const [error, setError] = useState<string | null>(null);
  const save = () => {
    const problem = revisionRowsProblem(draft.revisions ?? []);
    if (problem) return setError(problem);
    const patch = changed(details, draft);
    if (Object.keys(patch).length > 0) {
      const out = dispatch({ type: 'updateDetails', patch });
      if (!out.ok) return setError(out.error);
    }
    close();
  };
  return (
    <Dialog
      title="Project details"
      testId="project-dialog"
      onClose={close}
      footer={
        <>
          {error && <span className="dl-reason">{error}</span>}
          <button type="button" onClick={close}>
            Cancel
          </button>
          <button type="button" className="dl-primary" onClick={save} data-testid="project-save">
            Save details
          </button>
        </>
      }
    >
      <ElementForm
        groups={DETAILS_FIELDS}
        element={draft}
        owner="the project"
        onCommit={(patch) => {
          setDraft((d) => ({ ...d, ...patch }));
          return undefined;
        }}
      />
      <RevisionRows draft={draft} setDraft={setDraft} />
    </Dialog>
  );
}

export { changed };
