import { useEditor } from '../../store/editorStore.ts';
import type { Severity } from '../../solver/results.ts';
import { statusLook } from '../../export/statusLook.ts';
import './panels.css';
import './tables.css';

// Same colours and glyphs as the status palette, so "over" and "must fix" read alike.
const SEVERITY_LOOK: Record<Severity, { word: string; glyph: string; colour: string }> = {
  error: { word: 'Must fix', glyph: statusLook('over').glyph, colour: statusLook('over').colour },
  warning: { word: 'Check', glyph: statusLook('close').glyph, colour: statusLook('close').colour },
  info: { word: 'Note', glyph: 'i', colour: '#2c5f7c' },
};
const ORDER: Severity[] = ['error', 'warning', 'info'];

/** Every finding the solver reported, worst first; a click goes to the element it is about. */
export function FindingsList() {
  const open = useEditor((s) => s.view.drawer === 'findings');
  const findings = useEditor((s) => s.results.findings);
  const doc = useEditor((s) => s.doc);
  const reveal = useEditor((s) => s.reveal);
  const openDrawer = useEditor((s) => s.openDrawer);
  if (!open) return null;
  const sorted = ORDER.flatMap((sev) => findings.filter((f) => f.severity === sev));
  const nameOf = (id: string) =>
    (doc.nodes.find((n) => n.id === id) ?? doc.cables.find((c) => c.id === id))?.name;

  return (
    <section className="dl-panel dl-drawer" data-testid="findings-list" aria-label="Findings">
      <header className="dl-drawer-head">
        <h2 style={{ padding: '8px 0' }}>Findings ({findings.length})</h2>
        <span style={{ marginLeft: 'auto' }} />
        <button type="button" onClick={() => openDrawer(null)} aria-label="Close the findings">
          Close
        </button>
      </header>
      <div className="dl-drawer-body">
        {sorted.length === 0 ? (
          <p className="dl-empty" style={{ padding: '12px' }}>
            The solver reports nothing to look at: no loops, islands, missing data or loads over their limit.
          </p>
        ) : (
          <ul className="dl-findings">
            {sorted.map((f, i) => {
              const look = SEVERITY_LOOK[f.severity];
              const name = f.elementId ? nameOf(f.elementId) : undefined;
              return (
                <li key={`${f.code}-${f.elementId ?? ''}-${i}`} data-finding={f.code}>
                  <span className="dl-sev" style={{ color: look.colour, borderColor: look.colour }}>
                    <span aria-hidden="true">{look.glyph}</span> {look.word}
                  </span>
                  <span className="dl-finding-text">{f.message}</span>
                  {f.elementId && (
                    <button
                      type="button"
                      onClick={() => reveal(f.elementId!)}
                      title="Select it and show it on the diagram"
                    >
                      Go to {name || f.elementId}
                    </button>
                  )}
                </li>
              );
            })}
          </ul>
        )}
      </div>
    </section>
  );
}
