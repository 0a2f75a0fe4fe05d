/**
 * The reference data a solve uses. The built-in set is derived from published standards; a user
 * may load their own (from a licensed table or a manufacturer's sheet) and the working then names
 * it. Fields are added by the catalogue modules (conductors, devices, capacities, limits).
 */
export interface CatalogueSet {
  id: string;
  title: string;
  source: string;
}
