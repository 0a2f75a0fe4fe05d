/**
 * k factors for the adiabatic equation S = sqrt(I²t)/k, and the minimum protective conductor sizes
 * of the table method.
 *
 * Values: BS 7671 Tables 43.1 and 54.2-54.4 as reproduced in a published pocket guide
 * (check-values §5, confirmed) except where marked from memory.
 */
import type { Cpc, Insulation, Material } from '../model/types.ts';

export interface KValue {
  k: number;
  source: string;
}

/** k for a copper or aluminium line conductor (Table 43.1; Al from IEC 60364-4-43 Table 43A, from memory). */
export function lineConductorK(material: Material, insulation: Insulation, sizeMm2: number): KValue {
  const big = sizeMm2 > 300;
  if (insulation === 'thermosetting90') {
    return material === 'Cu'
      ? { k: 143, source: 'BS 7671 Table 43.1 (Cu, 90 °C thermosetting)' }
      : { k: 94, source: 'IEC 60364-4-43 Table 43A (Al, XLPE; from memory)' };
  }
  if (material === 'Cu')
    return { k: big ? 103 : 115, source: 'BS 7671 Table 43.1 (Cu, 70 °C thermoplastic)' };
  return { k: big ? 68 : 76, source: 'IEC 60364-4-43 Table 43A (Al, PVC; from memory)' };
}

/**
 * k for the circuit protective conductor, by how it is provided:
 * a core of the cable (Table 54.3), a separate insulated conductor (Table 54.2), or armour (Table 54.4).
 */
export function cpcK(cpc: Cpc, insulation: Insulation): KValue {
  const xlpe = insulation === 'thermosetting90';
  const big = cpc.sizeMm2 > 300;
  if (cpc.kind === 'armour') {
    if (cpc.material === 'steel') return { k: xlpe ? 46 : 51, source: 'BS 7671 Table 54.4 (steel armour)' };
    if (cpc.material === 'Al') return { k: xlpe ? 85 : 93, source: 'BS 7671 Table 54.4 (aluminium armour)' };
    return { k: xlpe ? 143 : 115, source: 'BS 7671 Table 54.3 applied to copper armour (from memory)' };
  }
  if (cpc.kind === 'separate') {
    if (cpc.material === 'Cu') return { k: xlpe ? 176 : big ? 133 : 143, source: 'BS 7671 Table 54.2 (Cu)' };
    if (cpc.material === 'Al') return { k: xlpe ? 116 : big ? 88 : 95, source: 'BS 7671 Table 54.2 (Al)' };
    return { k: xlpe ? 64 : 52, source: 'BS 7671 Table 54.2 (steel)' };
  }
  if (cpc.material === 'Cu')
    return { k: xlpe ? 143 : big ? 103 : 115, source: 'BS 7671 Table 54.3 (Cu core)' };
  if (cpc.material === 'Al')
    return { k: xlpe ? 94 : big ? 68 : 76, source: 'BS 7671 Table 54.3 (Al core; from memory)' };
  return { k: xlpe ? 46 : 51, source: 'BS 7671 Table 54.4 (steel; from memory)' };
}

/**
 * k from its defining formula (IEC 60364-5-54 Annex A): k = K0 · sqrt(ln(1 + (θf − θi)/(β + θi))),
 * with K0 = sqrt(Qc(β + 20)/ρ20): 226 Cu, 148 Al, 78 steel (from memory, check-values §5).
 * @example kFromTemperatures('Cu', 70, 160) // ≈ 115
 */
export function kFromTemperatures(material: Material | 'steel', initialC: number, finalC: number): number {
  const { k0, beta } = K_CONSTANTS[material];
  return k0 * Math.sqrt(Math.log(1 + (finalC - initialC) / (beta + initialC)));
}

const K_CONSTANTS: Readonly<Record<Material | 'steel', { k0: number; beta: number }>> = {
  Cu: { k0: 226, beta: 234.5 },
  Al: { k0: 148, beta: 228 },
  steel: { k0: 78, beta: 202 },
};

/**
 * Minimum protective conductor for the table method (BS 7671 Table 54.7 / IEC 60364-5-54 Table 54.2),
 * same material as the line conductor: S up to 16 mm², 16 mm² up to 35 mm², S/2 above.
 * @example tableMinimumCpcMm2(25) // 16
 */
export function tableMinimumCpcMm2(lineSizeMm2: number): number {
  if (lineSizeMm2 <= 16) return lineSizeMm2;
  if (lineSizeMm2 <= 35) return 16;
  return lineSizeMm2 / 2;
}
