/**
 * `dropline compare FILE [--with NAME | OTHER.json] [--json] [--data TABLE]`: two designs side by
 * side. Without --with and without OTHER, FILE's current design against each of its alternatives
 * in turn; with --with, against that one; with OTHER, against OTHER's current design. Exit 0 when
 * the comparison is printed, 2 for a file or name it cannot use, 3 for an internal error.
 */
import type { CatalogueSet } from '../catalogue/catalogueSet.ts';
import { alternativeDocument } from '../model/commands/alternatives.ts';
import type { Alternative, ProjectDocument } from '../model/types.ts';
import { compareDesigns, type DesignComparison } from '../solver/compare/compareDesigns.ts';
import type { Results } from '../solver/results.ts';
import type { CliArgs } from './args.ts';
import { compareJsonText, type DesignInfo } from './compareJson.ts';
import { formatCompareReport } from './compareReport.ts';
import { readDataSet, readProject } from './files.ts';
import { alternativeLabel, CURRENT_DESIGN_LABEL } from '../export/comparison.ts';
import type { CliIo } from './run.ts';

type CompareArgs = Extract<CliArgs, { command: 'compare' }>;

/** One design to solve: where it came from and the document. */
interface Design extends DesignInfo {
  doc: ProjectDocument;
}

function baseName(path: string): string {
  return path.split(/[\\/]/).pop() || path;
}

function current(doc: ProjectDocument, file: string, label: string): Design {
  return { label, file, alternative: null, note: '', keptAt: '', doc };
}

function alternative(doc: ProjectDocument, file: string, alt: Alternative): Design {
  return {
    label: alternativeLabel(alt),
    file,
    alternative: alt.name,
    note: alt.note,
    keptAt: alt.keptAt,
    doc: alternativeDocument(doc, alt),
  };
}

/** Two files' labels: their names, or their paths where the names are the same. */
function fileLabels(a: string, b: string): [string, string] {
  const [na, nb] = [baseName(a), baseName(b)];
  if (na !== nb) return [na, nb];
  if (a !== b) return [a, b];
  return [`${a} (A)`, `${b} (B)`];
}

const quoted = (names: readonly string[]) => names.map((n) => `"${n}"`).join(', ');

/** The pairs to compare, or a message (exit 2) saying why there are none. */
function pairs(
  args: CompareArgs,
  doc: ProjectDocument,
  other: ProjectDocument | null,
): [Design, Design][] | string {
  if (other !== null) {
    const [la, lb] = fileLabels(args.file, args.otherFile!);
    return [[current(doc, args.file, la), current(other, args.otherFile!, lb)]];
  }
  const base = current(doc, args.file, CURRENT_DESIGN_LABEL);
  const names = doc.alternatives.map((a) => a.name);
  if (args.withName !== null) {
    const alt =
      doc.alternatives.find((a) => a.name === args.withName) ??
      doc.alternatives.find((a) => a.name.toLowerCase() === args.withName!.toLowerCase());
    if (alt) return [[base, alternative(doc, args.file, alt)]];
    return names.length === 0
      ? `${args.file} keeps no alternatives, so there is none called "${args.withName}"`
      : `${args.file} has no alternative called "${args.withName}"; the alternatives it keeps are ${quoted(names)}`;
  }
  if (names.length === 0)
    return `${args.file} keeps no alternatives to compare with its current design. Keep one in the editor (open Alternatives and keep the design under a name, then save the file), or compare two files: dropline compare ${args.file} OTHER.json`;
  return doc.alternatives.map((alt) => [base, alternative(doc, args.file, alt)]);
}

export function runCompare(
  args: CompareArgs,
  io: CliIo,
  solve: (doc: ProjectDocument, catalogue?: CatalogueSet) => Results,
): number {
  const twoFiles = args.otherFile !== null;
  const doc = readProject(io, args.file, twoFiles);
  if (doc === null) return 2;
  const other = twoFiles ? readProject(io, args.otherFile!, true) : null;
  if (twoFiles && other === null) return 2;
  let catalogue: CatalogueSet | undefined;
  if (args.dataFile !== null) {
    const loaded = readDataSet(io, args.dataFile);
    if (loaded === null) return 2;
    catalogue = loaded;
  }

  const chosen = pairs(args, doc, other);
  if (typeof chosen === 'string') {
    io.stderr(`dropline: ${chosen}\n`);
    return 2;
  }

  // The current design is solved once however many alternatives it is set against.
  const solved = new Map<Design, Results>();
  const resultsOf = (d: Design): Results => {
    let r = solved.get(d);
    if (r === undefined) {
      r = catalogue ? solve(d.doc, catalogue) : solve(d.doc);
      solved.set(d, r);
    }
    return r;
  };
  const comparisons: DesignComparison[] = [];
  for (const [a, b] of chosen) {
    let ra: Results;
    let rb: Results;
    const what = (d: Design) =>
      d.alternative === null ? d.file : `alternative "${d.alternative}" in ${d.file}`;
    let solving = a;
    try {
      ra = resultsOf(a);
      solving = b;
      rb = resultsOf(b);
    } catch (e) {
      io.stderr(
        `dropline: internal error while solving ${what(solving)}: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`,
      );
      return 3;
    }
    comparisons.push(
      compareDesigns(
        { label: a.label, doc: a.doc, results: ra },
        { label: b.label, doc: b.doc, results: rb },
      ),
    );
  }

  const designs = [...solved.keys()].map((d) => ({ design: d as DesignInfo, results: solved.get(d)! }));
  if (args.json)
    io.stdout(compareJsonText({ file: args.file, otherFile: args.otherFile, doc, designs, comparisons }));
  else
    io.stdout(formatCompareReport({ file: args.file, otherFile: args.otherFile, doc, designs, comparisons }));
  return 0;
}
