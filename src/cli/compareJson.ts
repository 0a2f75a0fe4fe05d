/** `dropline compare --json`: the comparison(s) for other programs. The shape is in docs/cli-json.md. */
import { CAUTIONS } from '../model/cautions.ts';
import type { ProjectDocument } from '../model/types.ts';
import type { DesignComparison } from '../solver/compare/compareDesigns.ts';
import type { Results } from '../solver/results.ts';
import { COMPARISON_METHOD } from '../export/comparison.ts';

/** Version of this JSON shape; raised when a field is renamed or removed. */
export const COMPARE_JSON_VERSION = 1;

/** Where a compared design came from. */
export interface DesignInfo {
  /** The label the report and `comparisons[].a.label` / `.b.label` use. */
  label: string;
  file: string;
  /** The alternative's name in `file`, or null for the file's current design. */
  alternative: string | null;
  /** The alternative's note and when it was kept ('' for a current design). */
  note: string;
  keptAt: string;
}

/** What a compare run hands to its printers: the designs solved and the comparisons made. */
export interface CompareRun {
  file: string;
  otherFile: string | null;
  /** FILE's document (its details head the report). */
  doc: ProjectDocument;
  /** Every design solved, each once, in the order first compared. */
  designs: { design: DesignInfo; results: Results }[];
  comparisons: DesignComparison[];
}

export interface CompareJson {
  tool: 'dropline';
  command: 'compare';
  outputVersion: typeof COMPARE_JSON_VERSION;
  file: string;
  otherFile: string | null;
  project: ProjectDocument['details'];
  cautions: readonly string[];
  method: string;
  designs: (DesignInfo & {
    dataSet: Results['dataSet'];
    profile: Results['profile'];
    references: string[];
  })[];
  comparisons: DesignComparison[];
}

export function buildCompareJson(run: CompareRun): CompareJson {
  return {
    tool: 'dropline',
    command: 'compare',
    outputVersion: COMPARE_JSON_VERSION,
    file: run.file,
    otherFile: run.otherFile,
    project: run.doc.details,
    cautions: CAUTIONS,
    method: COMPARISON_METHOD,
    designs: run.designs.map(({ design: d, results: r }) => ({
      label: d.label,
      file: d.file,
      alternative: d.alternative,
      note: d.note,
      keptAt: d.keptAt,
      dataSet: r.dataSet,
      profile: r.profile,
      references: r.references,
    })),
    comparisons: run.comparisons,
  };
}

/** JSON text; non-finite numbers (an unsolved load's drop) become null, as for check. */
export function compareJsonText(run: CompareRun): string {
  const replacer = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);
  return `${JSON.stringify(buildCompareJson(run), replacer, 2)}\n`;
}
