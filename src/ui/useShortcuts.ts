import { useEffect } from 'react';
import { editorStore } from '../store/editorStore.ts';
import { copy, cut, deleteSelection, duplicate, nudge, paste, selectAll, tidy } from './actions.ts';
import { canvas } from './canvasApi.ts';
import { IS_MAC } from './shortcuts.ts';
import { GRID } from '../model/layout.ts';
import { openProjectFile, saveProject } from './files/fileActions.ts';

function typingIn(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  const tag = target.tagName;
  return tag === 'INPUT' || tag === 'TEXTAREA' || tag === 'SELECT' || target.isContentEditable;
}

/** The editor's keyboard shortcuts (listed in src/ui/shortcuts.ts), ignored while typing in a field. */
export function useShortcuts(): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typingIn(e.target)) return;
      const s = editorStore.getState();
      const mod = IS_MAC ? e.metaKey : e.ctrlKey;
      const key = e.key.toLowerCase();
      const run = (fn: () => void) => {
        e.preventDefault();
        fn();
      };
      if (mod && key === 'z' && !e.shiftKey) return run(s.undo);
      if (mod && ((key === 'z' && e.shiftKey) || (!IS_MAC && key === 'y'))) return run(s.redo);
      if (mod && key === 'c') return run(copy);
      if (mod && key === 'x') return run(cut);
      if (mod && key === 'v') return run(paste);
      if (mod && key === 'd') return run(duplicate);
      if (mod && key === 'a') return run(selectAll);
      if (mod && key === 's') return run(() => void saveProject(e.shiftKey));
      if (mod && key === 'o') return run(() => openProjectFile());
      if (mod || e.altKey) return;
      if (s.view.dialog) {
        if (key === 'escape') run(s.closeDialog);
        return;
      }
      if (key === 'delete' || key === 'backspace') return run(deleteSelection);
      if (key === 'escape') return run(() => s.setSelection([]));
      if (e.key === '?') return run(() => s.openDialog('help'));
      if (e.shiftKey && e.code === 'Digit1') return run(() => canvas()?.fitView());
      if (e.shiftKey && e.code === 'Digit2') return run(() => canvas()?.startView());
      if (e.shiftKey && e.code === 'Digit0') return run(() => canvas()?.zoomActual());
      if (e.shiftKey && key === 't') return run(tidy);
      const step = GRID * (e.shiftKey ? 4 : 1);
      if (key === 'arrowleft') return run(() => nudge(-step, 0));
      if (key === 'arrowright') return run(() => nudge(step, 0));
      if (key === 'arrowup') return run(() => nudge(0, -step));
      if (key === 'arrowdown') return run(() => nudge(0, step));
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
