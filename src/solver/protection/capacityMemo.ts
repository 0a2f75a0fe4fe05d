/**
 * Per-solve memory of capacity figures and cpc k values: most cables of a large network share their
 * construction, size and installation, so each distinct combination is looked up once. Lives for
 * one attachProtection call only (documents may change between calls).
 */
import type { Cable, Cpc, Installation, Insulation } from '../../model/types.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import { cpcK } from '../../catalogue/kValues.ts';
import { capacityFigures, REFERENCE_INSTALLATION, type CapacityFigures } from './capacity.ts';

const MATERIAL: Readonly<Record<string, number>> = { Cu: 0, Al: 1, steel: 2 };
const INSULATION: Readonly<Record<string, number>> = { thermoplastic70: 0, thermosetting90: 1 };
const CONSTRUCTION: Readonly<Record<string, number>> = {
  flatTwinEarth: 0,
  multicore: 1,
  armouredMulticore: 2,
  singleCore: 3,
};
const CPC_KIND: Readonly<Record<string, number>> = { core: 0, separate: 1, armour: 2 };

type Figures = CapacityFigures | { error: string };

export class CapacityMemo {
  readonly #tables: readonly CapacityTable[];
  /** Installation conditions by content (method, ambient, grouping, arrangement, Ci) to cable types. */
  readonly #byInstallation = new Map<
    string,
    Map<number, Map<number, Map<string, Map<number, Map<number, number>>>>>
  >();
  /** The last conditions met and their entry: most cables of a design share them. */
  #lastInst: Installation | undefined;
  #lastByKey: Map<number, number> | undefined;
  /** Every set of figures worked out, each once; `figuresAt` answers with a position here. */
  readonly list: Figures[] = [];
  /** Sizes met so far, their position the size's id (a few standard sizes: a scan beats hashing a double). */
  readonly #sizes: number[] = [];
  readonly #k: number[] = [];

  constructor(tables: readonly CapacityTable[]) {
    this.#tables = tables;
  }

  /** The memory for one set of installation conditions, found by content (capacityFigures reads only these fields). */
  #forInstallation(inst: Installation): Map<number, number> {
    const last = this.#lastInst;
    if (
      last !== undefined &&
      (last === inst ||
        (last.method === inst.method &&
          Object.is(last.ambientC, inst.ambientC) &&
          Object.is(last.groupedCircuits, inst.groupedCircuits) &&
          last.groupArrangement === inst.groupArrangement &&
          Object.is(last.insulationFactor, inst.insulationFactor)))
    )
      return this.#lastByKey!;
    let a = this.#byInstallation.get(inst.method);
    if (!a) this.#byInstallation.set(inst.method, (a = new Map()));
    let b = a.get(inst.ambientC);
    if (!b) a.set(inst.ambientC, (b = new Map()));
    let c = b.get(inst.groupedCircuits);
    if (!c) b.set(inst.groupedCircuits, (c = new Map()));
    let d = c.get(inst.groupArrangement);
    if (!d) c.set(inst.groupArrangement, (d = new Map()));
    let byKey = d.get(inst.insulationFactor);
    if (!byKey) d.set(inst.insulationFactor, (byKey = new Map()));
    this.#lastInst = inst;
    this.#lastByKey = byKey;
    return byKey;
  }

  /** capacityFigures(cable, tables) as a new entry of `list`, where it stays. */
  #add(cable: Cable): number {
    this.list.push(capacityFigures(cable, this.#tables));
    return this.list.length - 1;
  }

  /** Position in `list` of capacityFigures(cable, tables), remembered by installation conditions and cable type. */
  figuresAt(cable: Cable): number {
    const mat = MATERIAL[cable.material];
    const ins = INSULATION[cable.insulation];
    const con = CONSTRUCTION[cable.construction];
    const parallel = cable.parallel;
    if (
      mat === undefined ||
      ins === undefined ||
      con === undefined ||
      !Number.isInteger(parallel) ||
      parallel < 0 ||
      parallel > 999 ||
      typeof cable.sizeMm2 !== 'number' ||
      Number.isNaN(cable.sizeMm2)
    )
      return this.#add(cable);
    const size = cable.sizeMm2;
    const sizes = this.#sizes;
    let sizeId = 0;
    while (sizeId < sizes.length && sizes[sizeId] !== size) sizeId++;
    if (sizeId === sizes.length) {
      // Past the standard sizes the scan would grow with the document: work those out each time.
      if (sizes.length >= 64) return this.#add(cable);
      sizes.push(size);
    }
    const key =
      (((sizeId * 1000 + parallel) * 4 + con) * 2 + ins) * 3 * 2 + mat * 2 + (cable.phases === 3 ? 1 : 0);
    const inst = cable.installation ?? REFERENCE_INSTALLATION;
    if (
      typeof inst.method !== 'string' ||
      typeof inst.groupArrangement !== 'string' ||
      typeof inst.ambientC !== 'number' ||
      typeof inst.groupedCircuits !== 'number' ||
      typeof inst.insulationFactor !== 'number'
    )
      return this.#add(cable);
    const byKey = this.#forInstallation(inst);
    let at = byKey.get(key);
    if (at === undefined) {
      at = this.#add(cable);
      byKey.set(key, at);
    }
    return at;
  }

  /** cpcK(cpc, insulation).k, remembered by kind, material, insulation and whether above 300 mm². */
  cpcK(cpc: Cpc, insulation: Insulation): number {
    const kind = CPC_KIND[cpc.kind];
    const mat = MATERIAL[cpc.material];
    const ins = INSULATION[insulation];
    if (kind === undefined || mat === undefined || ins === undefined) return cpcK(cpc, insulation).k;
    const key = ((kind * 3 + mat) * 2 + ins) * 2 + (cpc.sizeMm2 > 300 ? 1 : 0);
    let k = this.#k[key];
    if (k === undefined) {
      k = cpcK(cpc, insulation).k;
      this.#k[key] = k;
    }
    return k;
  }
}
