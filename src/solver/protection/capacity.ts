/**
 * Current-carrying capacity of a cable segment: Iz = It x Ca x Cg x Ci (x parallel cables).
 */
import type { Cable, Installation } from '../../model/types.ts';
import { lookupCapacity, type CapacityTable } from '../../catalogue/capacityTables.ts';
import { groupingFactor, temperatureFactor, type FactorLookup } from '../../catalogue/capacityFactors.ts';
import type { Working } from '../results.ts';
import { working } from './working.ts';

/** Reference conditions assumed when a cable has no installation given (common practice defaults). */
export const REFERENCE_INSTALLATION: Installation = {
  method: 'clippedDirect',
  ambientC: 30,
  groupedCircuits: 1,
  groupArrangement: 'bunched',
  insulationFactor: 1,
};

export interface CapacityOk {
  itA: number;
  izA: number;
  ca: number;
  cg: number;
  ci: number;
  tableId: string;
  working: Working;
  notes: string[];
}

/** The figures behind Iz without its working (the numeric pass needs only these). */
export interface CapacityFigures {
  itA: number;
  izA: number;
  ca: number;
  cg: number;
  ci: number;
  n: number;
  inst: Installation;
  loaded: 2 | 3;
  cell: NonNullable<ReturnType<typeof lookupCapacity>>;
  temp: FactorLookup;
  group: FactorLookup;
}

/**
 * It, the factors and Iz for a cable, or a message naming what is missing and how to fix it.
 * @example capacityFigures(cable2_5TwinEarthClipped, BUILT_IN_CAPACITY_TABLES) // { itA: 27, izA: 27, ... }
 */
export function capacityFigures(
  cable: Cable,
  tables: readonly CapacityTable[],
): CapacityFigures | { error: string } {
  const inst = cable.installation ?? REFERENCE_INSTALLATION;
  const loaded = cable.phases === 3 ? 3 : 2;
  const cell = lookupCapacity(
    {
      material: cable.material,
      insulation: cable.insulation,
      construction: cable.construction,
      method: inst.method,
      loaded,
      sizeMm2: cable.sizeMm2,
    },
    tables,
  );
  if (!cell) {
    return {
      error: `no capacity data for ${cable.material} ${cable.insulation} ${cable.construction} ${cable.sizeMm2} mm², method ${inst.method}, ${loaded} loaded conductors: choose another method or size, or load a capacity data set that covers it`,
    };
  }
  const temp = temperatureFactor(cable.insulation, inst.ambientC, cell.table.referenceC);
  if (!temp) {
    return {
      error: `ambient ${inst.ambientC} °C is beyond the correction table for ${cable.insulation} insulation: lower the ambient or use higher-temperature insulation`,
    };
  }
  const group = groupingFactor(inst.groupArrangement, inst.groupedCircuits, inst.method);
  if (!group) {
    const buried = inst.method === 'buriedDirect' || inst.method === 'buriedDuct';
    return {
      error: `grouping of ${inst.groupedCircuits} ${buried ? 'buried' : 'bunched'} circuits is beyond the grouping table (20): split the group or enter a factor from a licensed table`,
    };
  }
  const ci = inst.insulationFactor > 0 ? Math.min(1, inst.insulationFactor) : 1;
  const n = Math.max(1, cable.parallel);
  const izA = cell.itA * temp.factor * group.factor * ci * n;
  return { itA: cell.itA, izA, ca: temp.factor, cg: group.factor, ci, n, inst, loaded, cell, temp, group };
}

/**
 * Iz for a cable with its working, or a message naming what is missing and how to fix it.
 * @example cableCapacity(cable2_5TwinEarthClipped)  // { itA: 27, izA: 27, ... }
 */
export function cableCapacity(
  cable: Cable,
  tables: readonly CapacityTable[],
): CapacityOk | { error: string } {
  const f = capacityFigures(cable, tables);
  if ('error' in f) return f;
  const { inst, loaded, cell, temp, group, ci, n, izA } = f;
  const notes: string[] = [];
  if (!cable.installation)
    notes.push('installation not given: reference method C, 30 °C, not grouped assumed');
  const buried = inst.method === 'buriedDirect' || inst.method === 'buriedDuct';
  if (buried && inst.groupedCircuits > 1) {
    notes.push(
      'buried circuits grouped: the factor is for cables (or ducts) touching; with a known spacing a licensed table may allow more',
    );
  }
  if (n > 1) notes.push(`${n} cables in parallel, taken as sharing current equally`);
  return {
    itA: cell.itA,
    izA,
    ca: temp.factor,
    cg: group.factor,
    ci,
    tableId: cell.table.id,
    notes,
    working: working(
      'iz',
      'Current-carrying capacity Iz',
      n > 1 ? 'Iz = It x Ca x Cg x Ci x n' : 'Iz = It x Ca x Cg x Ci',
      [
        [
          'It',
          cell.itA,
          'A',
          `${cell.table.title}, column ${cell.column.label}, ${loaded} loaded conductors`,
        ],
        ['Ca', temp.factor, '', `${temp.source} at ${temp.usedAt} °C (ambient ${inst.ambientC} °C)`],
        [
          'Cg',
          group.factor,
          '',
          `${group.source}${buried ? '' : `, ${inst.groupArrangement}`}, ${group.usedAt} circuit${group.usedAt === 1 ? '' : 's'}${cable.installation?.run !== undefined ? ` (installation.groupedCircuits: the circuits in run "${cable.installation.run}")` : ''}`,
        ],
        ['Ci', ci, '', 'installation.insulationFactor'],
        ...(n > 1 ? [['n', n, 'cables', 'cable.parallel'] as const] : []),
      ],
      izA,
      'A',
      notes.length ? notes.join('; ') : undefined,
    ),
  };
}
