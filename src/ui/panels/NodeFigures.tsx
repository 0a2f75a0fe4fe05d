import type { Id, ProjectDocument } from '../../model/types.ts';
import type { LoadResult, NodeResult, PhaseCurrents, Results } from '../../solver/results.ts';
import { buildProfile } from './buildProfile.ts';
import { fmt, fmtPct } from '../../export/format.ts';
import { StatusBadge } from './StatusBadge.tsx';
import { VoltageProfile } from './VoltageProfile.tsx';
import { NodeProtectionFigures } from './ProtectionFigures.tsx';

function phaseList(values: Partial<Record<string, number>>, unit: string): string {
  const parts = Object.entries(values)
    .filter(([, v]) => typeof v === 'number' && v !== 0)
    .map(([k, v]) => `${k} ${fmt(v)} ${unit}`);
  return parts.length ? parts.join(' · ') : '–';
}

export function currentsText(c: PhaseCurrents): string {
  return phaseList(c, 'A');
}

/** The load fed through `id` that uses the largest share of its drop budget, or null if none is solved. */
function worstLoadFed(id: Id, r: NodeResult, results: Results): LoadResult | null {
  // A node with no path is the supply (every load is fed from it) or unfed (nothing to show).
  const into = r.path.at(-1);
  if (into === undefined && r.status === null) return null;
  let worst: LoadResult | null = null;
  for (const l of Object.values(results.loads)) {
    if (l.status === null) continue;
    if (into !== undefined && !l.path.includes(into)) continue;
    if (!worst || l.budgetUsed > worst.budgetUsed) worst = l;
  }
  return worst;
}

function isLoad(r: NodeResult | LoadResult): r is LoadResult {
  return 'limitPct' in r;
}

/** A node's results as the solver gave them; for a load also its path and voltage profile. */
export function NodeFigures({
  id,
  doc,
  results,
  onReveal,
}: {
  id: Id;
  doc: ProjectDocument;
  results: Results;
  onReveal: (id: Id) => void;
}) {
  const r = results.loads[id] ?? results.nodes[id];
  if (!r) return <p className="dl-empty">No results for this element: see the findings for the reason.</p>;
  const profile = isLoad(r) ? buildProfile(doc, results, id) : null;
  const balance = results.protection?.balance[id];
  const worst = isLoad(r) ? null : worstLoadFed(id, r, results);
  const nameOf = (nid: Id) => doc.nodes.find((n) => n.id === nid)?.name ?? nid;
  const cableName = (cid: Id) => doc.cables.find((c) => c.id === cid)?.name ?? cid;
  return (
    <div data-testid="node-figures">
      <dl className="dl-figures">
        <dt>Status</dt>
        <dd>
          <StatusBadge status={r.status} />
        </dd>
        <dt>Cumulative drop from the origin</dt>
        <dd data-testid="figure-cumulative">{fmtPct(r.cumulativePct)}</dd>
        {worst && (
          <>
            <dt>Worst load fed (sets the status)</dt>
            <dd data-testid="figure-worst-load">
              <button type="button" className="dl-linklike" onClick={() => onReveal(worst.id)}>
                {nameOf(worst.id)}
              </button>{' '}
              {fmtPct(worst.cumulativePct)} of {fmtPct(worst.limitPct)}
            </dd>
          </>
        )}
        {isLoad(r) && (
          <>
            <dt>Limit for this load</dt>
            <dd>{fmtPct(r.limitPct)}</dd>
            <dt>Share of the drop budget used</dt>
            <dd data-testid="figure-budget">{fmt(r.budgetUsed * 100, 0)} %</dd>
          </>
        )}
        <dt>Voltage to neutral</dt>
        <dd>{phaseList(r.voltageV, 'V')}</dd>
        <dt>Demand current in</dt>
        <dd>{currentsText(r.currentsA)}</dd>
        {balance && (
          <>
            <dt>Phase imbalance</dt>
            <dd data-testid="figure-imbalance" title="(Imax − Iavg) / Iavg, % of the average phase current">
              {fmt(balance.imbalancePct, 0)} % (heaviest {balance.worstPhase})
            </dd>
            <dt>Neutral current</dt>
            <dd>{fmt(balance.currentsA.N)} A</dd>
          </>
        )}
      </dl>
      {r.protection && (
        <NodeProtectionFigures p={r.protection} motor={isLoad(r) ? r.motorStart : undefined} />
      )}
      {isLoad(r) && r.shares.length > 0 && (
        <>
          <h3>Path from the origin</h3>
          <ul className="dl-shares" data-testid="path-shares">
            {r.shares.map((s) => (
              <li key={s.cableId}>
                <button type="button" className="dl-linklike" onClick={() => onReveal(s.cableId)}>
                  {cableName(s.cableId)}
                </button>
                <span className="dl-bar" title={`${fmt(s.share * 100, 0)} % of this load's drop`}>
                  <span style={{ width: `${Math.max(0, Math.min(1, s.share)) * 100}%` }} />
                </span>
                <span style={{ textAlign: 'right' }}>{fmt(s.dropPct, 2)} %</span>
              </li>
            ))}
          </ul>
          <p className="dl-hint">
            Bars: each segment’s share of this load’s drop; figures: the segment’s drop.
          </p>
        </>
      )}
      {profile && (
        <>
          <h3>Drop along the path</h3>
          <VoltageProfile profile={profile} />
        </>
      )}
    </div>
  );
}
