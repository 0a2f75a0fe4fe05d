/**
 * The engine's single entry point.
 *
 * `solve` is pure and synchronous and never throws on user data: problems in the document become
 * findings in the results. Voltage drop and demand come first; protection, capacity and fault
 * level are computed on top of them.
 *
 * @example
 *   const results = solve(doc);
 *   results.loads['L4'].cumulativePct.value; // e.g. 3.1 (% of U0)
 */
import type { ProjectDocument } from '../model/types.ts';
import type { Results } from './results.ts';
import { solveDrop } from './solveDrop.ts';
import { attachProtection } from './protection/attachProtection.ts';
import type { CatalogueSet } from '../catalogue/catalogueSet.ts';

export function solve(doc: ProjectDocument, catalogue?: CatalogueSet): Results {
  const base = solveDrop(doc, catalogue);
  return attachProtection(doc, base, catalogue);
}
