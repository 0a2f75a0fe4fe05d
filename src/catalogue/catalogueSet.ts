/**
 * The reference data a solve uses. The built-in set is derived from published standards; a user
 * may load their own (from a licensed table or a manufacturer's sheet) and the working then names
 * it. A set is plain data (JSON-friendly), so it can be saved, loaded and compared; lookups build
 * their index on first use (see `conductorLookup.ts`).
 *
 * The protection engineer's modules may add optional fields for devices and capacity tables.
 */
import type { Construction, Insulation, Material } from '../model/types.ts';
import type { CapacityTable } from './capacityTables.ts';
import type { FuseDataSet } from './devices.ts';

/** Per-metre figures of one line conductor of one cable type and size. */
export interface ConductorRow {
  material: Material;
  insulation: Insulation;
  construction: Construction;
  sizeMm2: number;
  /** a.c. resistance of one conductor at `tempC`, ohm per metre. */
  rOhmPerM: number;
  /** Reactance of one conductor, ohm per metre. */
  xOhmPerM: number;
  /** Conductor temperature the resistance applies at (the insulation's maximum operating temperature). */
  tempC: number;
  /** Frequency the reactance applies at; the solver scales x in proportion to the project's. */
  frequencyHz?: number;
  /** How the figures were obtained, in words a reviewer can check (printed in the working). */
  source: string;
}

export interface CatalogueSet {
  /** Stable id, stored in a project's `settings.dataSet`. */
  id: string;
  title: string;
  /** Where the data come from (standard and table, or data sheet and date). */
  source: string;
  conductors: readonly ConductorRow[];
  /** Capacity tables replacing the built-in ones (a licensed set); absent: the built-in tables. */
  capacityTables?: readonly CapacityTable[];
  /** gG fuse time-current data replacing the built-in set; absent: the built-in set. */
  ggFuses?: FuseDataSet;
}
