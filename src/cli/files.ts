/**
 * Reading what the command line is given: a project file (parsed and validated) and a conductor
 * data set. Each failure is printed on stderr naming the file and why, and comes back as null, so
 * every command answers a bad file the same way (exit 2).
 */
import type { CatalogueSet } from '../catalogue/catalogueSet.ts';
import { parseCatalogueCsv, parseCatalogueJson } from '../catalogue/loadCatalogue.ts';
import { parseDocument } from '../model/parseDocument.ts';
import { MAX_TEXT_CHARS } from '../model/safeJson.ts';
import type { ProjectDocument } from '../model/types.ts';
import type { CliIo } from './run.ts';

/** Why a file could not be read, in plain words, naming it. */
export function readError(file: string, e: unknown): string {
  const code = (e as { code?: string }).code;
  const why =
    code === 'ENOENT'
      ? 'there is no such file'
      : code === 'EACCES' || code === 'EPERM'
        ? 'permission denied'
        : code === 'EISDIR'
          ? 'it is a directory, not a file'
          : code === 'EFBIG'
            ? `it is larger than the ${MAX_TEXT_CHARS / 1024 / 1024} MB Dropline opens`
            : e instanceof Error
              ? e.message
              : String(e);
  return `dropline: cannot read ${file}: ${why}\n`;
}

/**
 * Reads and validates a project file; null (with the reasons on stderr) when it cannot be used.
 * The file's notes (an old version brought up to date, a byte-order mark) go to stderr too, with
 * the file named when `nameInNotes` (a command reading more than one file).
 */
export function readProject(io: CliIo, file: string, nameInNotes = false): ProjectDocument | null {
  let text: string;
  try {
    text = io.readText(file);
  } catch (e) {
    io.stderr(readError(file, e));
    return null;
  }
  const parsed = parseDocument(text);
  if (!parsed.ok) {
    io.stderr(
      `dropline: ${file} is not a valid project file:\n${parsed.errors.map((e) => `  - ${e}\n`).join('')}`,
    );
    return null;
  }
  for (const w of parsed.warnings) io.stderr(`dropline: note: ${nameInNotes ? `${file}: ` : ''}${w}\n`);
  return parsed.doc;
}

/** Reads a conductor data set (CSV or JSON); null (with the reasons on stderr) when it cannot be used. */
export function readDataSet(io: CliIo, file: string): CatalogueSet | null {
  let dataText: string;
  try {
    dataText = io.readText(file);
  } catch (e) {
    io.stderr(readError(file, e));
    return null;
  }
  const isJson = /\.json$/i.test(file) || dataText.trimStart().startsWith('{');
  const loaded = isJson ? parseCatalogueJson(dataText) : parseCatalogueCsv(dataText);
  if (!loaded.ok) {
    io.stderr(
      `dropline: ${file} is not a valid conductor data set:\n${loaded.errors.map((e) => `  - ${e}\n`).join('')}`,
    );
    return null;
  }
  return loaded.catalogue;
}
