/**
 * The fast read of each element's fields, done once in document order while the topology is
 * built, so later passes work on typed arrays only. Well-formed values are stored; anything else
 * only raises a flag (`nodeCheck`, `cableCheck`) and the careful checks in validateElements.ts,
 * which run on reached elements in the solver's usual order, write the finding.
 */
import type { CatalogueSet, ConductorRow } from '../catalogue/catalogueSet.ts';
import { MAX_PARALLEL } from '../model/bounds.ts';
import { findConductor } from '../catalogue/conductorLookup.ts';
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_LOAD } from './dropState.ts';

type Loose = Record<string, unknown>;

export const UNIT_W = 0;
export const UNIT_KW = 1;
export const UNIT_KVA = 2;
export const UNIT_A = 3;
const UNIT_BAD = 255;

function unitCode(unit: unknown): number {
  switch (unit) {
    case 'kW':
      return UNIT_KW;
    case 'W':
      return UNIT_W;
    case 'kVA':
      return UNIT_KVA;
    case 'A':
      return UNIT_A;
    default:
      return UNIT_BAD;
  }
}

/**
 * findConductor remembered per cable type and size for one solve: a network uses a few dozen
 * types, so most cables cost four map hits instead of building a text key. Answers with the row's
 * position in the state's `rows` (0 where there is none).
 */
export class RowMemo {
  private readonly byMaterial = new Map<string, Map<string, Map<string, Map<number, number>>>>();
  constructor(
    private readonly set: CatalogueSet,
    private readonly rows: (ConductorRow | undefined)[],
  ) {}

  private add(row: ConductorRow | undefined): number {
    if (!row) return 0;
    this.rows.push(row);
    return this.rows.length - 1;
  }

  /** Sizes met so far (a few standard ones), their position the size's id. */
  private readonly sizes: number[] = [];
  /** Row position + 1 by material, insulation, construction and size id (0: not looked up yet). */
  private readonly byCode = new Int32Array(2 * 2 * 4 * 64);

  find(material: unknown, insulation: unknown, construction: unknown, sizeMm2: unknown): number {
    // The usual types by code and a short scan of the sizes met: no hashing per cable.
    const mat = material === 'Cu' ? 0 : material === 'Al' ? 1 : -1;
    const ins = insulation === 'thermoplastic70' ? 0 : insulation === 'thermosetting90' ? 1 : -1;
    const con =
      construction === 'multicore'
        ? 0
        : construction === 'armouredMulticore'
          ? 1
          : construction === 'flatTwinEarth'
            ? 2
            : construction === 'singleCore'
              ? 3
              : -1;
    if (mat >= 0 && ins >= 0 && con >= 0 && typeof sizeMm2 === 'number' && sizeMm2 === sizeMm2) {
      const sizes = this.sizes;
      let id = 0;
      while (id < sizes.length && sizes[id] !== sizeMm2) id++;
      if (id < 64) {
        if (id === sizes.length) sizes.push(sizeMm2);
        const code = ((mat * 2 + ins) * 4 + con) * 64 + id;
        const held = this.byCode[code]!;
        if (held > 0) return held - 1;
        const at = this.add(findConductor(this.set, material, insulation, construction, sizeMm2));
        this.byCode[code] = at + 1;
        return at;
      }
    }
    if (
      typeof material !== 'string' ||
      typeof insulation !== 'string' ||
      typeof construction !== 'string' ||
      typeof sizeMm2 !== 'number'
    )
      return this.add(findConductor(this.set, material, insulation, construction, sizeMm2));
    let a = this.byMaterial.get(material);
    if (!a) this.byMaterial.set(material, (a = new Map()));
    let b = a.get(insulation);
    if (!b) a.set(insulation, (b = new Map()));
    let c = b.get(construction);
    if (!c) b.set(construction, (c = new Map()));
    let at = c.get(sizeMm2);
    if (at === undefined) {
      at = this.add(findConductor(this.set, material, insulation, construction, sizeMm2));
      c.set(sizeMm2, at);
    }
    return at;
  }
}

/** Stores a board's diversity or a load's demand fields; flags the node when one is not well formed. */
export function readNode(s: DropState, i: number, el: Loose, kind: number): void {
  if (kind === KIND_BOARD) {
    const d = el.diversity;
    const spare = el.spareCapacityPct;
    const okSpare = spare === undefined || (typeof spare === 'number' && spare >= 0 && spare <= 200);
    // The board's demand factor: its diversity, times its allowance for loads to come.
    if (typeof d === 'number' && d > 0 && d <= 1 && okSpare)
      s.diversity[i] = d * (1 + (typeof spare === 'number' ? spare : 0) / 100);
    else s.nodeCheck[i] = 1;
    return;
  }
  if (kind !== KIND_LOAD) return;
  const phases = el.phases;
  const phase = el.phase;
  s.loadDeclared[i] = phases === 3 ? 7 : phase === 'L2' ? 2 : phase === 'L3' ? 4 : 1;
  const category = el.category;
  s.loadCategory[i] = category === 'other' ? 1 : category === 'lighting' ? 0 : 2;
  if (el.motor) s.loadMotor[i] = 1;
  if (el.distributed === true) s.loadSpread[i] = 1;
  const demand = el.demand;
  const value = typeof demand === 'object' && demand !== null ? (demand as Loose).value : undefined;
  const unit = typeof demand === 'object' && demand !== null ? unitCode((demand as Loose).unit) : UNIT_BAD;
  const pf = el.powerFactor;
  const df = el.demandFactor;
  if (
    typeof value === 'number' &&
    Number.isFinite(value) &&
    value >= 0 &&
    unit !== UNIT_BAD &&
    typeof pf === 'number' &&
    pf > 0 &&
    pf <= 1 &&
    typeof df === 'number' &&
    df >= 0 &&
    df <= 1 &&
    (phases === 3 || (phases === 1 && (phase === 'L1' || phase === 'L2' || phase === 'L3')))
  ) {
    s.loadValue[i] = value;
    s.loadUnit[i] = unit;
    s.loadPf[i] = pf;
    s.loadDf[i] = df;
  } else s.nodeCheck[i] = 1;
}

/** Stores a cable's length, conductor row, parallel count and phases (every cable with an id of its own); flags it when a field is not well formed. */
export function readCable(s: DropState, j: number, c: Loose, rows: RowMemo): void {
  const phases = c.phases;
  s.cablePhasesField[j] = phases === 3 ? 3 : phases === 1 ? 1 : 0;
  const lengthM = c.lengthM;
  const okLength = typeof lengthM === 'number' && Number.isFinite(lengthM) && lengthM > 0;
  if (okLength) s.cableLengthM[j] = lengthM;
  const p = c.parallel;
  const okParallel = typeof p === 'number' && Number.isInteger(p) && p >= 1 && p <= MAX_PARALLEL;
  if (okParallel) s.cableParallel[j] = p;
  const at = rows.find(c.material, c.insulation, c.construction, c.sizeMm2);
  s.cableRowAt[j] = at;
  const row = s.rows[at];
  if (!(okLength && okParallel && row)) s.cableCheck[j] = 1;
}
