/**
 * Loads a user's conductor data set (from a licensed table or a manufacturer's data sheet) from
 * JSON or CSV, validating every row. The shape is documented in docs/catalogue-data.md.
 *
 * Each row gives one cable type and size, and its impedance in one of three forms:
 * - `rOhmPerKm`, `xOhmPerKm`: one conductor, ohm/km;
 * - `mvPerAm1phR`, `mvPerAm1phX`: single-phase (loop) mV/A/m, divided by 2 for one conductor;
 * - `mvPerAm3phR`, `mvPerAm3phX`: three-phase (line-to-line) mV/A/m, divided by √3.
 * The first form present is used; x may be left empty where the table prints none (taken as 0).
 */
import type { CatalogueSet, ConductorRow } from './catalogueSet.ts';
import { OPERATING_TEMP_C } from './builtinConductors.ts';
import { readProtectionData } from './loadProtectionData.ts';

export type CatalogueLoad = { ok: true; catalogue: CatalogueSet } | { ok: false; errors: string[] };

const MATERIALS = ['Cu', 'Al'];
const INSULATIONS = ['thermoplastic70', 'thermosetting90'];
const CONSTRUCTIONS = ['flatTwinEarth', 'multicore', 'armouredMulticore', 'singleCore'];
const MAX_ROWS = 10000;

type Raw = Record<string, unknown>;

function numberOf(v: unknown): number | undefined {
  if (typeof v === 'number') return Number.isFinite(v) ? v : undefined;
  if (typeof v === 'string' && v.trim() !== '') {
    const n = Number(v.trim());
    return Number.isFinite(n) ? n : undefined;
  }
  return undefined;
}

const empty = (v: unknown) => v === undefined || v === null || (typeof v === 'string' && v.trim() === '');

function rowFrom(raw: Raw, where: string, errors: string[], title: string): ConductorRow | undefined {
  const start = errors.length;
  const pick = (col: string, allowed: string[]) => {
    const v = typeof raw[col] === 'string' ? (raw[col] as string).trim() : raw[col];
    if (typeof v === 'string' && allowed.includes(v)) return v;
    errors.push(
      `${where}, column ${col}: must be one of ${allowed.join(', ')}, got ${JSON.stringify(v ?? '')}.`,
    );
    return undefined;
  };
  const material = pick('material', MATERIALS);
  const insulation = pick('insulation', INSULATIONS);
  const construction = pick('construction', CONSTRUCTIONS);
  const size = numberOf(raw.sizeMm2);
  if (size === undefined || size <= 0)
    errors.push(
      `${where}, column sizeMm2: must be a positive number of mm², got ${JSON.stringify(raw.sizeMm2 ?? '')}.`,
    );
  const forms: [string, string, number][] = [
    ['rOhmPerKm', 'xOhmPerKm', 1 / 1000],
    ['mvPerAm1phR', 'mvPerAm1phX', 1 / 2000],
    ['mvPerAm3phR', 'mvPerAm3phX', 1 / (Math.sqrt(3) * 1000)],
  ];
  const form = forms.find(([r]) => !empty(raw[r]));
  let r: number | undefined;
  let x: number | undefined;
  if (!form) {
    errors.push(`${where}: give the resistance in rOhmPerKm, mvPerAm1phR or mvPerAm3phR.`);
  } else {
    const [rCol, xCol, k] = form;
    const rv = numberOf(raw[rCol]);
    if (rv === undefined || rv <= 0)
      errors.push(`${where}, column ${rCol}: must be a positive number, got ${JSON.stringify(raw[rCol])}.`);
    else r = rv * k;
    const xv = empty(raw[xCol]) ? 0 : numberOf(raw[xCol]);
    if (xv === undefined || xv < 0)
      errors.push(
        `${where}, column ${xCol}: must be a number of zero or more, got ${JSON.stringify(raw[xCol])}.`,
      );
    else x = xv * k;
  }
  const tempRaw = raw.tempC;
  const temp = empty(tempRaw) ? undefined : numberOf(tempRaw);
  if (!empty(tempRaw) && (temp === undefined || temp < -50 || temp > 300))
    errors.push(
      `${where}, column tempC: must be a conductor temperature in °C, got ${JSON.stringify(tempRaw)}.`,
    );
  const freqRaw = raw.frequencyHz;
  const freq = empty(freqRaw) ? undefined : numberOf(freqRaw);
  if (!empty(freqRaw) && freq !== 50 && freq !== 60)
    errors.push(`${where}, column frequencyHz: must be 50 or 60, got ${JSON.stringify(freqRaw)}.`);
  if (errors.length > start || r === undefined || x === undefined) return undefined;
  const ins = insulation as ConductorRow['insulation'];
  return {
    material: material as ConductorRow['material'],
    insulation: ins,
    construction: construction as ConductorRow['construction'],
    sizeMm2: size as number,
    rOhmPerM: r,
    xOhmPerM: x,
    tempC: temp ?? OPERATING_TEMP_C[ins],
    ...(freq !== undefined ? { frequencyHz: freq } : {}),
    source: `${title}, ${where} (${form?.[0]})`,
  };
}

function finish(meta: Raw, rows: Raw[], where: (i: number) => string): CatalogueLoad {
  const errors: string[] = [];
  const text = (k: string) => (typeof meta[k] === 'string' ? (meta[k] as string).trim() : '');
  const id = text('id');
  const title = text('title');
  const source = text('source');
  if (!/^[A-Za-z0-9._-]{1,64}$/.test(id))
    errors.push('id: give the data set an id of letters, digits, dot, dash or underscore.');
  if (title === '') errors.push('title: give the data set a title (it is printed in the working).');
  if (source === '')
    errors.push('source: say where the data come from (standard and table, or data sheet and date).');
  if (rows.length === 0) errors.push('the data set has no conductor rows.');
  if (rows.length > MAX_ROWS)
    return { ok: false, errors: [`the data set has ${rows.length} rows; at most ${MAX_ROWS} are accepted.`] };
  const conductors: ConductorRow[] = [];
  const seen = new Map<string, number>();
  rows.forEach((raw, i) => {
    if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
      errors.push(`${where(i)}: must be an object with the columns of a conductor row.`);
      return;
    }
    const row = rowFrom(raw, where(i), errors, title || id);
    if (!row) return;
    const key = `${row.material}|${row.insulation}|${row.construction}|${row.sizeMm2}`;
    const first = seen.get(key);
    if (first !== undefined)
      errors.push(`${where(i)}: repeats ${where(first)} (same material, insulation, construction and size).`);
    else seen.set(key, i);
    conductors.push(row);
  });
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, catalogue: { id, title, source, conductors } };
}

/**
 * Parses a data set from JSON text: `{ id, title, source, conductors: [row, ...] }`.
 * @example parseCatalogueJson(text).ok
 */
export function parseCatalogueJson(text: string): CatalogueLoad {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, errors: [`not valid JSON: ${e instanceof Error ? e.message : String(e)}`] };
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data))
    return { ok: false, errors: ['the file must hold one object with id, title, source and conductors.'] };
  const raw = data as Raw;
  if (!Array.isArray(raw.conductors)) return { ok: false, errors: ['conductors: must be a list of rows.'] };
  const loaded = finish(raw, raw.conductors as Raw[], (i) => `conductors row ${i + 1}`);
  const protection = readProtectionData(raw);
  if (!loaded.ok || protection.errors.length > 0)
    return { ok: false, errors: [...(loaded.ok ? [] : loaded.errors), ...protection.errors] };
  return {
    ok: true,
    catalogue: {
      ...loaded.catalogue,
      ...(protection.capacityTables ? { capacityTables: protection.capacityTables } : {}),
      ...(protection.ggFuses ? { ggFuses: protection.ggFuses } : {}),
    },
  };
}

function splitCsvLine(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cur += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      out.push(cur);
      cur = '';
    } else cur += ch;
  }
  out.push(cur);
  return out.map((c) => c.trim());
}

/**
 * Parses a data set from CSV: `# id: ...`, `# title: ...`, `# source: ...` lines, then a header
 * row naming the columns, then one row per cable type and size. Row numbers in messages count
 * the lines of the file.
 * @example parseCatalogueCsv('# id: x\n# title: T\n# source: S\nmaterial,insulation,...').ok
 */
export function parseCatalogueCsv(text: string): CatalogueLoad {
  const meta: Raw = {};
  const lines = text.split(/\r?\n/);
  let header: string[] | undefined;
  const rows: Raw[] = [];
  const lineOf: number[] = [];
  lines.forEach((line, n) => {
    const t = line.trim();
    if (t === '') return;
    const m = /^#\s*(id|title|source)\s*:\s*(.*)$/i.exec(t);
    if (m) {
      meta[(m[1] as string).toLowerCase()] = m[2];
      return;
    }
    if (t.startsWith('#')) return;
    const cells = splitCsvLine(line);
    if (!header) {
      header = cells;
      return;
    }
    const raw: Raw = Object.create(null) as Raw;
    header.forEach((col, k) => {
      if (col !== '' && col !== '__proto__') raw[col] = cells[k] ?? '';
    });
    rows.push(raw);
    lineOf.push(n + 1);
  });
  if (!header) return { ok: false, errors: ['the file has no header row naming the columns.'] };
  return finish(meta, rows, (i) => `line ${lineOf[i]}`);
}
