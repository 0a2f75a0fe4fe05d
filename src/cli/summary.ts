/** What a check adds up to, and the exit status that follows from it. */
import type { Results } from '../solver/results.ts';

export interface CheckSummary {
  loads: number;
  within: number;
  close: number;
  over: number;
  /** Loads with no status (not fed, or not solvable). */
  unsolved: number;
  errorFindings: number;
  warningFindings: number;
  infoFindings: number;
  /** Failed checks counted by protection (also reported as error findings). */
  failedChecks: number;
  unassessedChecks: number;
  /** 0 when every load is within its limit and there is no error finding, 1 otherwise. */
  exitCode: 0 | 1;
}

/**
 * @example
 *   summarise(results).exitCode; // 1 when any load is over its limit
 */
export function summarise(results: Results): CheckSummary {
  const s: CheckSummary = {
    loads: 0,
    within: 0,
    close: 0,
    over: 0,
    unsolved: 0,
    errorFindings: 0,
    warningFindings: 0,
    infoFindings: 0,
    failedChecks: results.protection?.failedChecks ?? 0,
    unassessedChecks: results.protection?.unassessedChecks ?? 0,
    exitCode: 0,
  };
  for (const load of Object.values(results.loads)) {
    s.loads++;
    if (load.status === 'within') s.within++;
    else if (load.status === 'close') s.close++;
    else if (load.status === 'over') s.over++;
    else s.unsolved++;
  }
  for (const f of results.findings) {
    if (f.severity === 'error') s.errorFindings++;
    else if (f.severity === 'warning') s.warningFindings++;
    else s.infoFindings++;
  }
  s.exitCode = s.over > 0 || s.errorFindings > 0 || s.failedChecks > 0 ? 1 : 0;
  return s;
}
