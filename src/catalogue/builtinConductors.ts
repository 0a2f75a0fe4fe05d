/**
 * The built-in conductor data set, derived rather than copied: IEC 60228 Class 2 maximum
 * resistance at 20 °C, corrected to the insulation's maximum operating temperature with the
 * IEC 60228 coefficient, times the a.c. factor, plus the reactance per construction. The
 * reference tests compare the resulting mV/A/m with the published tables.
 */
import type { Construction, Insulation, Material } from '../model/types.ts';
import type { CatalogueSet, ConductorRow } from './catalogueSet.ts';
import { ALPHA20_PER_K, CLASS2_OHM_PER_KM_20C, atTemperature } from './iec60228.ts';
import { AC_FACTOR_SOURCE, acFactor } from './acFactor.ts';
import { reactanceOhmPerM } from './reactance.ts';

export const BUILTIN_DATA_SET_ID = 'builtin-iec60228';

/** Maximum continuous conductor temperature by insulation (IEC 60364-5-52 Table 52.1). */
export const OPERATING_TEMP_C: Readonly<Record<Insulation, number>> = {
  thermoplastic70: 70,
  thermosetting90: 90,
};

export const CONSTRUCTIONS: readonly Construction[] = [
  'flatTwinEarth',
  'multicore',
  'armouredMulticore',
  'singleCore',
];

const SIZE_RANGE: Readonly<Record<Material, readonly [number, number]>> = { Cu: [1, 300], Al: [16, 300] };

/** Flat twin-and-earth is only made in copper up to 16 mm². */
function made(material: Material, construction: Construction, sizeMm2: number): boolean {
  if (construction !== 'flatTwinEarth') return true;
  return material === 'Cu' && sizeMm2 <= 16;
}

function deriveRows(): ConductorRow[] {
  const rows: ConductorRow[] = [];
  for (const material of ['Cu', 'Al'] as const) {
    const [lo, hi] = SIZE_RANGE[material];
    const sizes = Object.keys(CLASS2_OHM_PER_KM_20C[material])
      .map(Number)
      .filter((s) => s >= lo && s <= hi)
      .sort((a, b) => a - b);
    for (const insulation of ['thermoplastic70', 'thermosetting90'] as const) {
      const tempC = OPERATING_TEMP_C[insulation];
      for (const construction of CONSTRUCTIONS) {
        for (const sizeMm2 of sizes) {
          if (!made(material, construction, sizeMm2)) continue;
          const r20PerKm = CLASS2_OHM_PER_KM_20C[material][sizeMm2];
          const x = reactanceOhmPerM(construction, insulation, sizeMm2);
          if (r20PerKm === undefined || x === undefined) continue;
          const k = acFactor(construction, sizeMm2);
          const rOhmPerM = atTemperature(r20PerKm / 1000, material, tempC) * k;
          const acText =
            k === 1
              ? ''
              : ` × a.c. factor ${k} (${AC_FACTOR_SOURCE[construction === 'armouredMulticore' ? 'armoured' : 'unarmoured']})`;
          rows.push({
            material,
            insulation,
            construction,
            sizeMm2,
            rOhmPerM,
            xOhmPerM: x.xOhmPerM,
            tempC,
            frequencyHz: 50,
            source:
              `IEC 60228 Class 2 ${material} ${sizeMm2} mm² ${r20PerKm} Ω/km at 20 °C × (1 + ${ALPHA20_PER_K[material]} × (${tempC} − 20))` +
              `${acText}; ${x.source}, ${(x.xOhmPerM * 1000).toFixed(4)} Ω/km at 50 Hz`,
          });
        }
      }
    }
  }
  return rows;
}

/**
 * The built-in set: copper 1-300 mm² and aluminium 16-300 mm², four constructions, two insulations.
 * @example BUILTIN_CATALOGUE.conductors.length // 162
 */
export const BUILTIN_CATALOGUE: CatalogueSet = {
  id: BUILTIN_DATA_SET_ID,
  title: 'Built-in conductor data (derived from IEC 60228)',
  source:
    'IEC 60228:2004 Table 2 maximum resistance at 20 °C and Annex B temperature coefficients; reactance and large-size a.c. factors fitted to the published BS 7671 Appendix 4 mV/A/m tables',
  conductors: deriveRows(),
};
