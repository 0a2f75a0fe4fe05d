import type { Id, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { fmt, fmtExact, fmtPct } from '../../export/format.ts';
import { currentsText } from './NodeFigures.tsx';
import { StatusBadge } from './StatusBadge.tsx';
import { CableProtectionFigures } from './ProtectionFigures.tsx';

/** A cable's results as the solver gave them. */
export function CableFigures({ id, results }: { id: Id; doc: ProjectDocument; results: Results }) {
  const r = results.cables[id];
  if (!r) return <p className="dl-empty">No results for this cable: see the findings for the reason.</p>;
  return (
    <div data-testid="cable-figures">
      <dl className="dl-figures">
        <dt>Status at the far end</dt>
        <dd>
          <StatusBadge status={r.status} />
        </dd>
        <dt>Design current Ib</dt>
        <dd data-testid="figure-ib">{fmt(r.ibA)} A</dd>
        <dt>Current per conductor</dt>
        <dd>{currentsText(r.currentsA)}</dd>
        <dt>Resistance per conductor (hot)</dt>
        <dd>{fmtExact(r.rOhmPerM * 1000)} mΩ/m</dd>
        <dt>Reactance per conductor</dt>
        <dd>{fmtExact(r.xOhmPerM * 1000)} mΩ/m</dd>
        <dt>Drop in this segment</dt>
        <dd data-testid="figure-drop">
          {fmt(r.dropV)} V · {fmtPct(r.dropPct)}
        </dd>
        <dt>Cumulative at the far end</dt>
        <dd data-testid="figure-cumulative">{fmtPct(r.cumulativePct)}</dd>
        <dt>Longest run within the budget left</dt>
        <dd>{r.maxLengthM === null ? '–' : `${fmt(r.maxLengthM, 0)} m`}</dd>
      </dl>
      {r.protection && <CableProtectionFigures p={r.protection} ibA={r.ibA} />}
    </div>
  );
}
