import { useMemo, useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { alternativeNameProblem } from '../../model/commands/alternatives.ts';
import { MAX_ALTERNATIVES } from '../../model/schema.ts';
import { summariseDesign, type DesignSummary } from '../../solver/compare/compareDesigns.ts';

import { fmt } from '../../export/format.ts';
import { statusLook } from '../../export/statusLook.ts';
import { Dialog } from './Dialog.tsx';
import { ComparisonView } from './ComparisonView.tsx';
import {
  alternativeSide,
  CANVAS,
  CANVAS_LABEL,
  keptAs,
  keptText,
  suggestedName,
  type DesignKey,
} from './alternativeDesigns.ts';
import './alternatives.css';

/**
 * Named alternatives: keep the design on the canvas under a name, compare any two designs side by
 * side, open one in place of the canvas, rename or delete them. Every change is one undo step.
 */
export function AlternativesDialog() {
  const open = useEditor((s) => s.view.dialog === 'alternatives');
  if (!open) return null;
  return <Alternatives />;
}

function LoadCounts({ summary }: { summary: DesignSummary }) {
  const counts = summary.loads;
  return (
    <span className="dl-alt-counts">
      {(['within', 'close', 'over'] as const).map((s) => {
        const look = statusLook(s);
        return (
          <span key={s} style={{ color: look.colour }} title={`loads ${look.meaning}`}>
            <span aria-hidden="true">{look.glyph}</span> {counts[s]} {look.word}
          </span>
        );
      })}
    </span>
  );
}

function Alternatives() {
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const dispatch = useEditor((s) => s.dispatch);
  const notify = useEditor((s) => s.notify);
  const close = useEditor((s) => s.closeDialog);
  const [name, setName] = useState(() => suggestedName(doc));
  const [note, setNote] = useState('');
  const [pair, setPair] = useState<[DesignKey, DesignKey] | null>(null);
  const [opening, setOpening] = useState<string | null>(null);
  const [keepAs, setKeepAs] = useState('');
  const [renaming, setRenaming] = useState<{ from: string; to: string; note: string } | null>(null);

  const summaries = useMemo(
    () => doc.alternatives.map((a) => summariseDesign(alternativeSide(doc, a))),
    [doc],
  );
  const canvasSummary = useMemo(() => summariseDesign({ label: CANVAS_LABEL, doc, results }), [doc, results]);
  const problem = alternativeNameProblem(doc, name);
  const full = doc.alternatives.length >= MAX_ALTERNATIVES;

  const now = () => new Date().toISOString();
  const keep = () => {
    const out = dispatch({ type: 'keepAlternative', name, note, keptAt: now() });
    if (out.ok) {
      notify(`Kept the design on the canvas as “${name}”.`);
      setNote('');
      setName(suggestedName(out.doc));
    }
  };
  const openAlt = (altName: string, keepCurrentAs?: string) => {
    const out = dispatch({ type: 'openAlternative', name: altName, keepCurrentAs, keptAt: now() });
    if (out.ok) {
      setOpening(null);
      close();
      notify(
        `“${altName}” is on the canvas${keepCurrentAs ? `; the design that was there is kept as “${keepCurrentAs}”` : ''}. Undo brings the previous design back.`,
      );
    }
  };

  if (pair) {
    return (
      <Dialog
        title="Compare designs"
        testId="alternatives-dialog"
        onClose={close}
        wide
        footer={
          <>
            <button type="button" onClick={() => setPair(null)} data-testid="alt-back">
              Back to the list
            </button>
            <button type="button" className="dl-primary" onClick={close}>
              Close
            </button>
          </>
        }
      >
        <ComparisonView pair={pair} onPair={setPair} />
      </Dialog>
    );
  }

  const canvasKeptAs = keptAs(doc);
  const canvasKept = canvasKeptAs !== null;
  return (
    <Dialog
      title="Alternatives"
      testId="alternatives-dialog"
      onClose={close}
      wide
      footer={
        <button type="button" className="dl-primary" onClick={close}>
          Close
        </button>
      }
    >
      <p>
        Keep the design on the canvas under a name, change it, and compare: which loads change status, how far
        each drop moves, and how much conductor metal each design uses. The alternatives are saved in the
        project file.
      </p>
      <form
        className="dl-alt-keep"
        onSubmit={(e) => {
          e.preventDefault();
          if (!problem && !full) keep();
        }}
      >
        <label>
          Name
          <input
            value={name}
            maxLength={80}
            onChange={(e) => setName(e.target.value)}
            data-testid="alt-name"
            aria-invalid={problem !== null}
          />
        </label>
        <label className="dl-alt-note">
          Note (what differs, why)
          <input value={note} onChange={(e) => setNote(e.target.value)} data-testid="alt-note" />
        </label>
        <button
          type="submit"
          className="dl-primary"
          disabled={problem !== null || full}
          data-testid="alt-keep"
        >
          Keep the canvas design
        </button>
      </form>
      {(problem || full) && (
        <p className="dl-alt-problem" role="alert">
          {full ? `A project keeps at most ${MAX_ALTERNATIVES} alternatives; delete one first.` : problem}
        </p>
      )}
      <table className="dl-table dl-alt-list" data-testid="alt-list">
        <thead>
          <tr>
            <th>Design</th>
            <th>Kept</th>
            <th>Loads</th>
            <th className="dl-num">Copper</th>
            <th />
          </tr>
        </thead>
        <tbody>
          <tr className="dl-alt-canvas">
            <td>
              <strong>{CANVAS_LABEL}</strong>
              <div className="dl-note">
                {canvasKept ? `the same as “${canvasKeptAs}”` : 'not kept as an alternative'}
              </div>
            </td>
            <td>–</td>
            <td>
              <LoadCounts summary={canvasSummary} />
            </td>
            <td className="dl-num">{fmt(canvasSummary.metal.copperKg)} kg</td>
            <td />
          </tr>
          {doc.alternatives.map((alt, k) => {
            const summary = summaries[k] as DesignSummary;
            const editing = renaming?.from === alt.name;
            return (
              <tr key={alt.name} data-testid={`alt-row-${k}`}>
                <td className="dl-alt-name">
                  {editing ? (
                    <>
                      <input
                        value={renaming.to}
                        aria-label="New name"
                        onChange={(e) => setRenaming({ ...renaming, to: e.target.value })}
                      />
                      <input
                        value={renaming.note}
                        aria-label="Note"
                        onChange={(e) => setRenaming({ ...renaming, note: e.target.value })}
                      />
                    </>
                  ) : (
                    <>
                      <strong>{alt.name}</strong>
                      {alt.note && <div className="dl-note">{alt.note}</div>}
                    </>
                  )}
                </td>
                <td>{keptText(alt.keptAt)}</td>
                <td>
                  <LoadCounts summary={summary} />
                </td>
                <td className="dl-num">{fmt(summary.metal.copperKg)} kg</td>
                <td className="dl-alt-actions">
                  {editing ? (
                    <>
                      <button
                        type="button"
                        onClick={() => {
                          const out = dispatch({
                            type: 'updateAlternative',
                            name: alt.name,
                            patch: { name: renaming.to, note: renaming.note },
                          });
                          if (out.ok) setRenaming(null);
                        }}
                      >
                        Save
                      </button>
                      <button type="button" onClick={() => setRenaming(null)}>
                        Cancel
                      </button>
                    </>
                  ) : (
                    <>
                      <button
                        type="button"
                        title={`Compare the design on the canvas with “${alt.name}”`}
                        onClick={() => setPair([CANVAS, alt.name])}
                      >
                        Compare
                      </button>
                      <button
                        type="button"
                        title={`Put “${alt.name}” on the canvas in place of the design there`}
                        onClick={() => {
                          if (canvasKept) openAlt(alt.name);
                          else {
                            setKeepAs(suggestedName(doc, 'Before'));
                            setOpening(alt.name);
                          }
                        }}
                      >
                        Open
                      </button>
                      <button
                        type="button"
                        title={`Replace “${alt.name}” with the design on the canvas`}
                        onClick={() => {
                          const out = dispatch({
                            type: 'keepAlternative',
                            name: alt.name,
                            note: '',
                            keptAt: now(),
                            replace: true,
                          });
                          if (out.ok) notify(`“${alt.name}” now holds the design on the canvas.`);
                        }}
                      >
                        Update
                      </button>
                      <button
                        type="button"
                        onClick={() => setRenaming({ from: alt.name, to: alt.name, note: alt.note })}
                      >
                        Rename
                      </button>
                      <button
                        type="button"
                        onClick={() => {
                          const out = dispatch({ type: 'deleteAlternative', name: alt.name });
                          if (out.ok) notify(`Deleted “${alt.name}”. Undo brings it back.`);
                        }}
                      >
                        Delete
                      </button>
                    </>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {doc.alternatives.length === 0 && (
        <p className="dl-note">
          No alternatives yet. Keep the design on the canvas, change it, then compare.
        </p>
      )}
      {opening !== null && (
        <div
          className="dl-alt-confirm"
          role="alertdialog"
          aria-label="Open an alternative"
          data-testid="alt-confirm"
        >
          <p>
            The design on the canvas is not kept as an alternative. Keep it before “{opening}” takes its
            place?
          </p>
          <label>
            Keep it as{' '}
            <input value={keepAs} onChange={(e) => setKeepAs(e.target.value)} data-testid="alt-keep-as" />
          </label>
          {alternativeNameProblem(doc, keepAs) && (
            <p className="dl-alt-problem">{alternativeNameProblem(doc, keepAs)}</p>
          )}
          <div className="dl-alt-confirm-actions">
            <button type="button" onClick={() => setOpening(null)}>
              Cancel
            </button>
            <button type="button" onClick={() => openAlt(opening)} data-testid="alt-open-discard">
              Open without keeping (Undo brings it back)
            </button>
            <button
              type="button"
              className="dl-primary"
              disabled={alternativeNameProblem(doc, keepAs) !== null || full}
              onClick={() => openAlt(opening, keepAs)}
              data-testid="alt-open-keep"
            >
              Keep, then open
            </button>
          </div>
        </div>
      )}
    </Dialog>
  );
}
