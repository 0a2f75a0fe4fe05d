/** Command-line arguments of `dropline`. */

import type { ScheduleSheet } from '../export/schedules.ts';

const SHEET_NAMES: readonly ScheduleSheet[] = ['cables', 'loads', 'boards', 'tests'];

export type CliArgs =
  | { command: 'help' }
  | {
      command: 'check';
      file: string;
      json: boolean;
      workingId: string | null;
      dataFile: string | null;
      schedule: ScheduleSheet | null;
      /** Where to write the tender pack PDF, or null. */
      pdfFile: string | null;
      /** Where to write the single-line diagram as SVG, or null. */
      svgFile: string | null;
    }
  | {
      command: 'compare';
      file: string;
      /** A second project file whose current design is compared with FILE's, or null. */
      otherFile: string | null;
      /** The alternative in FILE to compare with its current design, or null for each in turn. */
      withName: string | null;
      json: boolean;
      dataFile: string | null;
    }
  | { command: 'error'; message: string };

export const USAGE = `usage: dropline check FILE [--json | --working ID | --schedule SHEET] [--pdf OUT.pdf] [--svg OUT.svg]
                      [--data TABLE]
       dropline compare FILE [--with NAME | OTHER.json] [--json] [--data TABLE]

Checks a Dropline project file: solves it and prints, per load, its path, cumulative drop, limit
and status; per cable, Ib, drop in V and % and the cumulative %; every finding; the cautions; the
data set and limit profile used.

options:
  --json         print the full results as JSON for other programs (shape: docs/cli-json.md)
  --working ID   print every working record behind one element's figures (a cable, board or load id)
  --schedule SHEET
                 print a schedule as CSV (SHEET: cables, loads, boards, or tests: the expected test
                 values of every circuit, with empty columns for the measured ones), as the editor's
                 Download CSV writes it: project details, data used and cautions, then one row per
                 element
  --pdf OUT.pdf  also write the tender pack to OUT.pdf (A3 landscape): the single-line diagram, a
                 summary with the data, standards and cautions used, the current design compared with
                 each alternative the project keeps, the schedules, the findings and the working
                 behind every figure; the report is printed as usual
  --svg OUT.svg  also write the single-line diagram to OUT.svg, drawn as on the tender pack's diagram
                 sheet (a large one whole at a legible scale) under a line with the project, the data
                 used and the caution; the report is printed as usual
  --data TABLE   use your own conductor data set (CSV or JSON, shape: docs/catalogue-data.md) instead
                 of the built-in one; the report and every working record name it
  --help         show this text

dropline compare sets two designs side by side: FILE's current design against each alternative
kept in it (in turn), against the one --with NAME names, or against the current design of a second
file OTHER.json. It prints the totals (loads clear, tight and over, the worst load, findings, failed
checks, conductor metal), the loads that changed status and those whose drop moved, the cables and
the settings, supply, boards and load inputs that differ, the data used and the cautions.

compare options:
  --with NAME    compare the current design with the alternative called NAME
  --json         print the comparison(s) as JSON for other programs (shape: docs/cli-json.md)
  --data TABLE   solve both designs with your own conductor data set, as for check

exit status of check:
  0  every load is within its limit and there is no error finding
  1  a load is over its limit, or a check failed (any error finding)
  2  the file could not be read or is not a valid project file, the --pdf or --svg file could not
     be written, or the command line is wrong
  3  internal error while solving (please report it with the file)
exit status of compare: 0 when the comparison is printed; 2 as above, and for an alternative name
the file does not hold or a file that keeps no alternatives (and no second file); 3 as above.`;

/**
 * @example
 *   parseArgs(['check', 'site.json', '--working', 'C3']); // { command: 'check', file: 'site.json', json: false, workingId: 'C3' }
 */
export function parseArgs(argv: readonly string[]): CliArgs {
  if (argv.length === 0 || argv.includes('--help') || argv.includes('-h') || argv[0] === 'help') {
    return { command: 'help' };
  }
  const [command, ...rest] = argv;
  if (command === 'compare') return parseCompare(rest);
  if (command !== 'check')
    return {
      command: 'error',
      message: `unknown command "${command}"; the commands are "check" and "compare"`,
    };
  let file: string | null = null;
  let json = false;
  let workingId: string | null = null;
  let dataFile: string | null = null;
  let schedule: ScheduleSheet | null = null;
  let pdfFile: string | null = null;
  let svgFile: string | null = null;
  for (let i = 0; i < rest.length; i++) {
    const a = rest[i]!;
    if (a === '--json') json = true;
    else if (a === '--working') {
      const id = rest[i + 1];
      if (id === undefined || id.startsWith('--'))
        return { command: 'error', message: '--working needs an element id, e.g. --working C3' };
      workingId = id;
      i++;
    } else if (a.startsWith('--working=')) workingId = a.slice('--working='.length);
    else if (a === '--data') {
      const f = rest[i + 1];
      if (f === undefined || f.startsWith('--'))
        return { command: 'error', message: '--data needs a data set file, e.g. --data my-cables.csv' };
      dataFile = f;
      i++;
    } else if (a.startsWith('--data=')) dataFile = a.slice('--data='.length);
    else if (a === '--pdf' || a.startsWith('--pdf=')) {
      const out = a === '--pdf' ? rest[++i] : a.slice('--pdf='.length);
      if (out === undefined || out === '' || out.startsWith('--'))
        return { command: 'error', message: '--pdf needs a file to write, e.g. --pdf site-tender-pack.pdf' };
      pdfFile = out;
    } else if (a === '--svg' || a.startsWith('--svg=')) {
      const out = a === '--svg' ? rest[++i] : a.slice('--svg='.length);
      if (out === undefined || out === '' || out.startsWith('--'))
        return { command: 'error', message: '--svg needs a file to write, e.g. --svg site-single-line.svg' };
      svgFile = out;
    } else if (a === '--schedule' || a.startsWith('--schedule=')) {
      const sheet = a === '--schedule' ? rest[++i] : a.slice('--schedule='.length);
      if (!SHEET_NAMES.includes(sheet as ScheduleSheet))
        return {
          command: 'error',
          message: `--schedule needs one of ${SHEET_NAMES.join(', ')}, e.g. --schedule cables; got ${sheet === undefined ? 'nothing' : `"${sheet}"`}`,
        };
      schedule = sheet as ScheduleSheet;
    } else if (a.startsWith('-')) return { command: 'error', message: `unknown option "${a}"` };
    else if (file === null) file = a;
    else return { command: 'error', message: `one file at a time; got "${file}" and "${a}"` };
  }
  if (file === null)
    return { command: 'error', message: 'name the project file to check, e.g. dropline check site.json' };
  if ([json, workingId !== null, schedule !== null].filter(Boolean).length > 1)
    return { command: 'error', message: 'choose one of --json, --working and --schedule' };
  return { command: 'check', file, json, workingId, dataFile, schedule, pdfFile, svgFile };
}

/** An option's value, given as `--opt VALUE` or `--opt=VALUE`; null when it is missing. */
function optionValue(
  rest: readonly string[],
  i: number,
  option: string,
): { value: string | null; next: number } {
  const a = rest[i]!;
  if (a.startsWith(`${option}=`)) {
    const v = a.slice(option.length + 1);
    return { value: v === '' ? null : v, next: i };
  }
  const v = rest[i + 1];
  return { value: v === undefined || v === '' || v.startsWith('--') ? null : v, next: i + 1 };
}

/**
 * @example
 *   parseArgs(['compare', 'site.json', '--with', 'Board moved']); // { command: 'compare', withName: 'Board moved', … }
 */
function parseCompare(rest: readonly string[]): CliArgs {
  const files: string[] = [];
  let withName: string | null = null;
  let json = false;
  let dataFile: string | null = null;
  for (let i = 0; i < rest.length; i++) {
    const a = rest[i]!;
    if (a === '--json') json = true;
    else if (a === '--with' || a.startsWith('--with=')) {
      const { value, next } = optionValue(rest, i, '--with');
      if (value === null)
        return {
          command: 'error',
          message: '--with needs the name of an alternative, e.g. --with "Sub-main in 35 mm²"',
        };
      withName = value;
      i = next;
    } else if (a === '--data' || a.startsWith('--data=')) {
      const { value, next } = optionValue(rest, i, '--data');
      if (value === null)
        return { command: 'error', message: '--data needs a data set file, e.g. --data my-cables.csv' };
      dataFile = value;
      i = next;
    } else if (a.startsWith('-'))
      return {
        command: 'error',
        message: `unknown option "${a}" for compare; its options are --with NAME, --json and --data TABLE`,
      };
    else files.push(a);
  }
  if (files.length === 0)
    return {
      command: 'error',
      message: 'name the project file to compare, e.g. dropline compare site.json',
    };
  if (files.length > 2)
    return {
      command: 'error',
      message: `compare takes one file (its designs) or two files; got ${files.length}: ${files.map((f) => `"${f}"`).join(', ')}`,
    };
  if (files.length === 2 && withName !== null)
    return {
      command: 'error',
      message:
        'choose --with NAME (an alternative in the file) or a second file, not both; to compare an alternative with another file, open it in the editor and save it as a file first',
    };
  return { command: 'compare', file: files[0]!, otherFile: files[1] ?? null, withName, json, dataFile };
}
