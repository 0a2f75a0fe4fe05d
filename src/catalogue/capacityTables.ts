/**
 * Tabulated current-carrying capacities It (amperes, copper) by construction, insulation, reference
 * installation method and number of loaded conductors.
 *
 * These are documented data a user can replace with a licensed set (CatalogueSet.capacityTables).
 * Each table names its source and how far it was confirmed (check-values §7: C confirmed from a
 * stored reproduction, M from memory).
 *
 * No built-in table covers copper thermosetting multicore non-armoured cable (IEC 60364-5-52
 * B.52.3/B.52.5/B.52.12, BS 7671 4E2A), copper thermoplastic armoured multicore (BS 7671 4D4A) or
 * any aluminium cable: no public reproduction of those tables could be found to confirm the cells,
 * so such cables are reported "not assessed" until a licensed table is loaded (docs/catalogue-data.md).
 */
import type { Construction, InstallMethod, Insulation, Material } from '../model/types.ts';

export type LoadedConductors = 2 | 3;

export interface CapacityColumn {
  /** Column label in the source table, e.g. "B.52.4 C" or "4D5 method 100". */
  label: string;
  /** Capacity per size, aligned with the table's sizesMm2; null where the source has no cell. */
  amps: Partial<Record<LoadedConductors, readonly (number | null)[]>>;
}

export interface CapacityTable {
  id: string;
  title: string;
  source: string;
  material: Material;
  insulation: Insulation;
  constructions: readonly Construction[];
  /** Reference ambient: air 30 °C, or ground 20 °C for buried methods. */
  referenceC: number;
  sizesMm2: readonly number[];
  methods: Partial<Record<InstallMethod, CapacityColumn>>;
}

const IEC_SIZES = [1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300];

/** IEC 60364-5-52 Tables B.52.2 / B.52.4 (A2, B2, C) and B.52.10 (E), PVC multicore. */
const IEC_PVC_MULTICORE: CapacityTable = {
  id: 'iec-b52-pvc-multicore',
  title: 'IEC 60364-5-52 B.52.2/B.52.4/B.52.10, PVC 70 °C multicore, copper',
  source:
    'IEC 60364-5-52:2009 Tables B.52.2, B.52.4, B.52.10 (check-values §7.1-7.3; B.52.4 B2 and C to 35 mm² confirmed, other cells from memory)',
  material: 'Cu',
  insulation: 'thermoplastic70',
  constructions: ['multicore'],
  referenceC: 30,
  sizesMm2: IEC_SIZES,
  methods: {
    conduitInInsulatedWall: {
      label: 'A2',
      amps: {
        2: [14, 18.5, 25, 32, 43, 57, 75, 92, 110, 139, 167, 192, 219, 248, 291, 334],
        3: [13, 17.5, 23, 29, 39, 52, 68, 83, 99, 125, 150, 172, 196, 223, 261, 298],
      },
    },
    conduitOnWall: {
      label: 'B2',
      amps: {
        2: [16.5, 23, 30, 38, 52, 69, 90, 111, 133, 168, 201, 232, 258, 294, 344, 394],
        3: [15, 20, 27, 34, 46, 62, 80, 99, 118, 149, 179, 206, 225, 255, 297, 339],
      },
    },
    clippedDirect: {
      label: 'C',
      amps: {
        2: [19.5, 27, 36, 46, 63, 85, 112, 138, 168, 213, 258, 299, 344, 392, 461, 530],
        3: [17.5, 24, 32, 41, 57, 76, 96, 119, 144, 184, 223, 259, 299, 341, 403, 464],
      },
    },
    trayOrFreeAir: {
      label: 'E',
      amps: {
        2: [22, 30, 40, 51, 70, 94, 119, 148, 180, 232, 282, 328, 379, 434, 514, 593],
        3: [18.5, 25, 34, 43, 60, 80, 101, 126, 153, 196, 238, 276, 319, 364, 430, 497],
      },
    },
  },
};

/** BS 7671 Table 4D1A, single-core PVC 70 °C non-armoured (check-values §7.4, confirmed). */
const BS_4D1A: CapacityTable = {
  id: 'bs7671-4d1a',
  title: 'BS 7671 Table 4D1A, single-core PVC 70 °C, copper',
  source: 'BS 7671 Table 4D1A columns 2-7 (check-values §7.4, confirmed from two reproductions)',
  material: 'Cu',
  insulation: 'thermoplastic70',
  constructions: ['singleCore'],
  referenceC: 30,
  sizesMm2: [1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95],
  methods: {
    conduitInInsulatedWall: {
      label: 'A',
      amps: {
        2: [11, 14.5, 20, 26, 34, 46, 61, 80, 99, 119, 151, 182],
        3: [10.5, 13.5, 18, 24, 31, 42, 56, 73, 89, 108, 136, 164],
      },
    },
    conduitOnWall: {
      label: 'B',
      amps: {
        2: [13.5, 17.5, 24, 32, 41, 57, 76, 101, 125, 151, 192, 232],
        3: [12, 15.5, 21, 28, 36, 50, 68, 89, 110, 134, 171, 207],
      },
    },
    clippedDirect: {
      label: 'C',
      amps: {
        2: [15.5, 20, 27, 37, 47, 65, 87, 114, 141, 182, 234, 284],
        3: [14, 18, 25, 33, 43, 59, 79, 104, 129, 167, 214, 261],
      },
    },
  },
};

/** BS 7671 Table 4D5, flat twin and twin-and-earth PVC 70 °C (check-values §7.5, mostly from memory). */
const BS_4D5: CapacityTable = {
  id: 'bs7671-4d5',
  title: 'BS 7671 Table 4D5, flat twin-and-earth PVC 70 °C, copper',
  source:
    'BS 7671 Table 4D5 (check-values §7.5; 1.0 mm² C, 2.5 mm² C and 4 mm² method 100 confirmed, other cells from memory)',
  material: 'Cu',
  insulation: 'thermoplastic70',
  constructions: ['flatTwinEarth'],
  referenceC: 30,
  sizesMm2: [1, 1.5, 2.5, 4, 6, 10, 16],
  methods: {
    // Method 100: above a plasterboard ceiling, touching insulation not over 100 mm thick.
    aboveInsulation: { label: '4D5 method 100', amps: { 2: [13, 16, 21, 27, 34, 45, 57] } },
    // Method 103: in a stud wall filled with insulation, not touching the inner skin.
    inInsulation: { label: '4D5 method 103', amps: { 2: [8, 10, 13.5, 17.5, 23.5, 32, 42.5] } },
    clippedDirect: { label: '4D5 method C', amps: { 2: [16, 20, 27, 37, 47, 64, 85] } },
    conduitInInsulatedWall: { label: '4D5 method A', amps: { 2: [11.5, 14.5, 20, 26, 32, 44, 57] } },
  },
};

/**
 * BS 7671 Table 4E1A, single-core XLPE 90 °C non-armoured (check-values §7.6, confirmed).
 * Method F (touching, on a perforated tray or in free air) is printed from 25 mm² only: two cables
 * flat (column 8) for two loaded conductors and three cables in trefoil (column 10) for three, the
 * lower of the trefoil and flat (column 9) columns at every size, since the model does not record
 * the formation. Confirmed 25-300 mm² from the manufacturer reproduction (S14b), 25-70 mm² also from
 * the distributor's (S14); column 10 also agrees at 25-300 mm² with IEC 60364-5-52 method F at
 * 90 °C as a compressor instruction book quotes it (easymanua.ls/atlas-copco/ga-45plus/manual?p=166).
 */
const BS_4E1A: CapacityTable = {
  id: 'bs7671-4e1a',
  title: 'BS 7671 Table 4E1A, single-core thermosetting 90 °C, copper',
  source:
    'BS 7671 Table 4E1A (check-values §7.6, confirmed from two reproductions [S14, S14b]; method F columns 8 and 10 confirmed 25-300 mm² from S14b, 25-70 mm² also from S14)',
  material: 'Cu',
  insulation: 'thermosetting90',
  constructions: ['singleCore'],
  referenceC: 30,
  sizesMm2: [1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300],
  methods: {
    conduitInInsulatedWall: {
      label: 'A',
      amps: {
        2: [14, 19, 26, 35, 45, 61, 81, 106, 131, 158, 200, 241, 278, 318, 362, 424, 486],
        3: [13, 17, 23, 31, 40, 54, 73, 95, 117, 141, 179, 216, 249, 285, 324, 380, 435],
      },
    },
    conduitOnWall: {
      label: 'B',
      amps: {
        2: [17, 23, 31, 42, 54, 75, 100, 133, 164, 198, 253, 306, 354, 393, 449, 528, 603],
        3: [15, 20, 28, 37, 48, 66, 88, 117, 144, 175, 222, 269, 312, 342, 384, 450, 514],
      },
    },
    clippedDirect: {
      label: 'C',
      amps: {
        2: [19, 25, 34, 46, 59, 81, 109, 143, 176, 228, 293, 355, 413, 476, 545, 644, 743],
        3: [17.5, 23, 31, 41, 54, 74, 99, 130, 161, 209, 268, 326, 379, 436, 500, 590, 681],
      },
    },
    trayOrFreeAir: {
      label: 'F (touching; 2 cables flat, 3 cables trefoil)',
      amps: {
        2: [null, null, null, null, null, null, null, 161, 200, 242, 310, 377, 437, 504, 575, 679, 783],
        3: [null, null, null, null, null, null, null, 135, 169, 207, 268, 328, 383, 444, 510, 607, 703],
      },
    },
  },
};

/** BS 7671 Table 4E4A, armoured multicore XLPE 90 °C (check-values §7.6, confirmed). */
const BS_4E4A: CapacityTable = {
  id: 'bs7671-4e4a',
  title: 'BS 7671 Table 4E4A, armoured multicore thermosetting 90 °C, copper',
  source: 'BS 7671 Table 4E4A methods C, D, E (check-values §7.6, confirmed from a reproduction)',
  material: 'Cu',
  insulation: 'thermosetting90',
  constructions: ['armouredMulticore'],
  referenceC: 30,
  sizesMm2: [1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300, 400],
  methods: {
    clippedDirect: {
      label: 'C',
      amps: {
        2: [27, 36, 49, 62, 85, 110, 146, 180, 219, 279, 338, 392, 451, 515, 607, 698, 787],
        3: [23, 31, 42, 53, 73, 94, 124, 154, 187, 238, 289, 335, 386, 441, 520, 599, 673],
      },
    },
    trayOrFreeAir: {
      label: 'E',
      amps: {
        2: [29, 39, 52, 66, 90, 115, 152, 188, 228, 291, 354, 410, 472, 539, 636, 732, 847],
        3: [25, 33, 44, 56, 78, 99, 131, 162, 197, 251, 304, 353, 406, 463, 546, 628, 728],
      },
    },
  },
};

/** Method D of 4E4A is referred to 20 °C ground, so it is its own table with that reference. */
const BS_4E4A_BURIED: CapacityTable = {
  ...BS_4E4A,
  id: 'bs7671-4e4a-d',
  title: 'BS 7671 Table 4E4A method D (direct in ground or in ducts), armoured XLPE 90 °C, copper',
  referenceC: 20,
  methods: {
    buriedDirect: {
      label: 'D',
      amps: {
        2: [25, 33, 43, 53, 71, 91, 116, 139, 164, 203, 239, 271, 306, 343, 395, 446, null],
        3: [21, 28, 36, 44, 58, 75, 96, 115, 135, 167, 197, 223, 251, 281, 324, 365, null],
      },
    },
    buriedDuct: {
      label: 'D',
      amps: {
        2: [25, 33, 43, 53, 71, 91, 116, 139, 164, 203, 239, 271, 306, 343, 395, 446, null],
        3: [21, 28, 36, 44, 58, 75, 96, 115, 135, 167, 197, 223, 251, 281, 324, 365, null],
      },
    },
  },
};

export const BUILT_IN_CAPACITY_TABLES: readonly CapacityTable[] = [
  IEC_PVC_MULTICORE,
  BS_4D1A,
  BS_4D5,
  BS_4E1A,
  BS_4E4A,
  BS_4E4A_BURIED,
];

export interface CapacityCell {
  table: CapacityTable;
  column: CapacityColumn;
  itA: number;
}

export interface CapacityQuery {
  material: Material;
  insulation: Insulation;
  construction: Construction;
  method: InstallMethod;
  loaded: LoadedConductors;
  sizeMm2: number;
}

/**
 * The tabulated capacity It for a cable, or undefined when no table covers the combination.
 * @example lookupCapacity({ material: 'Cu', insulation: 'thermoplastic70', construction: 'flatTwinEarth',
 *   method: 'clippedDirect', loaded: 2, sizeMm2: 2.5 })?.itA // 27
 */
export function lookupCapacity(
  q: CapacityQuery,
  tables: readonly CapacityTable[] = BUILT_IN_CAPACITY_TABLES,
): CapacityCell | undefined {
  for (const table of tables) {
    if (table.material !== q.material || table.insulation !== q.insulation) continue;
    if (!table.constructions.includes(q.construction)) continue;
    const column = table.methods[q.method];
    if (!column) continue;
    const i = table.sizesMm2.indexOf(q.sizeMm2);
    const itA = i < 0 ? undefined : column.amps[q.loaded]?.[i];
    if (itA == null) continue;
    return { table, column, itA };
  }
  return undefined;
}

/** Sizes for which a table covers the combination, ascending (used by sizing). */
export function sizesWithCapacity(
  q: Omit<CapacityQuery, 'sizeMm2'>,
  tables: readonly CapacityTable[] = BUILT_IN_CAPACITY_TABLES,
): number[] {
  const out = new Set<number>();
  for (const table of tables) {
    if (table.material !== q.material || table.insulation !== q.insulation) continue;
    if (!table.constructions.includes(q.construction)) continue;
    const amps = table.methods[q.method]?.amps[q.loaded];
    if (!amps) continue;
    table.sizesMm2.forEach((s, i) => {
      if (amps[i] != null) out.add(s);
    });
  }
  return [...out].sort((a, b) => a - b);
}
