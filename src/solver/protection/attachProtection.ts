/**
 * Adds capacity, loop impedance, fault level, protective conductor, phase balance and motor starting
 * to drop results.
 *
 * One numeric pass outwards from the origin over flat arrays decides every check and reports the
 * failed and unassessed ones as findings at once (protectionPass.ts); the per-element protection
 * objects, their checks and working are built when first read (protectionViews.ts). With results
 * from solveDrop it reads the solver's own arrays and builds no drop result object either, so it
 * can run on every edit and on 100,000 elements. attachProtectionReference is the eager form it is
 * tested against.
 */
import type { ProjectDocument, Supply } from '../../model/types.ts';
import type { Finding, Results } from '../results.ts';
import type { CatalogueSet } from '../../catalogue/catalogueSet.ts';
import { BUILT_IN_GG_FUSES, type FuseDataSet } from '../../catalogue/devices.ts';
import { BUILT_IN_CAPACITY_TABLES, type CapacityTable } from '../../catalogue/capacityTables.ts';
import type { ProtectionSummary } from './protectionResults.ts';
import { sourceImpedance } from './impedance.ts';
import { REFERENCES } from './protectionWorking.ts';
import { treeInputs } from './treeInputs.ts';
import { protectionPass } from './protectionPass.ts';
import { protectedRecords } from './protectionViews.ts';
import { boardBalances } from '../balancePhases.ts';
import { elementLabel } from '../elementLabel.ts';

/** Optional protection data a catalogue may carry; the built-in sets are used where absent. */
interface ProtectionData {
  ggFuses?: FuseDataSet;
  capacityTables?: readonly CapacityTable[];
}

/**
 * Adds `protection` to every fed cable and node, `motorStart` to motor loads and a summary with
 * failed-check counts and phase balance; each failed check also becomes an error finding, each
 * check that cannot be assessed a warning.
 * @example attachProtection(doc, solveDrop(doc)).nodes['DB1'].protection?.zsOhm
 */
export function attachProtection(doc: ProjectDocument, results: Results, catalogue?: CatalogueSet): Results {
  const data = (catalogue ?? {}) as ProtectionData;
  const fuses = data.ggFuses ?? BUILT_IN_GG_FUSES;
  const tables = data.capacityTables ?? BUILT_IN_CAPACITY_TABLES;
  const findings: Finding[] = results.findings.slice();
  const supply = doc.nodes.find((n): n is Supply => n.kind === 'supply');
  const source = supply ? sourceImpedance(supply, doc.settings) : undefined;
  if (!supply || !source) {
    findings.push({
      code: 'noFaultLevel',
      severity: 'warning',
      elementId: supply?.id,
      message: supply
        ? `${elementLabel('supply', supply.id, supply.name)}: pfcKa must be above 0 (or give a transformer for a private supply) to compute fault levels and loop impedance`
        : 'no supply: loop impedance and fault level cannot be computed',
    });
    return { ...results, findings };
  }
  const t = treeInputs(doc, results);
  const u0V = supply.u0V;
  const pass = protectionPass({ t, results, supply, u0V, source, fuses, tables }, findings);
  const records = protectedRecords(
    { t, a: pass.a, memo: pass.memo, supply, u0V, source, fuses, tables, motors: pass.motors },
    results,
  );
  let balance: ProtectionSummary['balance'] | undefined;
  const protection: ProtectionSummary = {
    failedChecks: pass.failed,
    unassessedChecks: pass.unassessed,
    // Reads every three-phase board's currents: built when first asked for.
    get balance() {
      return (balance ??= boardBalances(doc, results));
    },
    set balance(value) {
      balance = value;
    },
    fuseDataSet: { id: fuses.id, title: fuses.title, source: fuses.source },
    capacityDataSets: [...new Set(tables.map((x) => x.title))],
  };
  return {
    ...results,
    ...records,
    findings,
    references: [...results.references, ...REFERENCES.filter((r) => !results.references.includes(r))],
    protection,
  };
}
