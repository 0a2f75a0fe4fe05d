/**
 * Per-solve memory of capacity figures, conductor resistances and cpc k values: most cables of a
 * large network share their construction, size, cpc and installation, so each distinct combination
 * is worked out once. Lives for one attachProtection call only (documents may change between calls).
 */
import type { Cable, Cpc, Installation, Insulation } from '../../model/types.ts';
import type { CapacityTable } from '../../catalogue/capacityTables.ts';
import { cpcK, tableMinimumCpcMm2 } from '../../catalogue/kValues.ts';
import { atTemperature } from '../../catalogue/iec60228.ts';
import { capacityFigures, REFERENCE_INSTALLATION, type CapacityFigures } from './capacity.ts';
import {
  cpcAtTemperature,
  cpcResistance20OhmPerM,
  lineResistance20OhmPerM,
  operatingTempC,
} from './impedance.ts';

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

/**
 * What a cable's conductors give per metre, before its length and parallel count (the same
 * expressions as segmentLoop and cpcCheck): R1 at 20 °C, R1 + R2 at 20 °C and at the operating
 * temperature; the cpc's k and whether it meets the table minimum. `known` is false where IEC 60228
 * lists no resistance for the line conductor or the cpc.
 */
export interface ConductorFigures {
  known: boolean;
  r1PerM: number;
  r1r2ColdPerM: number;
  r1r2HotPerM: number;
  cpcK: number;
  byTable: boolean;
}

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
  /** Conductor figures by material, insulation, size and cpc (kind, material, size). */
  readonly #conductors = new Map<number, ConductorFigures>();

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
    // Past the standard sizes the scan would grow with the document: work those out each time.
    const sizeId = this.#sizeId(cable.sizeMm2);
    if (sizeId < 0) return this.#add(cable);
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

  /** Position of a size among those met (a few standard sizes), -1 past 64 of them or for NaN. */
  #sizeId(size: number): number {
    if (Number.isNaN(size)) return -1;
    const sizes = this.#sizes;
    let sizeId = 0;
    while (sizeId < sizes.length && sizes[sizeId] !== size) sizeId++;
    if (sizeId === sizes.length) {
      if (sizes.length >= 64) return -1;
      sizes.push(size);
    }
    return sizeId;
  }

  /** The conductor figures of `cable`, worked out once per distinct conductor and cpc. */
  conductor(cable: Cable): ConductorFigures {
    const cpc = cable.cpc;
    const mat = MATERIAL[cable.material];
    const ins = INSULATION[cable.insulation];
    const kind = CPC_KIND[cpc.kind];
    const cpcMat = MATERIAL[cpc.material];
    if (
      mat === undefined ||
      ins === undefined ||
      kind === undefined ||
      cpcMat === undefined ||
      typeof cable.sizeMm2 !== 'number' ||
      typeof cpc.sizeMm2 !== 'number'
    )
      return this.#conductorFigures(cable);
    const sizeId = this.#sizeId(cable.sizeMm2);
    const cpcSizeId = this.#sizeId(cpc.sizeMm2);
    if (sizeId < 0 || cpcSizeId < 0) return this.#conductorFigures(cable);
    const key = ((((sizeId * 64 + cpcSizeId) * 3 + kind) * 3 + cpcMat) * 3 + mat) * 2 + ins;
    let f = this.#conductors.get(key);
    if (!f) {
      f = this.#conductorFigures(cable);
      this.#conductors.set(key, f);
    }
    return f;
  }

  #conductorFigures(cable: Cable): ConductorFigures {
    const cpc = cable.cpc;
    const r1 = lineResistance20OhmPerM(cable.material, cable.sizeMm2);
    const r2 = cpcResistance20OhmPerM(cpc);
    const byTable =
      cpc.kind !== 'armour' &&
      cpc.material === cable.material &&
      cpc.sizeMm2 >= tableMinimumCpcMm2(cable.sizeMm2);
    if (r1 === undefined || r2 === undefined)
      return { known: false, r1PerM: NaN, r1r2ColdPerM: NaN, r1r2HotPerM: NaN, cpcK: NaN, byTable };
    const tempC = operatingTempC(cable.insulation);
    return {
      known: true,
      r1PerM: r1,
      r1r2ColdPerM: r1 + r2,
      r1r2HotPerM: atTemperature(r1, cable.material, tempC) + cpcAtTemperature(r2, cpc, tempC),
      cpcK: this.cpcK(cpc, cable.insulation),
      byTable,
    };
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
