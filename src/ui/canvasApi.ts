/**
 * The few things outside the canvas (top bar, keyboard, tray) ask of the viewport. The canvas
 * registers them when it mounts; until then they do nothing.
 */
import type { PlanPoint, Position } from '../model/types.ts';

export interface CanvasApi {
  /** The whole diagram on screen, however small. */
  fitView(): void;
  /** The opening view: fitted when readable, else labels-size zoom on the supply end. */
  startView(): void;
  /** Zoom to 1:1 about the middle of the view. */
  zoomActual(): void;
  centreOn(position: Position): void;
  /** Canvas coordinates of the middle of what is on screen, where a clicked tray part lands. */
  viewCentre(): Position;
  /** Brings a box of the drawing into view (same zoom) when it is not on screen already. */
  reveal?(box: { x: number; y: number; width: number; height: number }): void;
  /**
   * Given only while the site plan is shown: the plan point in the middle of the view, where a
   * clicked tray part is placed on the plan, and the allowance the plan bar gives cables measured
   * on the plan (null while that field holds no usable number).
   */
  planPlacement?(): { point: PlanPoint; allowanceM: number | null };
}

let api: CanvasApi | null = null;

export function registerCanvas(next: CanvasApi | null): void {
  api = next;
}

export function canvas(): CanvasApi | null {
  return api;
}
