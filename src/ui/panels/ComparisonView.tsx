import { useMemo } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { compareDesigns } from '../../solver/compare/compareDesigns.ts';
import { comparisonTables, metalWorking, tableList, type TextTable } from '../../export/comparison.ts';
import { STATUS_LOOK, type StatusLook } from '../../export/statusLook.ts';
import { CANVAS, CANVAS_LABEL, designSide, type DesignKey } from './alternativeDesigns.ts';

/** Status cells read "✕ over" in the shared tables; on screen they wear the status look. */
const LOOK_BY_TEXT = new Map<string, StatusLook>(
  Object.values(STATUS_LOOK).map((look) => [`${look.glyph} ${look.word}`, look]),
);

/** Test ids of the shared tables, in `tableList` order. */
const TABLE_IDS = ['compare-summary', 'compare-status', 'compare-moved', 'compare-cables', 'compare-other'];

function Cell({ text }: { text: string }) {
  const look = LOOK_BY_TEXT.get(text);
  if (!look) return <>{text}</>;
  return (
    <span
      className="dl-badge"
      title={look.meaning}
      style={{ color: look.colour, background: look.tint, border: `1px solid ${look.colour}` }}
    >
      {text}
    </span>
  );
}

/** One of the shared comparison tables (the same rows the CLI prints and the pack holds). */
function TableView({ table, testId }: { table: TextTable; testId?: string }) {
  return (
    <section>
      <h3>{table.title}</h3>
      <p className="dl-note">{table.note}</p>
      {table.rows.length === 0 ? (
        <p className="dl-note" data-testid={testId}>
          {table.empty}
        </p>
      ) : (
        <table className="dl-table" data-testid={testId}>
          <thead>
            <tr>
              {table.headers.map((h, k) => (
                <th key={k} className={table.align[k] === 'right' ? 'dl-num' : undefined}>
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {table.rows.map((row, r) => (
              <tr key={r} data-tone={table.tones[r] ?? undefined}>
                {row.map((cell, k) => (
                  <td
                    key={k}
                    className={
                      table.align[k] === 'right'
                        ? 'dl-num'
                        : k === 2 && testId === 'compare-cables'
                          ? 'dl-alt-wrap'
                          : undefined
                    }
                  >
                    <Cell text={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}

export function ComparisonView({
  pair,
  onPair,
}: {
  pair: [DesignKey, DesignKey];
  onPair: (pair: [DesignKey, DesignKey]) => void;
}) {
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const c = useMemo(() => {
    const a = designSide(doc, results, pair[0]);
    const b = designSide(doc, results, pair[1]);
    return a && b ? compareDesigns(a, b) : null;
  }, [doc, results, pair]);

  const choices = [CANVAS, ...doc.alternatives.map((a) => a.name)];
  const picker = (which: 0 | 1) => (
    <label>
      {which === 0 ? 'A' : 'B'}{' '}
      <select
        value={pair[which]}
        data-testid={which === 0 ? 'compare-a' : 'compare-b'}
        onChange={(e) => onPair(which === 0 ? [e.target.value, pair[1]] : [pair[0], e.target.value])}
      >
        {choices.map((k) => (
          <option key={k} value={k}>
            {k === CANVAS ? CANVAS_LABEL : k}
          </option>
        ))}
      </select>
    </label>
  );

  if (!c) return <p>That design is no longer in the project.</p>;
  const tables = tableList(comparisonTables(c));
  const metal = metalWorking([c.a, c.b]);
  return (
    <div className="dl-alt-compare">
      <div className="dl-alt-pickers">
        {picker(0)}
        {picker(1)}
      </div>
      {tables.map((t, k) => (
        <TableView key={t.title} table={t} testId={TABLE_IDS[k]} />
      ))}
      <details className="dl-alt-working">
        <summary>How the conductor metal is worked out</summary>
        {metal.lines.map((line) => (
          <p key={line}>{line}</p>
        ))}
        <TableView table={metal.table} />
      </details>
    </div>
  );
}
