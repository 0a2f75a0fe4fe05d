/** `--working ID`: every working record behind one element's figures, in full. */
import type { ProjectDocument } from '../model/types.ts';
import type { Results, Working } from '../solver/results.ts';
import { wrap } from './format.ts';
import { valueText, workingRecords } from '../export/working.ts';

/** One record: title, formula, inputs with units and sources, result, and any simplification. */
export function formatWorking(w: Working, indent = '  '): string {
  const lines = [`${indent}${w.title}  [${w.key}]`, `${indent}  formula: ${w.formula}`];
  for (const i of w.inputs) {
    lines.push(`${indent}  ${i.name} = ${valueText(i.value, i.unit)}    (${i.source})`);
  }
  lines.push(`${indent}  result: ${valueText(w.result.value, w.result.unit)}`);
  if (w.note) lines.push(wrap(`note: ${w.note}`, 100, `${indent}    `, `${indent}  `));
  return lines.join('\n');
}

/**
 * @example
 *   formatElementWorking(doc, results, 'C3'); // text, or null when C3 is not in the results
 */
export function formatElementWorking(doc: ProjectDocument, results: Results, id: string): string | null {
  const groups = workingRecords(results, id);
  if (!groups) return null;
  const node = doc.nodes.find((n) => n.id === id);
  const cable = doc.cables.find((c) => c.id === id);
  const label = cable
    ? `cable ${id} "${cable.name}" (${cable.from} > ${cable.to})`
    : `${node?.kind ?? 'node'} ${id} "${node?.name ?? ''}"`;
  const out = [`WORKING FOR ${label}`];
  for (const g of groups) {
    if (g.records.length === 0) continue;
    out.push('', `${g.title}:`, ...g.records.map((w) => formatWorking(w)));
  }
  if (out.length === 1) out.push('', '  no figures were computed for this element (see the findings)');
  return out.join('\n') + '\n';
}

/** Ids that look like the one asked for, to suggest on a typo. */
export function similarIds(results: Results, id: string): string[] {
  const all = [...Object.keys(results.cables), ...Object.keys(results.nodes)];
  const lower = id.toLowerCase();
  return all
    .filter((k) => k.toLowerCase() === lower || k.toLowerCase().startsWith(lower.slice(0, 2)))
    .slice(0, 8);
}
