/**
 * The working behind an element's figures, grouped as the editor's details panel shows it: shared
 * by the CLI's `--working` and the tender pack's working sheets.
 */
import type { Results, Working } from '../solver/results.ts';

/** A working value with its unit, at six significant figures ("0.0193 ohm/m", "230 V"). */
export function valueText(v: number | string, unit: string): string {
  const n = typeof v === 'number' ? (Number.isFinite(v) ? String(Number(v.toPrecision(6))) : String(v)) : v;
  return unit ? `${n} ${unit}` : n;
}

/** Every working record the results hold for an element, with where each sits. */
export function workingRecords(results: Results, id: string): { title: string; records: Working[] }[] | null {
  const own = (o: object, k: string) => Object.prototype.hasOwnProperty.call(o, k);
  const groups: { title: string; records: Working[] }[] = [];
  if (own(results.cables, id)) {
    const c = results.cables[id]!;
    groups.push({ title: 'Drop', records: c.working });
    // The same sections, in the same order, as the editor's details panel.
    if (c.protection) {
      groups.push({ title: 'Capacity and R1 + R2', records: c.protection.working });
      groups.push({ title: 'Protection checks', records: c.protection.checks.map((k) => k.working) });
    }
  } else if (own(results.nodes, id)) {
    const n = results.nodes[id]!;
    groups.push({ title: 'Drop', records: n.working });
    if (n.protection) {
      groups.push({ title: 'Loop impedance and fault level', records: n.protection.working });
      groups.push({ title: 'Protection checks', records: n.protection.checks.map((k) => k.working) });
    }
  } else {
    return null;
  }
  return groups;
}
