import type { ProjectDocument } from '../model/types.ts';
import type { Results } from '../solver/results.ts';
import { solve } from '../solver/solve.ts';

export function emptyResults(): Results {
  return {
    cables: {},
    nodes: {},
    loads: {},
    findings: [],
    dataSet: { id: 'none', title: 'none', source: '' },
    profile: { id: 'none', title: 'none', source: '' },
    references: [],
  };
}

/**
 * solve() promises never to throw on user data; should it throw anyway (a programming error), the
 * editor keeps working and shows the failure as a finding instead of a blank page.
 */
export function safeSolve(doc: ProjectDocument): Results {
  try {
    return solve(doc);
  } catch (err) {
    const r = emptyResults();
    r.findings.push({
      code: 'solverError',
      severity: 'error',
      message: `The calculation stopped with an internal error (${String(err)}); figures are not shown. Please report this with the project file.`,
    });
    return r;
  }
}
