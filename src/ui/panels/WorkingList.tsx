import type { Working } from '../../solver/results.ts';
import { fmtValue } from '../../export/format.ts';

/**
 * The solver's working, step by step: each record shows its formula, the inputs with units and
 * where each came from, and the result. Exactly what the solver recorded, nothing recomputed.
 */
export function WorkingList({ working, openKeys = [] }: { working: Working[]; openKeys?: string[] }) {
  if (working.length === 0)
    return <p className="dl-empty">The solver recorded no working for this element.</p>;
  return (
    <div data-testid="working-list">
      {working.map((w, i) => (
        <details
          key={`${w.key}-${i}`}
          className="dl-working"
          open={openKeys.includes(w.key)}
          data-working={w.key}
        >
          <summary>
            <b>{w.title}</b>
            <span>{fmtValue(w.result.value, w.result.unit)}</span>
          </summary>
          <div className="dl-working-body">
            <div className="dl-formula">{w.formula}</div>
            {w.inputs.length > 0 && (
              <table className="dl-inputs">
                <tbody>
                  {w.inputs.map((inp, j) => (
                    <tr key={`${inp.name}-${j}`}>
                      <td>{inp.name}</td>
                      <td className="dl-num">{fmtValue(inp.value, inp.unit)}</td>
                      <td className="dl-source">{inp.source}</td>
                    </tr>
                  ))}
                  <tr>
                    <td>
                      <b>Result</b>
                    </td>
                    <td className="dl-num">
                      <b>{fmtValue(w.result.value, w.result.unit)}</b>
                    </td>
                    <td />
                  </tr>
                </tbody>
              </table>
            )}
            {w.note && <div className="dl-note">{w.note}</div>}
          </div>
        </details>
      ))}
    </div>
  );
}
