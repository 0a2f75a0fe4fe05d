/**
 * A comparison of two designs (`compareDesigns`) as plain tables of text cells, shared by the
 * command line's `dropline compare` report and the tender pack's "Alternatives compared" sheet, so
 * both say the same thing in the same words: the totals side by side, the loads that changed status
 * and those whose drop moved, the cables changed, and the settings, supply, boards and load inputs
 * changed. The "A" and "B" columns are headed by the designs' labels; a change is always B − A.
 *
 * @example
 *   const t = comparisonTables(compareDesigns(current, alternative));
 *   t.summary.rows; // [['Loads clear', '12', '13', '+1'], …]
 */
import type {
  CableComparison,
  DesignComparison,
  DesignSummary,
  LoadComparison,
  StatusOrUnsolved,
} from '../solver/compare/compareDesigns.ts';
import { elementLabel } from '../solver/elementLabel.ts';
import {
  changeText,
  DROP_MOVED_POINTS,
  headerLabel,
  settingValue,
  signed,
  type Align,
  type RowTone,
  type TextTable,
} from './comparisonWords.ts';
import { fmt } from './format.ts';
import { STATUS_LOOK } from './statusLook.ts';

export {
  alternativeLabel,
  changeText,
  COMPARISON_METHOD,
  CURRENT_DESIGN_LABEL,
  DROP_MOVED_POINTS,
  headerLabel,
  metalWorking,
  signed,
  type Align,
  type RowTone,
  type TextTable,
} from './comparisonWords.ts';

export interface ComparisonTables {
  /** Full labels of the two designs (the table headers may shorten them). */
  a: string;
  b: string;
  summary: TextTable;
  statusChanged: TextTable;
  dropMoved: TextTable;
  cables: TextTable;
  changes: TextTable;
}

function statusText(s: StatusOrUnsolved | null): string {
  if (s === null) return 'not in this design';
  const look = STATUS_LOOK[s === 'unsolved' ? 'none' : s];
  return `${look.glyph} ${look.word}`;
}

function pct(v: number | undefined): string {
  return v === undefined || !Number.isFinite(v) ? '–' : fmt(v, 2);
}

function loadName(id: string, name: string): string {
  return name === '' || name === id ? id : `${id} ${name}`;
}

function worstText(w: DesignSummary['worst']): string {
  if (w === null) return 'none solved';
  return `${loadName(w.id, w.name)}: ${fmt(w.cumulativePct, 2)} % of ${fmt(w.limitPct, 2)} %`;
}

function summaryTable(c: DesignComparison, A: string, B: string): TextTable {
  const count = (label: string, a: number, b: number, worseUp: boolean | null): [string[], RowTone] => [
    [label, String(a), String(b), signed(b - a, 0)],
    worseUp === null || a === b ? null : b > a === worseUp ? 'worse' : 'better',
  ];
  const kg = (label: string, a: number, b: number): [string[], RowTone] => [
    [label, fmt(a), fmt(b), signed(b - a)],
    null,
  ];
  const wa = c.a.worst;
  const wb = c.b.worst;
  const worstChange =
    wa && wb
      ? `${signed(wb.cumulativePct - wa.cumulativePct, 2, 'points')}${wa.id === wb.id ? '' : ' (another load)'}`
      : '–';
  const lines: [string[], RowTone][] = [
    count(`Loads ${STATUS_LOOK.within.word}`, c.a.loads.within, c.b.loads.within, false),
    // More tight loads may be better (fewer over) or worse (fewer clear): no tone.
    count(`Loads ${STATUS_LOOK.close.word}`, c.a.loads.close, c.b.loads.close, null),
    count(`Loads ${STATUS_LOOK.over.word}`, c.a.loads.over, c.b.loads.over, true),
    count('Loads with no result', c.a.loads.unsolved, c.b.loads.unsolved, true),
    [
      ['Worst load: drop % of its limit', worstText(wa), worstText(wb), worstChange],
      wa && wb && wb.budgetUsed !== wa.budgetUsed
        ? wb.budgetUsed > wa.budgetUsed
          ? 'worse'
          : 'better'
        : null,
    ],
    count('Error findings', c.a.errors, c.b.errors, true),
    count('Warnings', c.a.warnings, c.b.warnings, true),
    count('Failed protection checks', c.a.failedChecks, c.b.failedChecks, true),
    kg('Copper in conductors, kg', c.a.metal.copperKg, c.b.metal.copperKg),
    kg('Aluminium in conductors, kg', c.a.metal.aluminiumKg, c.b.metal.aluminiumKg),
    kg('Cable route, total m', c.a.metal.routeM, c.b.metal.routeM),
  ];
  return {
    title: 'In brief',
    note: `A is ${c.a.label}, B is ${c.b.label}; each change is B − A. Metal is an estimate from nominal sizes (see the method).`,
    headers: ['', A, B, 'Change (B − A)'],
    align: ['left', 'right', 'right', 'right'],
    rows: lines.map(([r]) => r),
    tones: lines.map(([, t]) => t),
    empty: '',
  };
}

/** A load's drop where it has a status; an unsolved load's partial figure is not shown. */
function dropOf(f: LoadComparison['a']): number | undefined {
  return f === null || f.status === 'unsolved' ? undefined : f.cumulativePct;
}

function loadRow(l: LoadComparison): string[] {
  const name = l.b?.name ?? l.a?.name ?? '';
  const la = l.a?.limitPct;
  const lb = l.b?.limitPct;
  const limit =
    la !== undefined && lb !== undefined && pct(la) !== pct(lb) ? `${pct(la)} → ${pct(lb)}` : pct(lb ?? la);
  const [da, db] = [dropOf(l.a), dropOf(l.b)];
  return [
    l.id,
    name === l.id ? '' : name,
    pct(da),
    pct(db),
    da === undefined || db === undefined ? '–' : signed(db - da, 2),
    limit,
    statusText(l.a?.status ?? null),
    statusText(l.b?.status ?? null),
  ];
}

function loadTables(c: DesignComparison, A: string, B: string): [TextTable, TextTable] {
  const headers = [
    'Id',
    'Load',
    `${A}: drop %`,
    `${B}: drop %`,
    'Change, points',
    'Limit %',
    `${A}: status`,
    `${B}: status`,
  ];
  const align: Align[] = ['left', 'left', 'right', 'right', 'right', 'right', 'left', 'left'];
  const rank = { worse: 0, better: 1, same: 2 } as const;
  const changed = c.loads
    .filter((l) => l.statusChanged || l.a === null || l.b === null)
    .sort((x, y) => rank[x.direction] - rank[y.direction]);
  const moved = c.loads
    .filter(
      (l) =>
        !l.statusChanged &&
        dropOf(l.a) !== undefined &&
        dropOf(l.b) !== undefined &&
        l.dropChangePct !== null &&
        Math.abs(l.dropChangePct) >= DROP_MOVED_POINTS,
    )
    .sort((x, y) => Math.abs(y.dropChangePct!) - Math.abs(x.dropChangePct!));
  const tone = (l: LoadComparison): RowTone =>
    l.direction !== 'same'
      ? l.direction
      : l.dropChangePct === null
        ? null
        : l.dropChangePct > 0
          ? 'worse'
          : 'better';
  const basis =
    'Cumulative drop from the origin at the load, worst phase, % of U0; change in percentage points (B − A).';
  return [
    {
      title: 'Loads that changed status',
      note: `${basis} Worse first; a load in one design only says "not in this design".`,
      headers,
      align,
      rows: changed.map(loadRow),
      tones: changed.map(tone),
      empty: 'No load changed status.',
    },
    {
      title: 'Loads whose drop moved',
      note: `${basis} Same status in both; largest change first.`,
      headers,
      align,
      rows: moved.map(loadRow),
      tones: moved.map(tone),
      empty: 'No other load’s drop moved by 0.01 points or more.',
    },
  ];
}
/** The cable's own drop in A and B: "5.38 → 2.01 % of U0", the basis given once where both share it. */
function dropText(x: CableComparison): string {
  const pct = (f: CableComparison['a']) => (f === null || f.dropPct === null ? '–' : fmt(f.dropPct, 2));
  const basis = (f: CableComparison['a']) => (f === null || f.dropBasis === null ? '' : f.dropBasis);
  const ba = basis(x.a);
  const bb = basis(x.b);
  if (ba === bb || ba === '' || bb === '') {
    const shared = ba || bb;
    return `${pct(x.a)} → ${pct(x.b)}${shared ? ` % of ${shared}` : ''}`;
  }
  return `${pct(x.a)} % of ${ba} → ${pct(x.b)} % of ${bb}`;
}

function cableRow(x: CableComparison, withAl: boolean): string[] {
  const one = x.b ?? x.a!;
  const runText = (f: NonNullable<CableComparison['a']>) =>
    `${f.sizeMm2} mm² ${f.material}, ${fmt(f.lengthM)} m, ${f.from} → ${f.to}`;
  const what =
    x.a === null
      ? `only in B: ${runText(one)}`
      : x.b === null
        ? `only in A: ${runText(one)}`
        : x.changes.map(changeText).join('; ');
  const row = [x.id, one.name === x.id ? '' : one.name, what, dropText(x), signed(x.copperKgChange)];
  if (withAl) row.push(signed(x.aluminiumKgChange));
  return row;
}

function cableTable(c: DesignComparison): TextTable {
  const withAl = c.cables.some((x) => Math.abs(x.aluminiumKgChange) >= DROP_MOVED_POINTS);
  const headers = ['Id', 'Cable', 'What changed (A → B)', 'Own drop (A → B)', 'Copper, kg'];
  const align: Align[] = ['left', 'left', 'left', 'right', 'right'];
  if (withAl) {
    headers.push('Aluminium, kg');
    align.push('right');
  }
  return {
    title: 'Cables changed',
    note: 'Cables whose inputs differ, or that are in one design only. Own drop: the drop along the cable itself, worst phase, % of U0 (single-phase or unbalanced) or of the line voltage (ULL, balanced three-phase), as in the cable schedule. The metal change is B − A.',
    headers,
    align,
    rows: c.cables.map((x) => cableRow(x, withAl)),
    tones: c.cables.map(() => null),
    empty: 'No cable changed.',
  };
}
const KIND_WORD: Readonly<Record<string, string>> = {
  supply: 'Supply',
  board: 'Board',
  junction: 'Junction',
  load: 'Load',
};

function changesTable(c: DesignComparison, A: string, B: string): TextTable {
  const rows: string[][] = c.settings.map((f) => [
    'Settings',
    f.label,
    settingValue(f.field, f.a),
    settingValue(f.field, f.b),
  ]);
  for (const n of c.nodes) {
    const who = elementLabel(KIND_WORD[n.kind] ?? n.kind, n.id, n.name);
    if (n.presence !== 'both')
      rows.push([
        who,
        'in the design',
        n.presence === 'added' ? 'no' : 'yes',
        n.presence === 'added' ? 'yes' : 'no',
      ]);
    else for (const f of n.changes) rows.push([who, f.label, f.a, f.b]);
  }
  for (const l of c.loads)
    for (const f of l.changes) rows.push([elementLabel('Load', l.id, l.b?.name ?? ''), f.label, f.a, f.b]);
  return {
    title: 'Settings, supply, boards and load inputs changed',
    note: 'Inputs that differ between the designs (cables are listed above).',
    headers: ['Element', 'What', A, B],
    align: ['left', 'left', 'left', 'left'],
    rows,
    tones: rows.map(() => null),
    empty: 'No setting, supply, board or load input changed.',
  };
}

/** Every table of one comparison, in the order the report and the pack print them. */
export function comparisonTables(c: DesignComparison): ComparisonTables {
  const A = headerLabel(c.a.label);
  const B = headerLabel(c.b.label);
  const [statusChanged, dropMoved] = loadTables(c, A, B);
  return {
    a: c.a.label,
    b: c.b.label,
    summary: summaryTable(c, A, B),
    statusChanged,
    dropMoved,
    cables: cableTable(c),
    changes: changesTable(c, A, B),
  };
}

/** The tables of a comparison in print order. */
export function tableList(t: ComparisonTables): TextTable[] {
  return [t.summary, t.statusChanged, t.dropMoved, t.cables, t.changes];
}
