/**
 * The readable report `dropline compare` prints: project details, the cautions, the data and
 * methods each design used, then each comparison's tables (src/export/comparison.ts, the same the
 * tender pack prints) and the conductor-metal working once.
 */
import { CAUTIONS } from '../model/cautions.ts';
import {
  COMPARISON_METHOD,
  comparisonTables,
  metalWorking,
  tableList,
  type TextTable,
} from '../export/comparison.ts';
import { projectDetailRows } from '../export/labels.ts';
import type { CompareRun, DesignInfo } from './compareJson.ts';
import { table, wrap } from './format.ts';

const WIDTH = 100;

function header(run: CompareRun): string {
  const rows = [...projectDetailRows(run.doc.details), ['File', run.file] as [string, string]];
  if (run.otherFile !== null) rows.push(['Other file', run.otherFile]);
  const n = run.comparisons.length;
  rows.push([
    'Compared',
    run.otherFile !== null
      ? 'the current design of each file'
      : n === 1
        ? 'the current design with one alternative'
        : `the current design with each of its ${n} alternatives, in turn`,
  ]);
  return [
    'DROPLINE COMPARE',
    ...rows.filter(([, v]) => v !== '').map(([k, v]) => `  ${k.padEnd(14)}${v}`),
  ].join('\n');
}

/**
 * Each data set, limit profile, fuse data and capacity table used, once, with the designs that used
 * it where not every design did.
 */
function dataAndMethods(run: CompareRun): string {
  const used = new Map<string, string[]>();
  const note = (text: string, label: string) => {
    const list = used.get(text) ?? [];
    if (!list.includes(label)) list.push(label);
    used.set(text, list);
  };
  const references = new Set<string>();
  for (const { design, results: r } of run.designs) {
    note(`Conductor data: ${r.dataSet.title} (${r.dataSet.id}). ${r.dataSet.source}`, design.label);
    note(`Limit profile: ${r.profile.title}. ${r.profile.source}`, design.label);
    if (r.protection) {
      note(`Fuse data: ${r.protection.fuseDataSet.title}. ${r.protection.fuseDataSet.source}`, design.label);
      if (r.protection.capacityDataSets.length > 0)
        note(`Capacity tables: ${r.protection.capacityDataSets.join('; ')}`, design.label);
    }
    for (const ref of r.references) references.add(ref);
  }
  const all = run.designs.length;
  const lines = ['DATA AND METHODS'];
  for (const [text, labels] of used)
    lines.push(wrap(labels.length === all ? text : `${text} [${labels.join(', ')}]`, WIDTH, '    ', '  '));
  lines.push('  Standards and editions:');
  for (const r of references) lines.push(wrap(r, WIDTH, '      ', '    - '));
  lines.push(wrap(`How designs are compared: ${COMPARISON_METHOD}`, WIDTH, '    ', '  '));
  return lines.join('\n');
}

function designLine(letter: string, d: DesignInfo): string {
  const what =
    d.alternative === null
      ? `the current design of ${d.file}`
      : `an alternative kept in ${d.file}${d.keptAt ? ` on ${d.keptAt.slice(0, 10)}` : ''}`;
  const text = `${letter}  ${d.label}: ${what}${d.note ? `. Note: ${d.note}` : ''}`;
  return wrap(text, WIDTH, '     ', '  ');
}

export function textTable(t: TextTable): string {
  const lines = t.title ? [t.title.toUpperCase()] : [];
  if (t.note) lines.push(wrap(t.note, WIDTH, '  ', '  '));
  lines.push(t.rows.length === 0 ? `  ${t.empty}` : table(t.headers, t.rows, t.align, '  ', WIDTH));
  return lines.join('\n');
}

export function formatCompareReport(run: CompareRun): string {
  const info = new Map(run.designs.map(({ design }) => [design.label, design]));
  const parts = [
    header(run),
    ['CAUTIONS', ...CAUTIONS.map((c) => wrap(c, WIDTH, '    ', '  ! '))].join('\n'),
    dataAndMethods(run),
  ];
  run.comparisons.forEach((c, k) => {
    const n = run.comparisons.length;
    const a = info.get(c.a.label);
    const b = info.get(c.b.label);
    parts.push(
      [
        `==== ${n > 1 ? `${k + 1} of ${n}: ` : ''}${c.a.label} against ${c.b.label} ====`,
        ...(a ? [designLine('A', a)] : []),
        ...(b ? [designLine('B', b)] : []),
      ].join('\n'),
    );
    for (const t of tableList(comparisonTables(c))) parts.push(textTable(t));
  });
  const metal = metalWorking(
    run.designs.map(({ design }) => {
      const c = run.comparisons.find((x) => x.a.label === design.label || x.b.label === design.label)!;
      return c.a.label === design.label ? c.a : c.b;
    }),
  );
  parts.push(
    [
      'CONDUCTOR METAL: WORKING',
      ...metal.lines.map((l) => wrap(l, WIDTH, '    ', '  ')),
      textTable({ ...metal.table, title: '' }),
    ].join('\n'),
  );
  parts.push(
    wrap(
      'The working behind any drop or check: dropline check FILE --working ID for a file’s current design; open an alternative in the editor to see its own.',
      WIDTH,
      '',
    ),
  );
  return `${parts.join('\n\n')}\n`;
}
