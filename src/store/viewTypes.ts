import type { Id, Position } from '../model/types.ts';

/** What the compact labels on the canvas show. */
export type LabelMode = 'drop' | 'current' | 'zs' | 'fault' | 'capacity';
export const LABEL_MODES: readonly LabelMode[] = ['drop', 'current', 'zs', 'fault', 'capacity'];

export type Drawer = null | 'schedules' | 'findings';
export type Dialog = null | 'project' | 'settings' | 'cautions' | 'help' | 'sizing' | 'pack' | 'alternatives';

export interface ViewState {
  labelMode: LabelMode;
  /** Live labels on cables and nodes; off leaves the status styling only. */
  showLabels: boolean;
  drawer: Drawer;
  dialog: Dialog;
  /** What the canvas shows: the single-line diagram, or the site plan the elements stand on. */
  canvas: 'diagram' | 'plan';
}

export interface Notice {
  /** Increases with every notice, so the same text shown twice still re-appears. */
  seq: number;
  kind: 'error' | 'info';
  text: string;
}

/** Positions of nodes being dragged, not yet in the document. */
export type DragPositions = Record<Id, Position>;
