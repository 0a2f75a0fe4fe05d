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
};

export type CableEdgeData = {
  cable: Cable;
  status: Status | null;
  lines: string[];
  detail: Detail;
  showLabel: boolean;
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
