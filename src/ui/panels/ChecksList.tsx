import type { Check } from '../../solver/protection/protectionResults.ts';
import { statusLook } from '../../export/statusLook.ts';
import { fmtValue } from '../../export/format.ts';
import { WorkingList } from './WorkingList.tsx';

const VERDICT = {
  pass: { word: 'passes', look: statusLook('within') },
  fail: { word: 'fails', look: statusLook('over') },
  unknown: { word: 'not assessed', look: statusLook(null) },
};

function verdictOf(c: Check) {
  return c.pass === true ? VERDICT.pass : c.pass === false ? VERDICT.fail : VERDICT.unknown;
}

/** The protection checks on an element, each with its verdict, figure against limit, and working. */
export function ChecksList({ checks }: { checks: Check[] }) {
  if (checks.length === 0) return null;
  return (
    <>
      <h3>Checks</h3>
      <ul className="dl-checks" data-testid="checks-list">
        {checks.map((c, i) => {
          const v = verdictOf(c);
          return (
            <li key={`${c.key}-${i}`} data-check={c.key} data-pass={String(c.pass)}>
              <details>
                <summary>
                  <span className="dl-check-title">{c.title}</span>
                  <span className="dl-check-figure">
                    {c.value !== null && fmtValue(c.value, c.unit)}
                    {c.limit !== null && <span className="dl-source"> / {fmtValue(c.limit, c.unit)}</span>}
                  </span>
                  <span
                    className="dl-badge"
                    style={{
                      color: v.look.colour,
                      background: v.look.tint,
                      border: `1px solid ${v.look.colour}`,
                    }}
                  >
                    <span aria-hidden="true">{v.look.glyph}</span>
                    {v.word}
                  </span>
                </summary>
                <p className="dl-check-message">{c.message}</p>
                <WorkingList working={[c.working]} openKeys={[c.working.key]} />
              </details>
            </li>
          );
        })}
      </ul>
    </>
  );
}
