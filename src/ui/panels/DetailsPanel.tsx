import { useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import type { Cable, Id, NodeElement } from '../../model/types.ts';
import type { Working } from '../../solver/results.ts';
import { CABLE_FIELDS } from './cableFields.ts';
import { CableFigures } from './CableFigures.tsx';
import { ElementForm } from './ElementForm.tsx';
import { NodeFigures } from './NodeFigures.tsx';
import { nodeFieldGroups } from './nodeFields.ts';
import { StatusBadge } from './StatusBadge.tsx';
import { WorkingList } from './WorkingList.tsx';
import './panels.css';

type Tab = 'inputs' | 'results' | 'working';
const TABS: { id: Tab; label: string }[] = [
  { id: 'inputs', label: 'Inputs' },
  { id: 'results', label: 'Results' },
  { id: 'working', label: 'Working' },
];

const KIND_LABEL: Record<NodeElement['kind'] | 'cable', string> = {
  supply: 'Supply (origin)',
  board: 'Distribution board',
  junction: 'Junction',
  load: 'Load',
  cable: 'Cable segment',
};

function ownerOf(kind: string, el: { id: Id; name: string }): string {
  return el.name && el.name !== el.id ? `${kind} ${el.id} "${el.name}"` : `${kind} ${el.id}`;
}

/**
 * The selected element: its inputs (editable, validated in place), its results and the solver's
 * working. Everything shown under Results and Working is the solver's own figures.
 */
export function DetailsPanel() {
  const selection = useEditor((s) => s.selection);
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const dispatch = useEditor((s) => s.dispatch);
  const reveal = useEditor((s) => s.reveal);
  const setSelection = useEditor((s) => s.setSelection);
  const [tab, setTab] = useState<Tab>('inputs');

  const node = selection.length === 1 ? doc.nodes.find((n) => n.id === selection[0]) : undefined;
  const cable: Cable | undefined =
    selection.length === 1 && !node ? doc.cables.find((c) => c.id === selection[0]) : undefined;

  let body;
  if (selection.length === 0 || (!node && !cable && selection.length === 1)) {
    body = (
      <p className="dl-empty">
        Select an element on the diagram, or a row in the schedules, to see its inputs, results and working.
      </p>
    );
  } else if (selection.length > 1) {
    const names = selection.map(
      (id) => doc.nodes.find((n) => n.id === id) ?? doc.cables.find((c) => c.id === id),
    );
    body = (
      <>
        <p className="dl-empty">{selection.length} elements selected. Pick one to edit it:</p>
        <ul className="dl-shares">
          {names.map(
            (el) =>
              el && (
                <li key={el.id} style={{ display: 'block' }}>
                  <button type="button" className="dl-linklike" onClick={() => setSelection([el.id])}>
                    {el.name || el.id}
                  </button>
                </li>
              ),
          )}
        </ul>
      </>
    );
  } else {
    const el = (node ?? cable)!;
    const kind = node ? node.kind : 'cable';
    const owner = ownerOf(kind, el);
    const status = node
      ? (results.loads[el.id] ?? results.nodes[el.id])?.status
      : results.cables[el.id]?.status;
    const result = node ? (results.loads[el.id] ?? results.nodes[el.id]) : results.cables[el.id];
    // The drop working first, then loop impedance / capacity, then the working behind each check.
    const sections: { title: string; working: Working[] }[] = [
      { title: 'Current and voltage drop', working: result?.working ?? [] },
      {
        title: node ? 'Loop impedance and fault level' : 'Capacity and R1 + R2',
        working: result?.protection?.working ?? [],
      },
      { title: 'Checks', working: result?.protection?.checks.map((c) => c.working) ?? [] },
    ].filter((sec) => sec.working.length > 0);
    const failed = result?.protection?.checks.filter((c) => c.pass === false).length ?? 0;
    const commitNode = (patch: object) => {
      const out = dispatch({ type: 'updateNode', id: el.id, patch });
      return out.ok ? undefined : out.error;
    };
    const commitCable = (patch: object) => {
      const out = dispatch({ type: 'updateCable', id: el.id, patch });
      return out.ok ? undefined : out.error;
    };
    body = (
      <>
        <header className="dl-details-head">
          <div>
            <h2 data-testid="details-title">{el.name || el.id}</h2>
            <div className="dl-kind">
              {KIND_LABEL[kind]} · {el.id}
            </div>
          </div>
          <div style={{ display: 'flex', flexDirection: 'column', alignItems: 'flex-end', gap: 3 }}>
            <StatusBadge status={status} />
            {failed > 0 && (
              <span className="dl-failed" data-testid="details-failed">
                {failed} check{failed === 1 ? '' : 's'} fail{failed === 1 ? 's' : ''}
              </span>
            )}
          </div>
        </header>
        <div className="dl-tabs" role="tablist" aria-label="Details">
          {TABS.map((t) => (
            <button
              key={t.id}
              type="button"
              role="tab"
              aria-selected={tab === t.id}
              data-testid={`details-tab-${t.id}`}
              onClick={() => setTab(t.id)}
            >
              {t.label}
            </button>
          ))}
        </div>
        <div role="tabpanel">
          {tab === 'inputs' &&
            (node ? (
              <ElementForm
                key={el.id}
                groups={nodeFieldGroups(node)}
                element={node}
                owner={owner}
                onCommit={commitNode}
              />
            ) : (
              <ElementForm
                key={el.id}
                groups={CABLE_FIELDS}
                element={cable!}
                owner={owner}
                onCommit={commitCable}
              />
            ))}
          {tab === 'results' &&
            (node ? (
              <NodeFigures id={el.id} doc={doc} results={results} onReveal={reveal} />
            ) : (
              <CableFigures id={el.id} doc={doc} results={results} />
            ))}
          {tab === 'working' &&
            (sections.length === 0 ? (
              <WorkingList working={[]} />
            ) : (
              sections.map((sec) => (
                <section key={sec.title}>
                  <h3>{sec.title}</h3>
                  <WorkingList working={sec.working} />
                </section>
              ))
            ))}
        </div>
      </>
    );
  }

  return (
    <aside className="dl-panel dl-details" data-testid="details-panel" aria-label="Details of the selection">
      {body}
    </aside>
  );
}
