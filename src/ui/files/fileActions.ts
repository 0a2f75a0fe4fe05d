/**
 * New, open, save and save-as. Opening goes through the model's parseDocument, so a file that
 * fails validation shows its messages and leaves the open project exactly as it was.
 */
import { parseDocument } from '../../model/parseDocument.ts';
import { serializeDocument } from '../../model/serializeDocument.ts';
import { newProject } from '../../model/defaults.ts';
import { editorStore } from '../../store/editorStore.ts';
import { canvas } from '../canvasApi.ts';

/** Messages from the last refused file, for the file problem dialog. */
export interface FileProblem {
  fileName: string;
  errors: string[];
}

type Listener = (p: FileProblem | null) => void;
let problemListener: Listener | null = null;
export function onFileProblem(l: Listener | null): void {
  problemListener = l;
}

export function openText(text: string, fileName: string): boolean {
  const parsed = parseDocument(text);
  const s = editorStore.getState();
  if (!parsed.ok) {
    problemListener?.({ fileName, errors: parsed.errors });
    s.notify(
      `${fileName} was not opened: ${parsed.errors.length} problem(s). Your open project is unchanged.`,
      'error',
    );
    return false;
  }
  s.dispatch({ type: 'replaceDocument', doc: parsed.doc });
  s.setFileName(fileName);
  problemListener?.(null);
  const extra =
    parsed.warnings.length > 0
      ? ` with ${parsed.warnings.length} warning(s): ${parsed.warnings.slice(0, 3).join('; ')}`
      : '';
  s.notify(`Opened ${fileName}${extra}.`);
  requestAnimationFrame(() => canvas()?.startView());
  return true;
}

export async function openFile(file: File): Promise<boolean> {
  try {
    return openText(await file.text(), file.name);
  } catch (e) {
    problemListener?.({ fileName: file.name, errors: [`the file could not be read: ${String(e)}`] });
    return false;
  }
}

/** Shows the browser's file picker; the hidden input lives in the top bar. */
export function openProjectFile(): void {
  document.querySelector<HTMLInputElement>('[data-testid="open-file-input"]')?.click();
}

export function newDocument(): void {
  const s = editorStore.getState();
  s.dispatch({ type: 'replaceDocument', doc: newProject({ date: new Date().toISOString().slice(0, 10) }) });
  s.setFileName(null);
  s.notify('New project. Undo brings the previous one back.');
  requestAnimationFrame(() => canvas()?.startView());
}

function suggestedName(): string {
  const { doc, fileName } = editorStore.getState();
  if (fileName) return fileName;
  const base = (doc.details.reference || doc.details.title || 'project')
    .replace(/[^\w.-]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return `${base || 'project'}.dropline.json`;
}

interface SaveHandle {
  createWritable(): Promise<{ write(data: string): Promise<void>; close(): Promise<void> }>;
  name: string;
}
type SavePicker = (o: { suggestedName: string; types: unknown[] }) => Promise<SaveHandle>;
let handle: SaveHandle | null = null;

/** Save: to the same file where the browser allows it (File System Access), else a download. */
export async function saveProject(asNew = false): Promise<void> {
  const s = editorStore.getState();
  const text = serializeDocument(s.doc);
  const picker = (window as unknown as { showSaveFilePicker?: SavePicker }).showSaveFilePicker;
  if (picker) {
    try {
      if (!handle || asNew) {
        handle = await picker({
          suggestedName: suggestedName(),
          types: [{ description: 'Dropline project', accept: { 'application/json': ['.json'] } }],
        });
      }
      const w = await handle.createWritable();
      await w.write(text);
      await w.close();
      s.setFileName(handle.name);
      s.notify(`Saved ${handle.name}.`);
      return;
    } catch (e) {
      if (e instanceof DOMException && e.name === 'AbortError') return;
      // Some browsers expose the picker but refuse it (e.g. in a sandbox): fall back to a download.
    }
  }
  download(text, suggestedName());
  s.setFileName(suggestedName());
  s.notify(`Downloaded ${suggestedName()}.`);
}

/** Hands `text` to the browser as a downloaded file named `name`. */
export function download(
  text: string | Uint8Array<ArrayBuffer>,
  name: string,
  type = 'application/json',
): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
