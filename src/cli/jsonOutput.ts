/** `--json`: the full results for other programs. The shape is documented in docs/cli-json.md. */
import type { Device, ProjectDocument } from '../model/types.ts';
import { CAUTIONS } from '../model/cautions.ts';
import type { Results } from '../solver/results.ts';
import type { CheckSummary } from './summary.ts';

/** Version of this JSON shape (not of the project file); raised when a field is renamed or removed. */
export const CLI_JSON_VERSION = 1;

export interface CliJson {
  tool: 'dropline';
  outputVersion: typeof CLI_JSON_VERSION;
  file: string;
  exitCode: number;
  project: ProjectDocument['details'];
  settings: Pick<
    ProjectDocument['settings'],
    'frequencyHz' | 'u0V' | 'uLlV' | 'limitProfile' | 'closeThreshold' | 'designCurrentBasis' | 'dataSet'
  >;
  summary: CheckSummary;
  cautions: readonly string[];
  /** The checks a reviewer reads first, flat per element; the full figures are under `results`. */
  checks: CheckedElements;
  results: Results;
}

interface CheckLine {
  key: string;
  pass: boolean | null;
  value: number | null;
  limit: number | null;
  unit: string;
  message: string;
}

export interface CheckedElements {
  cables: Record<
    string,
    {
      device: Device | null;
      /** Corrected current-carrying capacity Iz, amperes (null where no table applies). */
      iz: number | null;
      ib: number;
      checks: CheckLine[];
    }
  >;
  /** Boards, junctions, loads and the supply. */
  nodes: Record<
    string,
    {
      kind: string;
      /** Design loop impedance at operating temperature, ohms, with its limit and the cold test limit. */
      zs: { ohm: number; maxOhm: number | null; testMaxOhm: number | null } | null;
      /** Prospective fault current, amperes: line to neutral, three-phase, and the larger. */
      pfc: { lnA: number; lllA: number | null; maxA: number } | null;
      checks: CheckLine[];
    }
  >;
}

const line = (c: CheckLine): CheckLine => ({
  key: c.key,
  pass: c.pass,
  value: c.value,
  limit: c.limit,
  unit: c.unit,
  message: c.message,
});

function checkedElements(doc: ProjectDocument, results: Results): CheckedElements {
  const out: CheckedElements = { cables: {}, nodes: {} };
  for (const cable of doc.cables) {
    const r = results.cables[cable.id];
    if (!r) continue;
    const p = r.protection;
    out.cables[cable.id] = {
      device: p?.device ?? null,
      iz: p?.izA ?? null,
      ib: r.ibA,
      checks: (p?.checks ?? []).map(line),
    };
  }
  for (const node of doc.nodes) {
    const r = results.nodes[node.id];
    if (!r) continue;
    const p = r.protection;
    out.nodes[node.id] = {
      kind: node.kind,
      zs: p ? { ohm: p.zsOhm, maxOhm: p.zsMaxOhm, testMaxOhm: p.testZsMaxOhm } : null,
      pfc: p ? { lnA: p.fault.lnA, lllA: p.fault.lllA, maxA: p.fault.maxA } : null,
      checks: (p?.checks ?? []).map(line),
    };
  }
  return out;
}

export function buildCliJson(
  doc: ProjectDocument,
  results: Results,
  file: string,
  summary: CheckSummary,
): CliJson {
  const s = doc.settings;
  return {
    tool: 'dropline',
    outputVersion: CLI_JSON_VERSION,
    file,
    exitCode: summary.exitCode,
    project: doc.details,
    settings: {
      frequencyHz: s.frequencyHz,
      u0V: s.u0V,
      uLlV: s.uLlV,
      limitProfile: s.limitProfile,
      closeThreshold: s.closeThreshold,
      designCurrentBasis: s.designCurrentBasis,
      dataSet: s.dataSet,
    },
    summary,
    cautions: CAUTIONS,
    checks: checkedElements(doc, results),
    results,
  };
}

/** JSON text; non-finite numbers (which JSON cannot hold) become null, as documented. */
export function cliJsonText(out: CliJson): string {
  return `${JSON.stringify(out, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}
