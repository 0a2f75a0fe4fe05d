/**
 * Fast lookup of a conductor row by material, insulation, construction and size. The index is
 * built once per data set (cached by object identity), so a plain-data set loaded from a file
 * needs no preparation. Keys are looked up in prototype-free objects, so a hostile string such as
 * "__proto__" in a document can never reach Object.prototype.
 */
import type { CatalogueSet, ConductorRow } from './catalogueSet.ts';

type SizeMap = Map<number, ConductorRow>;
type Index = Record<string, SizeMap>;

const cache = new WeakMap<CatalogueSet, Index>();

function keyOf(material: unknown, insulation: unknown, construction: unknown): string {
  return `${String(material)}|${String(insulation)}|${String(construction)}`;
}

function indexOf(set: CatalogueSet): Index {
  let index = cache.get(set);
  if (index) return index;
  index = Object.create(null) as Index;
  for (const row of set.conductors) {
    const key = keyOf(row.material, row.insulation, row.construction);
    let sizes = index[key];
    if (!sizes) {
      sizes = new Map();
      index[key] = sizes;
    }
    sizes.set(row.sizeMm2, row);
  }
  cache.set(set, index);
  return index;
}

/**
 * The row for one cable type and size, or undefined when the set holds none.
 * @example findConductor(BUILTIN_CATALOGUE, 'Cu', 'thermoplastic70', 'flatTwinEarth', 2.5)?.rOhmPerM
 */
export function findConductor(
  set: CatalogueSet,
  material: unknown,
  insulation: unknown,
  construction: unknown,
  sizeMm2: unknown,
): ConductorRow | undefined {
  const sizes = indexOf(set)[keyOf(material, insulation, construction)];
  return sizes && typeof sizeMm2 === 'number' ? sizes.get(sizeMm2) : undefined;
}

/** Sizes the set holds for one cable type, ascending (for "use one of ..." messages and sizing). */
export function sizesFor(
  set: CatalogueSet,
  material: unknown,
  insulation: unknown,
  construction: unknown,
): number[] {
  const sizes = indexOf(set)[keyOf(material, insulation, construction)];
  return sizes ? [...sizes.keys()].sort((a, b) => a - b) : [];
}

/**
 * Per-conductor values in the two usual tabulated forms.
 * Single-phase mV/A/m is the loop (2 conductors); three-phase is line to line (√3 × one conductor).
 * @example mvPerAm(row).singlePhase.r // 17.73 for Cu 2.5 mm² at 70 °C
 */
export function mvPerAm(row: Pick<ConductorRow, 'rOhmPerM' | 'xOhmPerM'>): {
  singlePhase: { r: number; x: number; z: number };
  threePhase: { r: number; x: number; z: number };
} {
  const r = row.rOhmPerM * 1000;
  const x = row.xOhmPerM * 1000;
  const form = (k: number) => ({ r: k * r, x: k * x, z: k * Math.hypot(r, x) });
  return { singlePhase: form(2), threePhase: form(Math.sqrt(3)) };
}
