/**
 * Conductor metal in a cable run: how many kilograms of copper or aluminium its conductors hold.
 * A comparison of alternatives reports it, because a design that passes with less metal costs
 * less to buy and to pull in.
 *
 * Method: mass = density × nominal cross-section × route length × conductors × cables in parallel.
 * - Conductors: the line conductors the cable carries (1 or 3) and a neutral of the same size
 *   (the solver takes the neutral equal to the phase conductor too), plus the cpc where it is a
 *   core or a separate copper or aluminium conductor. Steel armour is not conductor metal and is
 *   left out.
 * - The nominal cross-section stands in for the metal's true section (IEC 60228 sets a conductor
 *   by its resistance, not its area), so the figure is an estimate for comparing designs, not a
 *   purchase quantity; drum lengths, terminations and waste are not in it.
 */
import type { Cable } from '../../model/types.ts';
import type { Working, WorkingInput } from '../results.ts';

/** Density of annealed copper at 20 °C, kg/m³: IEC 60028 (8.89 g/cm³). */
export const COPPER_DENSITY = 8890;
/** Density of aluminium conductor wire at 20 °C, kg/m³: IEC 60889 (2.703 g/cm³). */
export const ALUMINIUM_DENSITY = 2703;

export const DENSITY_SOURCE = {
  Cu: 'IEC 60028 (international standard of resistance for copper): 8.89 g/cm³ at 20 °C',
  Al: 'IEC 60889 (hard-drawn aluminium wire): 2.703 g/cm³ at 20 °C',
} as const;

export interface CableMetal {
  copperKg: number;
  aluminiumKg: number;
}

function finitePositive(v: unknown): number {
  return typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : 0;
}

/** Metal in one cable run (all its parallel cables). Unusable fields count as nothing. */
export function cableMetal(cable: Cable): CableMetal {
  const length = finitePositive(cable.lengthM);
  const parallel = Number.isInteger(cable.parallel) && cable.parallel > 0 ? cable.parallel : 1;
  const size = finitePositive(cable.sizeMm2);
  const lines = cable.phases === 3 ? 3 : 1;
  // m² × m × kg/m³: mm² × 1e-6.
  const perMetre = (area: number, density: number) => area * 1e-6 * density;
  const lineDensity = cable.material === 'Al' ? ALUMINIUM_DENSITY : COPPER_DENSITY;
  const lineKg = perMetre((lines + 1) * size, lineDensity) * length * parallel;
  let cpcCu = 0;
  let cpcAl = 0;
  const cpc = cable.cpc;
  if (cpc && (cpc.kind === 'core' || cpc.kind === 'separate')) {
    const area = finitePositive(cpc.sizeMm2);
    // A core runs in every parallel cable; a separate cpc is one conductor along the route.
    const count = cpc.kind === 'core' ? parallel : 1;
    if (cpc.material === 'Cu') cpcCu = perMetre(area, COPPER_DENSITY) * length * count;
    else if (cpc.material === 'Al') cpcAl = perMetre(area, ALUMINIUM_DENSITY) * length * count;
  }
  return cable.material === 'Al'
    ? { copperKg: cpcCu, aluminiumKg: lineKg + cpcAl }
    : { copperKg: lineKg + cpcCu, aluminiumKg: cpcAl };
}

export interface MetalTotals {
  copperKg: number;
  aluminiumKg: number;
  /** Route length of every cable run, metres (parallel cables counted once). */
  routeM: number;
  working: Working;
}

/** Metal in every cable of a design, with its working. */
export function metalTotals(cables: readonly Cable[]): MetalTotals {
  let copperKg = 0;
  let aluminiumKg = 0;
  let routeM = 0;
  for (const c of cables) {
    const m = cableMetal(c);
    copperKg += m.copperKg;
    aluminiumKg += m.aluminiumKg;
    routeM += finitePositive(c.lengthM);
  }
  const inputs: WorkingInput[] = [
    { name: 'ρ Cu', value: COPPER_DENSITY, unit: 'kg/m³', source: DENSITY_SOURCE.Cu },
    { name: 'ρ Al', value: ALUMINIUM_DENSITY, unit: 'kg/m³', source: DENSITY_SOURCE.Al },
    { name: 'cable runs', value: cables.length, unit: '', source: 'document: cables' },
    { name: 'Σ L', value: Number(routeM.toPrecision(6)), unit: 'm', source: 'document: cable lengthM' },
  ];
  return {
    copperKg,
    aluminiumKg,
    routeM,
    working: {
      key: 'metal',
      title: 'Conductor metal',
      formula:
        'm = Σ ρ × S × L × n × parallel, n = line conductors + neutral (same size) + cpc core or separate cpc',
      inputs,
      result: {
        value: `${Number(copperKg.toPrecision(4))} kg Cu, ${Number(aluminiumKg.toPrecision(4))} kg Al`,
        unit: '',
      },
      note: 'Nominal cross-sections; steel armour, drum waste and terminations are not included. An estimate for comparing designs, not a purchase quantity.',
    },
  };
}
