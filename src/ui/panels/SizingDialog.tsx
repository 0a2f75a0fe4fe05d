import { useEffect, useMemo, useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { Dialog } from './Dialog.tsx';
import { acceptedChanges, type ProposalKind, type ProposalSet } from './proposals.ts';
import { runProposals, type Progress } from './runProposals.ts';
import { DEFAULT_SIZING } from '../../solver/sizing/sizingCore.ts';

/** Terminal limits offered for final circuits, mm². */
const FINAL_SIZE_LIMITS = [4, 6, 10, 16, 25, 35] as const;

const KINDS: { id: ProposalKind; label: string; blurb: string }[] = [
  {
    id: 'sizing',
    label: 'Cable sizes',
    blurb: 'The least conductor that passes every check on every path.',
  },
  {
    id: 'balance',
    label: 'Phase allocation',
    blurb: 'Moves single-phase loads between phases to lower each three-phase board’s worst phase.',
  },
];

/**
 * Proposed changes from the engine, to review and accept in full or in part. Accepted changes go
 * in as one undoable step; while the engine works, its progress is shown and it can be stopped.
 */
export function SizingDialog() {
  const open = useEditor((s) => s.view.dialog === 'sizing');
  if (!open) return null;
  return <ProposalReview />;
}

function ProposalReview() {
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const dispatch = useEditor((s) => s.dispatch);
  const notify = useEditor((s) => s.notify);
  const close = useEditor((s) => s.closeDialog);
  const [kind, setKind] = useState<ProposalKind>('sizing');
  const [set, setSet] = useState<ProposalSet | null>(null);
  const [progress, setProgress] = useState<Progress | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [ticked, setTicked] = useState<Set<string>>(new Set());
  const [maxFinalMm2, setMaxFinalMm2] = useState<number | null>(null);

  useEffect(() => {
    setSet(null);
    setError(null);
    const job = runProposals(kind, doc, results, setProgress, { ...DEFAULT_SIZING, maxFinalMm2 });
    job.done.then(
      (s) => {
        setSet(s);
        setTicked(new Set(s.rows.map((r) => r.key)));
        setProgress(null);
      },
      (e: unknown) => {
        setError(e instanceof Error ? e.message : String(e));
        setProgress(null);
      },
    );
    return job.cancel;
    // The proposals are for the document as it was when the dialog opened; a change while it is
    // open (undo from the keyboard is blocked by the dialog) would start a new run.
  }, [kind, doc, results, maxFinalMm2]);

  const changes = useMemo(() => (set ? acceptedChanges(set.rows, ticked) : []), [set, ticked]);
  const apply = () => {
    const out = dispatch({ type: 'applyProposals', changes });
    if (!out.ok) return setError(out.error);
    notify(
      `${changes.length} proposed change${changes.length === 1 ? '' : 's'} applied; undo takes them back in one step.`,
    );
    close();
  };
  const toggle = (key: string) =>
    setTicked((t) => {
      const next = new Set(t);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });

  return (
    <Dialog
      title="Proposed changes"
      testId="sizing-dialog"
      onClose={close}
      wide
      footer={
        <>
          {error && <span className="dl-reason">{error}</span>}
          <button type="button" onClick={close}>
            Cancel
          </button>
          <button
            type="button"
            className="dl-primary"
            disabled={changes.length === 0}
            onClick={apply}
            data-testid="proposals-apply"
          >
            Apply {changes.length} of {set?.rows.length ?? 0}
          </button>
        </>
      }
    >
      <div className="dl-tabs" role="tablist" aria-label="Kind of proposal">
        {KINDS.map((k) => (
          <button
            key={k.id}
            type="button"
            role="tab"
            aria-selected={kind === k.id}
            data-testid={`proposals-${k.id}`}
            onClick={() => setKind(k.id)}
          >
            {k.label}
          </button>
        ))}
      </div>
      <p className="dl-hint">{KINDS.find((k) => k.id === kind)!.blurb}</p>
      {kind === 'sizing' && (
        <label className="dl-inline-field">
          Largest size for final circuits{' '}
          <select
            data-testid="sizing-max-final"
            value={maxFinalMm2 === null ? '' : String(maxFinalMm2)}
            onChange={(e) => setMaxFinalMm2(e.target.value === '' ? null : Number(e.target.value))}
            title="What the protective devices and the equipment terminals of final circuits take; sub-mains are not limited"
          >
            <option value="">no limit</option>
            {FINAL_SIZE_LIMITS.map((s) => (
              <option key={s} value={s}>
                {s} mm²
              </option>
            ))}
          </select>
        </label>
      )}
      {progress && (
        <div data-testid="proposals-progress" aria-live="polite">
          <p>{progress.text}</p>
          <div
            className="dl-progress"
            role="progressbar"
            aria-valuemin={0}
            aria-valuemax={1}
            aria-valuenow={progress.fraction ?? undefined}
          >
            <span style={{ width: `${(progress.fraction ?? 0.15) * 100}%` }} />
          </div>
        </div>
      )}
      {set && (
        <>
          {set.summary.map((line) => (
            <p key={line}>{line}</p>
          ))}
          {set.rows.length > 0 && (
            <table className="dl-table" data-testid="proposals-table">
              <thead>
                <tr>
                  <th>
                    <input
                      type="checkbox"
                      aria-label="Accept all"
                      checked={ticked.size === set.rows.length}
                      onChange={(e) => setTicked(new Set(e.target.checked ? set.rows.map((r) => r.key) : []))}
                    />
                  </th>
                  <th>Element</th>
                  <th>Field</th>
                  <th>Now</th>
                  <th>Proposed</th>
                  <th>Why</th>
                </tr>
              </thead>
              <tbody>
                {set.rows.map((r) => (
                  <tr key={r.key} data-proposal={r.key} onClick={() => toggle(r.key)}>
                    <td>
                      <input
                        type="checkbox"
                        aria-label={`Accept ${r.field} of ${r.elementName}`}
                        checked={ticked.has(r.key)}
                        onChange={() => toggle(r.key)}
                        onClick={(e) => e.stopPropagation()}
                      />
                    </td>
                    <td>{r.elementName}</td>
                    <td>{r.field}</td>
                    <td>{r.from}</td>
                    <td>
                      <b>{r.to}</b>
                    </td>
                    <td style={{ whiteSpace: 'normal' }}>{r.reason}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </>
      )}
    </Dialog>
  );
}
