/**
 * The editor's state: the project document (the truth), the solver's results for it, undo
 * history, selection and view state. Every document change goes through `dispatch(command)` and
 * is one undo step; selection and view changes never touch history. A drag keeps its positions in
 * `dragPositions` until it ends, then becomes one `moveNodes`.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { useStore } from 'zustand';
import type { Id, ProjectDocument } from '../model/types.ts';
import type { Results } from '../solver/results.ts';
import { applyCommand, type Command, type CommandResult } from '../model/commands.ts';
import { newProject } from '../model/defaults.ts';
import { safeSolve } from './safeSolve.ts';
import type { Dialog, DragPositions, Drawer, LabelMode, Notice, ViewState } from './viewTypes.ts';

export type { Dialog, DragPositions, Drawer, LabelMode, Notice, ViewState } from './viewTypes.ts';
export { LABEL_MODES } from './viewTypes.ts';

/** Undo steps kept; older ones are dropped. */
export const HISTORY_LIMIT = 300;
const CAUTIONS_KEY = 'dropline.cautionsAcknowledged';

export interface EditorState {
  doc: ProjectDocument;
  results: Results;
  selection: Id[];
  view: ViewState;
  past: ProjectDocument[];
  future: ProjectDocument[];
  canUndo: boolean;
  canRedo: boolean;
  dragPositions: DragPositions | null;
  /** Set by `reveal`; the canvas centres on `id` whenever `seq` changes. */
  revealRequest: { id: Id; seq: number } | null;
  notice: Notice | null;
  cautionsAcknowledged: boolean;
  /** Name of the file last opened or saved, for "Save" and the title bar. */
  fileName: string | null;

  dispatch(command: Command): CommandResult;
  /** Loads a document without an undo step and with empty history (startup, recovery). */
  resetDocument(doc: ProjectDocument, fileName?: string | null): void;
  undo(): void;
  redo(): void;
  setSelection(ids: Id[]): void;
  reveal(id: Id): void;
  setLabelMode(mode: LabelMode): void;
  setShowLabels(show: boolean): void;
  setCanvasView(canvas: ViewState['canvas']): void;
  openDrawer(drawer: Drawer): void;
  openDialog(dialog: Exclude<Dialog, null>): void;
  closeDialog(): void;
  setDragPositions(positions: DragPositions | null): void;
  /** Ends a drag: the positions become one `moveNodes` step. */
  commitDrag(): void;
  notify(text: string, kind?: Notice['kind']): void;
  dismissNotice(): void;
  acknowledgeCautions(): void;
  setFileName(name: string | null): void;
}

export type EditorStore = StoreApi<EditorState>;

function readAcknowledged(): boolean {
  try {
    return globalThis.localStorage?.getItem(CAUTIONS_KEY) === 'yes';
  } catch {
    return false;
  }
}

function keepExisting(doc: ProjectDocument, ids: Id[]): Id[] {
  const known = new Set<Id>([...doc.nodes.map((n) => n.id), ...doc.cables.map((c) => c.id)]);
  return ids.filter((id) => known.has(id));
}

/**
 * True when two documents hold the same design objects (keeping, renaming or deleting an
 * alternative, or editing the details, leaves them so), and the results need not be solved again.
 */
function sameDesign(a: ProjectDocument, b: ProjectDocument): boolean {
  return a.nodes === b.nodes && a.cables === b.cables && a.settings === b.settings;
}

export function createEditorStore(initial: ProjectDocument = newProject()): EditorStore {
  let noticeSeq = 0;
  let revealSeq = 0;
  return createStore<EditorState>()((set, get) => ({
    doc: initial,
    results: safeSolve(initial),
    selection: [],
    view: { labelMode: 'drop', showLabels: true, drawer: null, dialog: null, canvas: 'diagram' },
    past: [],
    future: [],
    canUndo: false,
    canRedo: false,
    dragPositions: null,
    revealRequest: null,
    notice: null,
    cautionsAcknowledged: readAcknowledged(),
    fileName: null,

    dispatch(command) {
      const { doc, past, selection } = get();
      const out = applyCommand(doc, command);
      if (!out.ok) {
        set({ notice: { seq: ++noticeSeq, kind: 'error', text: out.error } });
        return out;
      }
      if (out.doc === doc) return out;
      const nextPast = [...past, doc].slice(-HISTORY_LIMIT);
      const nextSelection =
        command.type === 'replaceDocument' || command.type === 'openAlternative'
          ? []
          : out.created.length > 0
            ? out.created
            : keepExisting(out.doc, selection);
      set({
        doc: out.doc,
        results: sameDesign(out.doc, doc) ? get().results : safeSolve(out.doc),
        past: nextPast,
        future: [],
        canUndo: true,
        canRedo: false,
        selection: nextSelection,
      });
      return out;
    },

    resetDocument(doc, fileName = null) {
      set({
        doc,
        results: safeSolve(doc),
        past: [],
        future: [],
        canUndo: false,
        canRedo: false,
        selection: [],
        dragPositions: null,
        fileName,
      });
    },

    undo() {
      const { doc, past, future, selection } = get();
      const prev = past[past.length - 1];
      if (!prev) return;
      set({
        doc: prev,
        results: sameDesign(prev, doc) ? get().results : safeSolve(prev),
        past: past.slice(0, -1),
        future: [doc, ...future],
        canUndo: past.length > 1,
        canRedo: true,
        selection: keepExisting(prev, selection),
        dragPositions: null,
      });
    },

    redo() {
      const { doc, past, future, selection } = get();
      const next = future[0];
      if (!next) return;
      set({
        doc: next,
        results: sameDesign(next, doc) ? get().results : safeSolve(next),
        past: [...past, doc].slice(-HISTORY_LIMIT),
        future: future.slice(1),
        canUndo: true,
        canRedo: future.length > 1,
        selection: keepExisting(next, selection),
        dragPositions: null,
      });
    },

    setSelection(ids) {
      const current = get().selection;
      if (current.length === ids.length && current.every((id, i) => id === ids[i])) return;
      set({ selection: ids });
    },

    reveal(id) {
      set({ selection: [id], revealRequest: { id, seq: ++revealSeq } });
    },

    setLabelMode(labelMode) {
      set({ view: { ...get().view, labelMode } });
    },
    setShowLabels(showLabels) {
      set({ view: { ...get().view, showLabels } });
    },
    setCanvasView(canvas) {
      set({ view: { ...get().view, canvas } });
    },
    openDrawer(drawer) {
      set({ view: { ...get().view, drawer } });
    },
    openDialog(dialog) {
      set({ view: { ...get().view, dialog } });
    },
    closeDialog() {
      set({ view: { ...get().view, dialog: null } });
    },

    setDragPositions(dragPositions) {
      set({ dragPositions });
    },
    commitDrag() {
      const positions = get().dragPositions;
      set({ dragPositions: null });
      if (!positions) return;
      const moves = Object.entries(positions).map(([id, position]) => ({ id, position }));
      if (moves.length > 0) get().dispatch({ type: 'moveNodes', moves });
    },

    notify(text, kind = 'info') {
      set({ notice: { seq: ++noticeSeq, kind, text } });
    },
    dismissNotice() {
      set({ notice: null });
    },

    acknowledgeCautions() {
      try {
        globalThis.localStorage?.setItem(CAUTIONS_KEY, 'yes');
      } catch {
        // Private browsing can refuse storage; the cautions then show again next time, which is safe.
      }
      set({ cautionsAcknowledged: true, view: { ...get().view, dialog: null } });
    },

    setFileName(fileName) {
      set({ fileName });
    },
  }));
}

/** The app's one store. Tests make their own with `createEditorStore`. */
export const editorStore: EditorStore = createEditorStore();

/** React hook over the app's store: `useEditor((s) => s.selection)`; also `useEditor.getState()`. */
export const useEditor = Object.assign(
  <T>(selector: (s: EditorState) => T): T => useStore(editorStore, selector),
  {
    getState: editorStore.getState,
    setState: editorStore.setState,
    subscribe: editorStore.subscribe,
  },
);
