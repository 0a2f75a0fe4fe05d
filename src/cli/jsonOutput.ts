/** `--json`: the full results for other programs. The shape is documented in docs/cli-json.md. */
import type { ProjectDocument } from '../model/types.ts';
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
  results: Results;
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
    results,
  };
}

/** JSON text; non-finite numbers (which JSON cannot hold) become null, as documented. */
export function cliJsonText(out: CliJson): string {
  return `${JSON.stringify(out, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}
