import { useMemo } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import {
  compareDesigns,
  type DesignComparison,
  type DesignSummary,
  type LoadComparison,
  type StatusOrUnsolved,
} from '../../solver/compare/compareDesigns.ts';
import { fmt } from '../../export/format.ts';
import { StatusBadge } from './StatusBadge.tsx';
import { CANVAS, CANVAS_LABEL, designSide, type DesignKey } from './alternativeDesigns.ts';

/** Loads whose drop moved less than this (percentage points) are not listed as moved. */
const MOVED_PTS = 0.05;

function Status({ status }: { status: StatusOrUnsolved | undefined }) {
  if (status === undefined) return <span className="dl-note">not in this design</span>;
  if (status === 'unsolved') return <span className="dl-note">not solved</span>;
  return <StatusBadge status={status} />;
}

function signed(x: number, digits?: number): string {
  if (!Number.isFinite(x)) return '–';
  if (x === 0) return '0';
  return `${x > 0 ? '+' : '−'}${fmt(Math.abs(x), digits)}`;
}

function pct(x: number | undefined): string {
  return x === undefined || !Number.isFinite(x) ? '–' : `${fmt(x, 2)} %`;
}

function SummaryTable({ c }: { c: DesignComparison }) {
  const rows: [string, (s: DesignSummary) => number, string, number?][] = [
    ['Loads clear', (s) => s.loads.within, ''],
    ['Loads tight', (s) => s.loads.close, ''],
    ['Loads over', (s) => s.loads.over, ''],
    ['Loads not solved', (s) => s.loads.unsolved, ''],
    ['Error findings', (s) => s.errors, ''],
    ['Failed protection checks', (s) => s.failedChecks, ''],
    ['Copper', (s) => s.metal.copperKg, 'kg', 1],
    ['Aluminium', (s) => s.metal.aluminiumKg, 'kg', 1],
    ['Cable route', (s) => s.metal.routeM, 'm', 0],
  ];
  const worst = (s: DesignSummary) =>
    s.worst
      ? `${s.worst.id} ${s.worst.name}: ${fmt(s.worst.cumulativePct, 2)} % of ${fmt(s.worst.limitPct, 2)} %`
      : '–';
  return (
    <table className="dl-table dl-alt-summary" data-testid="compare-summary">
      <thead>
        <tr>
          <th />
          <th className="dl-num">A: {c.a.label}</th>
          <th className="dl-num">B: {c.b.label}</th>
          <th className="dl-num">B − A</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([label, get, unit, digits]) => {
          const a = get(c.a);
          const b = get(c.b);
          return (
            <tr key={label}>
              <th scope="row">{label}</th>
              <td className="dl-num">
                {digits === undefined ? a : fmt(a, digits)} {unit}
              </td>
              <td className="dl-num">
                {digits === undefined ? b : fmt(b, digits)} {unit}
              </td>
              <td className="dl-num">{a === b ? '–' : `${signed(b - a, digits ?? 0)} ${unit}`}</td>
            </tr>
          );
        })}
        <tr>
          <th scope="row">Load using most of its budget</th>
          <td className="dl-num">{worst(c.a)}</td>
          <td className="dl-num">{worst(c.b)}</td>
          <td />
        </tr>
      </tbody>
    </table>
  );
}

function LoadRows({ loads, testId }: { loads: LoadComparison[]; testId: string }) {
  const own = loads.some((l) => l.changes.length > 0);
  return (
    <table className="dl-table" data-testid={testId}>
      <thead>
        <tr>
          <th>Load</th>
          <th>A</th>
          <th>B</th>
          <th className="dl-num">Drop A</th>
          <th className="dl-num">Drop B</th>
          <th className="dl-num">Change</th>
          <th className="dl-num">Limit</th>
          {own && <th>Changes to the load itself</th>}
        </tr>
      </thead>
      <tbody>
        {loads.map((l) => (
          <tr key={l.id} data-direction={l.direction}>
            <td>
              {l.id} {(l.b ?? l.a)?.name}
            </td>
            <td>
              <Status status={l.a?.status} />
            </td>
            <td>
              <Status status={l.b?.status} />
            </td>
            <td className="dl-num">{pct(l.a?.cumulativePct)}</td>
            <td className="dl-num">{pct(l.b?.cumulativePct)}</td>
            <td className="dl-num">{l.dropChangePct === null ? '–' : `${signed(l.dropChangePct, 2)} pts`}</td>
            <td className="dl-num">{pct((l.b ?? l.a)?.limitPct)}</td>
            {own && <td>{l.changes.map((x) => `${x.label} ${x.a} → ${x.b}`).join('; ')}</td>}
          </tr>
        ))}
      </tbody>
    </table>
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
  const changed = c.loads.filter((l) => l.statusChanged);
  const moved = c.loads
    .filter((l) => !l.statusChanged && l.dropChangePct !== null && Math.abs(l.dropChangePct) >= MOVED_PTS)
    .sort((x, y) => Math.abs(y.dropChangePct as number) - Math.abs(x.dropChangePct as number));
  const onlyOne = c.loads.filter((l) => l.a === null || l.b === null);
  const metal = c.b.metal.working;
  return (
    <div className="dl-alt-compare">
      <div className="dl-alt-pickers">
        {picker(0)}
        {picker(1)}
      </div>
      <SummaryTable c={c} />

      <h3>Loads that changed status ({changed.length})</h3>
      {changed.length > 0 ? (
        <LoadRows loads={changed} testId="compare-status" />
      ) : (
        <p className="dl-note" data-testid="compare-status">
          No load changed status.
        </p>
      )}

      <h3>
        Other loads whose drop moved by {MOVED_PTS} points or more ({moved.length})
      </h3>
      {moved.length > 0 ? (
        <LoadRows loads={moved} testId="compare-moved" />
      ) : (
        <p className="dl-note">None.</p>
      )}

      {onlyOne.length > 0 && (
        <>
          <h3>Loads in one design only ({onlyOne.length})</h3>
          <LoadRows loads={onlyOne} testId="compare-only" />
        </>
      )}

      <h3>Cables changed ({c.cables.length})</h3>
      {c.cables.length > 0 ? (
        <table className="dl-table" data-testid="compare-cables">
          <thead>
            <tr>
              <th>Cable</th>
              <th>What changed (A → B)</th>
              <th className="dl-num">Copper</th>
              <th className="dl-num">Aluminium</th>
            </tr>
          </thead>
          <tbody>
            {c.cables.map((x) => (
              <tr key={x.id}>
                <td>
                  {x.id} {(x.b ?? x.a)?.name}
                </td>
                <td className="dl-alt-wrap">
                  {x.a === null
                    ? 'only in B'
                    : x.b === null
                      ? 'only in A'
                      : x.changes.map((f) => `${f.label} ${f.a} → ${f.b}`).join('; ')}
                </td>
                <td className="dl-num">
                  {x.copperKgChange === 0 ? '–' : `${signed(x.copperKgChange, 2)} kg`}
                </td>
                <td className="dl-num">
                  {x.aluminiumKgChange === 0 ? '–' : `${signed(x.aluminiumKgChange, 2)} kg`}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="dl-note">No cable differs.</p>
      )}

      {(c.settings.length > 0 || c.nodes.length > 0) && (
        <>
          <h3>Supply, boards, junctions and settings</h3>
          <ul className="dl-alt-other" data-testid="compare-other">
            {c.settings.map((f) => (
              <li key={f.field}>
                Settings: {f.label} {f.a} → {f.b}
              </li>
            ))}
            {c.nodes.map((n) => (
              <li key={n.id}>
                {n.kind} {n.id} {n.name}:{' '}
                {n.presence === 'added'
                  ? 'only in B'
                  : n.presence === 'removed'
                    ? 'only in A'
                    : n.changes.map((f) => `${f.label} ${f.a} → ${f.b}`).join('; ')}
              </li>
            ))}
          </ul>
        </>
      )}

      <details className="dl-alt-working">
        <summary>How the conductor metal is worked out</summary>
        <p>
          <code>{metal.formula}</code>
        </p>
        <ul>
          {metal.inputs.slice(0, 2).map((i) => (
            <li key={i.name}>
              {i.name} = {i.value} {i.unit} ({i.source})
            </li>
          ))}
        </ul>
        <p className="dl-note">{metal.note}</p>
      </details>
    </div>
  );
}
