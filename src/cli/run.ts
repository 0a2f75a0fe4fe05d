/**
 * The CLI's logic, separate from the process so it can be tested in-process: arguments and a file
 * reader in, text and an exit status out.
 */
import { readFileSync, renameSync, statSync, unlinkSync, writeFileSync } from 'node:fs';
import { MAX_TEXT_CHARS } from '../model/safeJson.ts';
import type { ProjectDocument } from '../model/types.ts';
import type { Results } from '../solver/results.ts';
import { solve as realSolve } from '../solver/solve.ts';
import type { CatalogueSet } from '../catalogue/catalogueSet.ts';
import { parseArgs, USAGE } from './args.ts';
import { runCompare } from './compare.ts';
import { readDataSet, readProject } from './files.ts';
import { buildCliJson, cliJsonText } from './jsonOutput.ts';
import { formatReport } from './report.ts';
import { summarise } from './summary.ts';
import { formatElementWorking, similarIds } from './working.ts';
import { SCHEDULE_SHEETS } from '../export/schedules.ts';
import { scheduleCsv } from '../export/scheduleCsv.ts';
import { tenderPackBytes, type PackFonts } from '../export/pdf/tenderPack.ts';
import { diagramSvg } from '../export/svg/diagramSvg.ts';

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** Reads a file as UTF-8 text; throws with a Node error code when it cannot. */
  readText(path: string): string;
  /** Writes a file whole, or throws with a Node error code and leaves any earlier copy as it was. */
  writeBytes(path: string, bytes: Uint8Array): void;
  /** The tender pack's font (the TrueType files shipped in public/fonts). */
  packFonts(): PackFonts;
}

const FONT_DIR = new URL('../../public/fonts/', import.meta.url);

/** Reads the pack's font files from the package. */
export function packFontsFromDisk(): PackFonts {
  const read = (name: string) => readFileSync(new URL(name, FONT_DIR)).toString('base64');
  return { regular: read('DejaVuSansCondensed.ttf'), bold: read('DejaVuSansCondensed-Bold.ttf') };
}

export const nodeIo: CliIo = {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
  readText(path) {
    // Refuse before reading: a multi-gigabyte file would exhaust memory before any check ran.
    const st = statSync(path);
    if (st.isDirectory()) throw Object.assign(new Error('is a directory'), { code: 'EISDIR' });
    if (st.size > MAX_TEXT_CHARS * 4) throw Object.assign(new Error('too large'), { code: 'EFBIG' });
    return readFileSync(path, 'utf8');
  },
  writeBytes(path, bytes) {
    // Written beside the target and renamed over it: a failed write leaves the last good copy.
    const temp = `${path}.${process.pid}.part`;
    try {
      writeFileSync(temp, bytes);
      renameSync(temp, path);
    } catch (e) {
      try {
        unlinkSync(temp);
      } catch {
        // Nothing was written.
      }
      throw e;
    }
  },
  packFonts: packFontsFromDisk,
};

/** Why a file could not be written, in plain words. */
function writeError(e: unknown): string {
  const code = (e as { code?: string }).code;
  return code === 'ENOENT'
    ? 'its folder does not exist'
    : code === 'EACCES' || code === 'EPERM'
      ? 'permission denied'
      : code === 'EISDIR'
        ? 'it is a directory'
        : e instanceof Error
          ? e.message
          : String(e);
}

/** One file an option asks for: what it is, the option, and how to make its bytes. */
interface Output {
  what: string;
  option: string;
  make: () => Uint8Array;
}

/** Makes and writes `out` to `path`; false (with the reason on stderr) when it could not be. */
function writeOutput(io: CliIo, path: string, out: Output): boolean {
  let bytes: Uint8Array;
  try {
    bytes = out.make();
  } catch (e) {
    io.stderr(`dropline: could not make the ${out.what}: ${e instanceof Error ? e.message : String(e)}\n`);
    return false;
  }
  try {
    io.writeBytes(path, bytes);
  } catch (e) {
    io.stderr(`dropline: cannot write ${path}: ${writeError(e)}; choose another ${out.option} path\n`);
    return false;
  }
  io.stderr(`dropline: ${out.what} written to ${path} (${Math.round(bytes.length / 1024)} kB)\n`);
  return true;
}

/** Writes the tender pack; false (with the reason on stderr) when it could not be written. */
function writePack(
  io: CliIo,
  path: string,
  doc: ProjectDocument,
  results: Results,
  catalogue: CatalogueSet | undefined,
): boolean {
  const make = () => tenderPackBytes(doc, results, io.packFonts(), { catalogue });
  return writeOutput(io, path, { what: 'tender pack', option: '--pdf', make });
}

/** Writes the single-line diagram as SVG; false (with the reason on stderr) when it could not be written. */
function writeDrawing(io: CliIo, path: string, doc: ProjectDocument, results: Results): boolean {
  const make = () => new TextEncoder().encode(diagramSvg(doc, results, io.packFonts()));
  return writeOutput(io, path, { what: 'single-line diagram', option: '--svg', make });
}

/**
 * Runs `dropline` with the given arguments and returns the exit status.
 *
 * @example
 *   const code = runCli(['check', 'public/demo-project.json'], nodeIo); // 0, 1, 2 or 3
 */
export function runCli(
  argv: readonly string[],
  io: CliIo,
  solve: (doc: ProjectDocument, catalogue?: CatalogueSet) => Results = realSolve,
): number {
  const args = parseArgs(argv);
  if (args.command === 'help') {
    io.stdout(`${USAGE}\n`);
    return 0;
  }
  if (args.command === 'error') {
    io.stderr(`dropline: ${args.message}\n\n${USAGE}\n`);
    return 2;
  }

  if (args.command === 'compare') return runCompare(args, io, solve);

  const doc = readProject(io, args.file);
  if (doc === null) return 2;
  let catalogue: CatalogueSet | undefined;
  if (args.dataFile !== null) {
    const loaded = readDataSet(io, args.dataFile);
    if (loaded === null) return 2;
    catalogue = loaded;
  }

  let results: Results;
  try {
    results = catalogue ? solve(doc, catalogue) : solve(doc);
  } catch (e) {
    io.stderr(
      `dropline: internal error while solving ${args.file}: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`,
    );
    return 3;
  }
  const summary = summarise(results);
  if (args.pdfFile !== null && !writePack(io, args.pdfFile, doc, results, catalogue)) return 2;
  if (args.svgFile !== null && !writeDrawing(io, args.svgFile, doc, results)) return 2;

  if (args.workingId !== null) {
    const text = formatElementWorking(doc, results, args.workingId);
    if (text === null) {
      const near = similarIds(results, args.workingId);
      io.stderr(
        `dropline: no element "${args.workingId}" in ${args.file}${near.length ? `; ids that look alike: ${near.join(', ')}` : ''}\n`,
      );
      return 2;
    }
    io.stdout(text);
    return summary.exitCode;
  }
  if (args.schedule !== null) {
    const sheet = SCHEDULE_SHEETS[args.schedule];
    io.stdout(
      scheduleCsv(sheet.title, sheet.build(doc, results), doc, results, sheet.statusLabel, sheet.note),
    );
    return summary.exitCode;
  }
  if (args.json) io.stdout(cliJsonText(buildCliJson(doc, results, args.file, summary)));
  else io.stdout(formatReport(doc, results, args.file, summary));
  return summary.exitCode;
}
