/**
 * Conductor and source impedances for loop impedance and fault level.
 *
 * Resistances come from IEC 60228 maxima at 20 °C corrected to temperature; R and X are kept apart
 * and summed as complex impedances so a transformer source or a large cable keeps its angle.
 */
import type { Cable, Cpc, Insulation, Material, Settings, Supply } from '../../model/types.ts';
import { atTemperature, resistance20OhmPerM } from '../../catalogue/iec60228.ts';
import type { Impedance } from './protectionResults.ts';
import { hypot } from '../hypot.ts';

/** Maximum continuous conductor temperature, °C (IEC 60364-5-52 Table 52.1, check-values §1.5). */
export function operatingTempC(insulation: Insulation): number {
  return insulation === 'thermosetting90' ? 90 : 70;
}

/** Resistivity of steel armour at 20 °C, ohm mm²/m (IEC 60364-5-54 Annex A constant, from memory). */
export const STEEL_RHO20_OHM_MM2_PER_M = 0.138;
/** Temperature coefficient of steel at 20 °C from β = 202 °C: 1/(202 + 20) (from memory). */
export const STEEL_ALPHA20_PER_K = 1 / 222;

const R20_BY_SIZE: Readonly<Record<string, Map<number, number | undefined>>> = {
  Cu: new Map(),
  Al: new Map(),
};

/**
 * IEC 60228 resistance at 20 °C per metre (resistance20OhmPerM), remembered per material and size:
 * the table is keyed by the size's text, which costs a number-to-text conversion on every look-up.
 * @example lineResistance20OhmPerM('Cu', 2.5) // 0.00741
 */
export function lineResistance20OhmPerM(material: Material, sizeMm2: number): number | undefined {
  const bySize = material === 'Cu' || material === 'Al' ? R20_BY_SIZE[material] : undefined;
  if (!bySize) return resistance20OhmPerM(material, sizeMm2);
  const r = bySize.get(sizeMm2);
  if (r !== undefined || bySize.has(sizeMm2)) return r;
  const found = resistance20OhmPerM(material, sizeMm2);
  bySize.set(sizeMm2, found);
  return found;
}

/** Resistance of the protective conductor per metre at 20 °C, or undefined for a size IEC 60228 lacks. */
export function cpcResistance20OhmPerM(cpc: Cpc): number | undefined {
  if (!(cpc.sizeMm2 > 0)) return undefined;
  if (cpc.material === 'steel') return STEEL_RHO20_OHM_MM2_PER_M / cpc.sizeMm2;
  return lineResistance20OhmPerM(cpc.material, cpc.sizeMm2);
}

export function cpcAtTemperature(r20: number, cpc: Cpc, tempC: number): number {
  if (cpc.material === 'steel') return r20 * (1 + STEEL_ALPHA20_PER_K * (tempC - 20));
  return atTemperature(r20, cpc.material, tempC);
}

export interface SegmentLoop {
  /** R1 + R2 of the whole segment at operating temperature and at 20 °C, ohms. */
  r1r2HotOhm: number;
  r1r2ColdOhm: number;
  /** Line conductor resistance of the segment at 20 °C (for fault level), ohms. */
  r1ColdOhm: number;
  r1PerM20: number;
  r2PerM20: number;
}

/**
 * R1 + R2 of a cable segment. The cpc is taken at the line conductor's operating temperature, which
 * is conservative for armour and separate conductors. Parallel cables divide both resistances.
 * @example segmentLoop(cableOf2_5With1_5CpcAt30m)?.r1r2ColdOhm // 30 × 0.01951 = 0.5853
 */
export function segmentLoop(cable: Cable): SegmentLoop | undefined {
  const r1 = lineResistance20OhmPerM(cable.material, cable.sizeMm2);
  const r2 = cpcResistance20OhmPerM(cable.cpc);
  if (r1 === undefined || r2 === undefined) return undefined;
  const t = operatingTempC(cable.insulation);
  const n = Math.max(1, cable.parallel);
  const lengthM = cable.lengthM;
  const hot = (atTemperature(r1, cable.material, t) + cpcAtTemperature(r2, cable.cpc, t)) * lengthM;
  return {
    r1r2HotOhm: hot / n,
    r1r2ColdOhm: ((r1 + r2) * lengthM) / n,
    r1ColdOhm: (r1 * lengthM) / n,
    r1PerM20: r1,
    r2PerM20: r2,
  };
}

/** IEC 60909-0 Table 1 voltage factor for maximum currents, LV systems with +6 % tolerance (from memory). */
export const C_MAX = 1.05;

export interface SourceImpedance {
  /** Line-to-neutral loop impedance of the source, for single-phase faults. */
  loop: Impedance;
  /** Per-phase impedance of the source, for three-phase faults. */
  phase: Impedance;
  basis: string;
}

/**
 * Source impedance for fault level. A private supply with a transformer uses its kVA, uk and X/R
 * (infinite upstream network, which gives the higher current); otherwise the declared prospective
 * fault current sets |Z| = cmax U0 / Ipf, taken as reactance (the higher current downstream) and
 * used for both line-to-neutral and three-phase faults (the declared figure is the larger of the two).
 */
export function sourceImpedance(supply: Supply, settings: Settings): SourceImpedance | undefined {
  const tr = supply.transformer;
  if (supply.ownership === 'private' && tr && tr.kva > 0 && tr.impedancePct > 0) {
    const zOhm = ((tr.impedancePct / 100) * settings.uLlV ** 2) / (tr.kva * 1000);
    const ratio = Math.max(0, tr.xOverR);
    const r = zOhm / Math.sqrt(1 + ratio * ratio);
    const z = { rOhm: r, xOhm: r * ratio };
    return {
      loop: z,
      phase: z,
      basis: `transformer ${tr.kva} kVA, uk ${tr.impedancePct} %, X/R ${tr.xOverR}: Zt = uk x ULL² / S = ${zOhm.toPrecision(4)} ohm per phase`,
    };
  }
  if (!(supply.pfcKa > 0)) return undefined;
  const zOhm = (C_MAX * supply.u0V) / (supply.pfcKa * 1000);
  const z = { rOhm: 0, xOhm: zOhm };
  return {
    loop: z,
    phase: z,
    basis: `declared ${supply.pfcKa} kA at the origin: |Z| = cmax x U0 / Ipf = ${zOhm.toPrecision(4)} ohm, taken as reactance`,
  };
}

export function magnitude(z: Impedance): number {
  return hypot(z.rOhm, z.xOhm);
}
