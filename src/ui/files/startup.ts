/**
 * What opens when the editor starts: the autosaved project if there is one, else the demo. From
 * then on every document change is autosaved.
 */
import { parseDocument } from '../../model/parseDocument.ts';
import { serializeDocument } from '../../model/serializeDocument.ts';
import { editorStore } from '../../store/editorStore.ts';
import { createAutosaver, readAutosave } from './autosave.ts';

export const DEMO_URL = `${import.meta.env.BASE_URL}demo-project.json`;

async function initialText(): Promise<{
  text: string;
  fileName: string | null;
  from: 'autosave' | 'demo';
} | null> {
  try {
    const saved = await readAutosave();
    if (saved) return { text: saved.text, fileName: saved.fileName, from: 'autosave' };
  } catch {
    // Storage refused (private mode, quota): start from the demo instead.
  }
  try {
    const res = await fetch(DEMO_URL);
    if (res.ok) return { text: await res.text(), fileName: null, from: 'demo' };
  } catch {
    // Offline or no demo file: start with a new project.
  }
  return null;
}

export async function startEditor(): Promise<void> {
  const s = editorStore.getState();
  const first = await initialText();
  if (first) {
    const parsed = parseDocument(first.text);
    if (parsed.ok) {
      s.resetDocument(parsed.doc, first.fileName);
      if (first.from === 'autosave') s.notify('Reopened your last project from this browser.');
    } else {
      s.notify(
        first.from === 'autosave'
          ? `The autosaved project could not be read (${parsed.errors[0] ?? 'unknown problem'}); a new project was started.`
          : 'The demo project could not be read; a new project was started.',
        'error',
      );
    }
  }
  if (!editorStore.getState().cautionsAcknowledged) editorStore.getState().openDialog('cautions');
  const saver = createAutosaver(serializeDocument, (e) =>
    editorStore.getState().notify(`Autosave failed: ${String(e)}`, 'error'),
  );
  editorStore.subscribe((state, prev) => {
    if (state.doc !== prev.doc || state.fileName !== prev.fileName) saver.schedule(state.doc, state.fileName);
  });
  window.addEventListener('pagehide', () => saver.flush());
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') saver.flush();
  });
}
