/**
 * Bounds on document fields that the schema, the edit commands, the solver and the editor's fields
 * all apply: one place, so a file the editor accepts is one the schema accepts and the solver
 * reads the same way.
 */

/**
 * Most cables of one circuit laid in parallel. Beyond a few dozen a run is a busbar or a different
 * design, and the solver keeps the count in one byte per cable.
 */
export const MAX_PARALLEL = 50;
