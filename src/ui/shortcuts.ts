/**
 * Keyboard shortcuts, one list for the key handler and the help overlay. "Mod" is Cmd on a Mac
 * and Ctrl elsewhere, following each platform's habit.
 */
export type ShortcutId =
  | 'undo'
  | 'redo'
  | 'delete'
  | 'copy'
  | 'cut'
  | 'paste'
  | 'duplicate'
  | 'selectAll'
  | 'nudge'
  | 'nudgeFar'
  | 'save'
  | 'saveAs'
  | 'open'
  | 'fit'
  | 'startView'
  | 'zoomActual'
  | 'tidy'
  | 'help'
  | 'escape';

export interface Shortcut {
  id: ShortcutId;
  keys: string;
  what: string;
}

export const IS_MAC =
  typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform || navigator.userAgent);
const MOD = IS_MAC ? '⌘' : 'Ctrl+';
const SHIFT = IS_MAC ? '⇧' : 'Shift+';

export const SHORTCUTS: readonly Shortcut[] = [
  { id: 'undo', keys: `${MOD}Z`, what: 'Undo the last change' },
  { id: 'redo', keys: IS_MAC ? `${SHIFT}${MOD}Z` : 'Ctrl+Y or Ctrl+Shift+Z', what: 'Redo' },
  {
    id: 'delete',
    keys: IS_MAC ? 'Delete (⌫)' : 'Delete or Backspace',
    what: "Delete the selection (a node's cables go with it)",
  },
  { id: 'copy', keys: `${MOD}C`, what: 'Copy the selection' },
  { id: 'cut', keys: `${MOD}X`, what: 'Cut the selection' },
  { id: 'paste', keys: `${MOD}V`, what: 'Paste' },
  { id: 'duplicate', keys: `${MOD}D`, what: 'Duplicate the selection' },
  { id: 'selectAll', keys: `${MOD}A`, what: 'Select everything' },
  { id: 'nudge', keys: 'Arrow keys', what: 'Move the selection one grid step' },
  { id: 'nudgeFar', keys: `${SHIFT}Arrow keys`, what: 'Move the selection four grid steps' },
  { id: 'save', keys: `${MOD}S`, what: 'Save the project file' },
  { id: 'saveAs', keys: IS_MAC ? `${SHIFT}${MOD}S` : 'Ctrl+Shift+S', what: 'Save as a new file' },
  { id: 'open', keys: `${MOD}O`, what: 'Open a project file' },
  { id: 'fit', keys: `${SHIFT}1`, what: 'Fit the diagram to the screen' },
  {
    id: 'startView',
    keys: `${SHIFT}2`,
    what: 'Readable view of the supply end (where a project opens)',
  },
  { id: 'zoomActual', keys: `${SHIFT}0`, what: 'Zoom to 100 %' },
  { id: 'tidy', keys: `${SHIFT}T`, what: 'Tidy the layout from the supply down' },
  { id: 'help', keys: '?', what: 'Show this help' },
  { id: 'escape', keys: 'Esc', what: 'Clear the selection or close a dialog' },
];

/** Mouse gestures, for the help overlay. */
export const GESTURES: readonly { gesture: string; what: string }[] = [
  { gesture: 'Drag a part from the tray', what: 'Place a new element' },
  {
    gesture: 'Click a part in the tray',
    what: 'Place it; with a board selected, place it below and feed it from the board',
  },
  { gesture: 'Drag from the dot under an element to one above another', what: 'Draw a cable' },
  { gesture: 'Shift + drag on empty canvas', what: 'Select with a box' },
  { gesture: `${IS_MAC ? '⌘' : 'Ctrl'} + click`, what: 'Add to or remove from the selection' },
  { gesture: 'Drag on empty canvas / wheel', what: 'Pan / zoom' },
  { gesture: 'Right-click', what: 'Actions for the element or the canvas' },
  {
    gesture: 'Site plan: drag a board or load',
    what: 'Move it on the plan; cables measured there change length and every drop updates as it moves',
  },
  {
    gesture: 'Site plan: click a name under “Not on the plan yet”',
    what: 'Put that element in the middle of the view, to drag where it stands',
  },
  {
    gesture: 'Site plan: click a part in the tray',
    what: 'Place it in the middle of the view; with a board selected, feed it from the board by a cable measured on the plan',
  },
  {
    gesture: 'Site plan: double-click a measured route',
    what: 'Add a bend there; drag the bend to take the cable round an obstacle, double-click it to take it away',
  },
];

export function shortcutText(id: ShortcutId): string {
  return SHORTCUTS.find((s) => s.id === id)?.keys ?? '';
}
