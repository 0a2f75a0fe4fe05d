import type { Edge, Node } from '@xyflow/react';
import type { Cable, NodeElement } from '../../model/types.ts';
import type { Status } from '../../solver/results.ts';

/** Level of detail from the zoom: 0 far out (status only), 1 middle (short labels), 2 near (full). */
export type Detail = 0 | 1 | 2;

export type ElementNodeData = {
  element: NodeElement;
  status: Status | null;
  label: string;
  detail: Detail;
  /** Over-limit or error findings on this element, for a marker and its tooltip. */
  problem: string | null;
  /**
   * For a board or junction shown close or over in a drop view: the load that sets that status
   * ("L27 5.90 %"), named on the badge beside the node's own figure. Null otherwise.
   */
  setBy: string | null;
};

export type CableEdgeData = {
  cable: Cable;
  status: Status | null;
  lines: string[];
  /** The one figure shown at middle zoom. */
  short: string;
  /** First label line: the cable's own name when it says more than its far end's, else its id; and its length. */
  heading: string;
  /** Tooltip: what the figures mean. */
  title: string;
  detail: Detail;
  showLabel: boolean;
  /** A cable into a junction labels beside the dot, leaving the space above for the onward cable. */
  labelSide: 'above' | 'beside';
  /** Extra lift in px, so labels of neighbouring loads fed from one board alternate in height. */
  raisePx: number;
};

export type ElementFlowNode = Node<ElementNodeData, 'element'>;
export type CableFlowEdge = Edge<CableEdgeData, 'cable'>;

/** Below this zoom only status shows; from here short labels. */
export const SHORT_DETAIL_ZOOM = 0.45;
/** From this zoom the labels show in full. */
export const FULL_DETAIL_ZOOM = 0.8;

export function detailForZoom(zoom: number): Detail {
  return zoom < SHORT_DETAIL_ZOOM ? 0 : zoom < FULL_DETAIL_ZOOM ? 1 : 2;
}
