/**
 * The readable report `dropline check FILE` prints: project details, cautions, data and methods,
 * loads, cables, findings and the verdict.
 */
import type { ProjectDocument } from '../model/types.ts';
import { CAUTIONS } from '../model/cautions.ts';
import { STATUS_SHOWN, type Results, type Status } from '../solver/results.ts';
import { fixed, table, wrap } from './format.ts';
import type { CheckSummary } from './summary.ts';
import { projectDetailRows } from '../export/labels.ts';

/** The same words (STATUS_SHOWN) and glyphs the editor shows (src/ui/status.ts); a test keeps the glyphs equal. */
export const STATUS_TEXT: Readonly<Record<Status | 'none', string>> = {
  within: `✓ ${STATUS_SHOWN.within}`,
  close: `▲ ${STATUS_SHOWN.close}`,
  over: `✕ ${STATUS_SHOWN.over}`,
  none: '– no result',
};

const WIDTH = 100;

function statusText(s: Status | null | undefined): string {
  return STATUS_TEXT[s ?? 'none'];
}

/** Names of the nodes along a path of cable ids, origin first. */
export function pathNames(doc: ProjectDocument, path: readonly string[]): string {
  if (path.length === 0) return '(not fed)';
  const nodeName = new Map(doc.nodes.map((n) => [n.id, n.name || n.id]));
  const cableById = new Map(doc.cables.map((c) => [c.id, c]));
  const first = cableById.get(path[0]!);
  const names = [first ? (nodeName.get(first.from) ?? first.from) : '?'];
  for (const id of path) {
    const c = cableById.get(id);
    names.push(c ? (nodeName.get(c.to) ?? c.to) : `?${id}`);
  }
  return names.join(' > ');
}

function header(doc: ProjectDocument, file: string): string {
  const rows = [...projectDetailRows(doc.details), ['File', file] as [string, string]];
  const s = doc.settings;
  rows.push([
    'Supply system',
    `${s.u0V}/${s.uLlV} V ${s.frequencyHz} Hz; drop computed with ${s.designCurrentBasis === 'Ib' ? 'design current Ib' : 'device rating In'}`,
  ]);
  return [
    'DROPLINE CHECK',
    ...rows.filter(([, v]) => v !== '').map(([k, v]) => `  ${k.padEnd(14)}${v}`),
  ].join('\n');
}

function cautions(results: Results): string {
  const lines = ['CAUTIONS', ...CAUTIONS.map((c) => wrap(c, WIDTH, '    ', '  ! '))];
  lines.push('', 'DATA AND METHODS');
  lines.push(
    wrap(
      `Conductor data: ${results.dataSet.title} (${results.dataSet.id}). ${results.dataSet.source}`,
      WIDTH,
      '    ',
      '  ',
    ),
  );
  lines.push(wrap(`Limit profile: ${results.profile.title}. ${results.profile.source}`, WIDTH, '    ', '  '));
  if (results.protection) {
    const p = results.protection;
    lines.push(wrap(`Fuse data: ${p.fuseDataSet.title}. ${p.fuseDataSet.source}`, WIDTH, '    ', '  '));
    if (p.capacityDataSets.length > 0)
      lines.push(wrap(`Capacity tables: ${p.capacityDataSets.join('; ')}`, WIDTH, '    ', '  '));
  }
  lines.push('  Standards and editions:');
  for (const r of results.references) lines.push(wrap(r, WIDTH, '      ', '    - '));
  return lines.join('\n');
}

function loads(doc: ProjectDocument, results: Results): string {
  const rows = doc.nodes
    .filter((n) => n.kind === 'load')
    .map((n) => {
      const r = results.loads[n.id];
      return [
        n.id,
        n.name,
        n.category,
        fixed(r?.cumulativePct.value, 2),
        fixed(r?.limitPct.value, 2),
        r ? `${fixed(r.budgetUsed * 100, 0)} %` : '-',
        statusText(r?.status),
        pathNames(doc, r?.path ?? []),
      ];
    });
  return [
    `LOADS (${rows.length}): cumulative drop from the origin, worst phase, % of U0`,
    table(
      ['Id', 'Name', 'Limit for', 'Drop %', 'Limit %', 'Budget', 'Status', 'Path from the origin'],
      rows,
      ['left', 'left', 'left', 'right', 'right', 'right', 'left', 'left'],
    ),
  ].join('\n');
}

function cables(doc: ProjectDocument, results: Results): string {
  const rows = doc.cables.map((c) => {
    const r = results.cables[c.id];
    const size = `${c.parallel > 1 ? `${c.parallel}x` : ''}${c.sizeMm2} ${c.material}`;
    return [
      c.id,
      c.name,
      `${c.from} > ${c.to}`,
      fixed(c.lengthM, 1),
      size,
      r ? r.phases.join(',') : '-',
      fixed(r?.ibA, 1),
      fixed(r?.dropV, 2),
      r ? `${fixed(r.dropPct.value, 2)} ${r.dropPct.basis}` : '-',
      fixed(r?.cumulativePct.value, 2),
      r?.maxLengthM === null || r?.maxLengthM === undefined ? '-' : fixed(r.maxLengthM, 0),
      statusText(r?.status),
    ];
  });
  return [
    `CABLES (${rows.length}): Ib in A, drop along the segment, cumulative % of U0 at the far end`,
    table(
      [
        'Id',
        'Name',
        'From > to',
        'Length m',
        'Size mm²',
        'Phases',
        'Ib A',
        'Drop V',
        'Drop %',
        'Cum. %',
        'Max m',
        'Status',
      ],
      rows,
      ['left', 'left', 'left', 'right', 'left', 'left', 'right', 'right', 'right', 'right', 'right', 'left'],
    ),
  ].join('\n');
}

function findings(results: Results): string {
  if (results.findings.length === 0) return 'FINDINGS\n  none';
  const order = { error: 0, warning: 1, info: 2 } as const;
  const sorted = [...results.findings].sort((a, b) => order[a.severity] - order[b.severity]);
  return [
    `FINDINGS (${sorted.length})`,
    ...sorted.map((f) =>
      wrap(
        `${f.severity.toUpperCase()} [${f.code}]${f.elementId ? ` ${f.elementId}` : ''}: ${f.message}`,
        WIDTH,
        '      ',
        '  ',
      ),
    ),
  ].join('\n');
}

function verdict(s: CheckSummary): string {
  const parts = [
    `${s.loads} loads: ${s.within} ${STATUS_SHOWN.within}, ${s.close} ${STATUS_SHOWN.close}, ${s.over} ${STATUS_SHOWN.over}${s.unsolved ? `, ${s.unsolved} with no result` : ''}`,
    `findings: ${s.errorFindings} errors, ${s.warningFindings} warnings, ${s.infoFindings} notes`,
  ];
  if (s.failedChecks || s.unassessedChecks) {
    parts.push(`protection checks: ${s.failedChecks} failed, ${s.unassessedChecks} not assessed`);
  }
  const word =
    s.exitCode === 0
      ? 'PASS: every load is within its limit and there is no error finding'
      : `FAIL: ${[s.over ? `${s.over} load(s) over the limit` : '', s.errorFindings ? `${s.errorFindings} error finding(s)` : '', s.failedChecks ? `${s.failedChecks} failed check(s)` : ''].filter(Boolean).join(', ')}`;
  return ['RESULT', ...parts.map((p) => `  ${p}`), `  ${word}`].join('\n');
}

/**
 * The whole report as text.
 *
 * @example
 *   process.stdout.write(formatReport(doc, solve(doc), 'site.json', summarise(results)));
 */
export function formatReport(
  doc: ProjectDocument,
  results: Results,
  file: string,
  summary: CheckSummary,
): string {
  return (
    [
      header(doc, file),
      cautions(results),
      loads(doc, results),
      cables(doc, results),
      findings(results),
      verdict(summary),
      'Use --working ID to see the working behind any figure, --json for the full results.',
    ].join('\n\n') + '\n'
  );
}
