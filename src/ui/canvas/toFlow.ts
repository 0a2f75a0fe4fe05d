/**
 * Builds React Flow's nodes and edges from the document, the results, the selection and any drag
 * in progress. The document stays the truth; these objects are views. Each builder keeps the
 * previous objects and hands back the same one when nothing it shows has changed, so memoised node
 * and edge components skip rendering (a drag then re-renders only what moves).
 */
import type { Id, NodeElement, Position, ProjectDocument } from '../../model/types.ts';
import { NODE_SIZE } from '../../model/layout.ts';
import type { Results } from '../../solver/results.ts';
import type { LabelMode } from '../../store/viewTypes.ts';
import {
  cableLabel,
  cableLabelTitle,
  cableShortLabel,
  cableStatus,
  fmt,
  nodeLabel,
  nodeStatus,
  worseStatus,
} from './labels.ts';
import type { Status } from '../../solver/results.ts';
import { labelRaises } from './labelLayout.ts';
import type { CableEdgeData, CableFlowEdge, Detail, ElementFlowNode, ElementNodeData } from './flowTypes.ts';
import { Position as Side } from '@xyflow/react';
import { worstLoadsFed, type WorstFed } from './worstFed.ts';

/** Label modes in which a board shows the drop status of the worst load it feeds. */
const DROP_STATUS_MODES: readonly LabelMode[] = ['drop', 'current', 'capacity'];

/** "L27 5.90 %": the load that sets a status, and its cumulative drop. */
function setByText(w: WorstFed | undefined): string | null {
  return w ? `${w.loadId} ${fmt(w.load.cumulativePct.value, 2)} %` : null;
}

export interface FlowInputs {
  doc: ProjectDocument;
  results: Results;
  selection: Id[];
  dragPositions: Record<Id, Position> | null;
  labelMode: LabelMode;
  showLabels: boolean;
  detail: Detail;
}

const HANDLE = 10;

function handlesFor(n: NodeElement): ElementFlowNode['handles'] {
  const { width, height } = NODE_SIZE[n.kind];
  const out: NonNullable<ElementFlowNode['handles']> = [];
  if (n.kind !== 'supply') {
    out.push({
      id: 'in',
      type: 'target',
      position: Side.Top,
      x: width / 2 - HANDLE / 2,
      y: -HANDLE / 2,
      width: HANDLE,
      height: HANDLE,
    });
  }
  if (n.kind !== 'load') {
    out.push({
      id: 'out',
      type: 'source',
      position: Side.Bottom,
      x: width / 2 - HANDLE / 2,
      y: height - HANDLE / 2,
      width: HANDLE,
      height: HANDLE,
    });
  }
  return out;
}

function sameData(a: ElementNodeData, b: ElementNodeData): boolean {
  return (
    a.element === b.element &&
    a.status === b.status &&
    a.label === b.label &&
    a.detail === b.detail &&
    a.problem === b.problem &&
    a.setBy === b.setBy
  );
}

/** Lengths as typed, but never more than two decimals (a split cable's 13.33 m). */
function fmtLength(m: number): string {
  return Number.isInteger(m) ? String(m) : fmt(m, 2).replace(/0$/, '');
}

function sameEdgeData(a: CableEdgeData, b: CableEdgeData): boolean {
  return (
    a.cable === b.cable &&
    a.status === b.status &&
    a.detail === b.detail &&
    a.showLabel === b.showLabel &&
    a.short === b.short &&
    a.heading === b.heading &&
    a.title === b.title &&
    a.labelSide === b.labelSide &&
    a.raisePx === b.raisePx &&
    a.lines.length === b.lines.length &&
    a.lines.every((l, i) => l === b.lines[i])
  );
}

export function createFlowBuilder() {
  let nodeCache = new Map<Id, ElementFlowNode>();
  let edgeCache = new Map<Id, CableFlowEdge>();
  // Nodes and edges both name the load that sets a status: worked out once per document and results.
  let worstMemo: { doc: ProjectDocument; results: Results; map: Map<Id, WorstFed> } | undefined;
  const worstFor = (doc: ProjectDocument, results: Results): Map<Id, WorstFed> => {
    if (worstMemo?.doc !== doc || worstMemo.results !== results)
      worstMemo = { doc, results, map: worstLoadsFed(doc, results) };
    return worstMemo.map;
  };

  function problems(results: Results): Map<Id, string> {
    const out = new Map<Id, string>();
    for (const f of results.findings) {
      if (f.elementId && f.severity === 'error' && !out.has(f.elementId)) out.set(f.elementId, f.message);
    }
    return out;
  }

  /**
   * The breaking-capacity status of the device that protects cable `id`: its own, or for a segment
   * beyond a junction (no device of its own) the upstream device's, as a load is judged.
   */
  function faultStatus(results: Results, id: Id, close: number): Status | null {
    const r = results.cables[id];
    const own = cableStatus(r, 'fault', undefined, close);
    const by = r?.protection?.deviceCableId;
    return own ?? (by && by !== id ? cableStatus(results.cables[by], 'fault', undefined, close) : null);
  }

  /**
   * In fault-level mode a point is judged by the devices that must break a fault there: a board
   * by the worst device it holds (on the cables leaving it), a load by the device protecting it.
   */
  function deviceStatusAtNodes({ doc, results }: FlowInputs): Map<Id, Status | null> {
    const out = new Map<Id, Status | null>();
    const close = doc.settings.closeThreshold;
    const kinds = new Map(doc.nodes.map((n) => [n.id, n.kind]));
    for (const c of doc.cables) {
      const s = faultStatus(results, c.id, close);
      out.set(c.from, worseStatus(out.get(c.from) ?? null, s));
      if (kinds.get(c.to) === 'load') out.set(c.to, worseStatus(out.get(c.to) ?? null, s));
    }
    return out;
  }

  function nodes(input: FlowInputs): ElementFlowNode[] {
    const { doc, results, dragPositions, labelMode, showLabels, detail } = input;
    const selected = new Set(input.selection);
    const issues = problems(results);
    const closeShare = doc.settings.closeThreshold;
    const devices = labelMode === 'fault' ? deviceStatusAtNodes(input) : null;
    const worst = DROP_STATUS_MODES.includes(labelMode) ? worstFor(doc, results) : null;
    const next = new Map<Id, ElementFlowNode>();
    const list = doc.nodes.map((element) => {
      const r = results.nodes[element.id];
      const data: ElementNodeData = {
        element,
        status: devices ? (devices.get(element.id) ?? null) : (nodeStatus(r, labelMode, closeShare) ?? null),
        label: showLabels ? nodeLabel(r, labelMode) : '',
        detail,
        problem: issues.get(element.id) ?? null,
        setBy: element.kind === 'load' || !worst ? null : setByText(worst.get(element.id)),
      };
      const position = dragPositions?.[element.id] ?? element.position;
      const isSelected = selected.has(element.id);
      const prev = nodeCache.get(element.id);
      let node: ElementFlowNode;
      if (prev && sameData(prev.data, data) && prev.selected === isSelected && prev.position === position) {
        node = prev;
      } else {
        const size = NODE_SIZE[element.kind];
        node = {
          id: element.id,
          type: 'element',
          position,
          data: prev && sameData(prev.data, data) ? prev.data : data,
          selected: isSelected,
          width: size.width,
          height: size.height,
          measured: { width: size.width, height: size.height },
          handles: prev?.handles ?? handlesFor(element),
          ariaLabel: `${element.kind} ${element.name}`,
        };
      }
      next.set(element.id, node);
      return node;
    });
    nodeCache = next;
    return list;
  }

  function edges(input: FlowInputs): CableFlowEdge[] {
    const { doc, results, labelMode, showLabels, detail } = input;
    const selected = new Set(input.selection);
    const next = new Map<Id, CableFlowEdge>();
    const kinds = new Map(doc.nodes.map((n) => [n.id, n.kind]));
    // A cable React Flow cannot draw (missing end, or starting at a load) stays out of the view;
    // the solver reports it as a finding instead.
    const drawable = doc.cables.filter((c) => {
      const up = kinds.get(c.from);
      const down = kinds.get(c.to);
      return up !== undefined && down !== undefined && up !== 'load' && down !== 'supply';
    });
    const byId = new Map(doc.nodes.map((n) => [n.id, n]));
    // A sub-main shown close or over names the load that makes it so, as its board's badge does.
    const worst = labelMode === 'drop' ? worstFor(doc, results) : null;
    const texts = drawable.map((cable) => {
      const r = results.cables[cable.id];
      const far = results.nodes[cable.to];
      const to = byId.get(cable.to)!;
      let full = cable.lengthM > 0 ? cableLabel(r, labelMode, far) : ['length not set'];
      const setBy = to.kind !== 'load' && cable.lengthM > 0 ? worst?.get(cable.to) : undefined;
      if (setBy && full.length > 0)
        full = [...full.slice(0, -1), `${full[full.length - 1]} · ${setBy.loadId}`];
      const short = cable.lengthM > 0 ? cableShortLabel(r, labelMode, far) : 'length not set';
      const named = cable.name && cable.name !== cable.id && cable.name !== to.name;
      const length = cable.lengthM > 0 ? ` · ${fmtLength(cable.lengthM)} m` : '';
      const heading = `${named ? cable.name : cable.id}${length}`;
      return { cable, r, to, full, short, heading };
    });
    const raises =
      showLabels && detail > 0
        ? labelRaises(
            texts
              .filter((t) => t.to.kind !== 'junction')
              .map((t) => ({
                id: t.cable.id,
                to: t.to,
                heading: detail === 2 ? t.heading : '',
                // The status glyph and a space lead the last line.
                lines: (detail === 2 ? t.full : [t.short]).map((l, i, all) =>
                  i === all.length - 1 ? `▲ ${l}` : l,
                ),
              })),
          )
        : null;
    const list = texts.map(({ cable, r, to, full, short, heading }) => {
      const data: CableEdgeData = {
        cable,
        status:
          labelMode === 'fault'
            ? faultStatus(results, cable.id, doc.settings.closeThreshold)
            : cableStatus(r, labelMode, results.nodes[cable.to], doc.settings.closeThreshold),
        lines: showLabels ? full : [],
        short: showLabels ? short : '',
        heading,
        title: cableLabelTitle(labelMode),
        detail,
        showLabel: showLabels && detail > 0,
        labelSide: to.kind === 'junction' ? 'beside' : 'above',
        raisePx: raises?.get(cable.id) ?? 0,
      };
      const isSelected = selected.has(cable.id);
      const prev = edgeCache.get(cable.id);
      let edge: CableFlowEdge;
      if (prev && prev.selected === isSelected && sameEdgeData(prev.data as CableEdgeData, data)) {
        edge = prev;
      } else {
        edge = {
          id: cable.id,
          type: 'cable',
          source: cable.from,
          target: cable.to,
          sourceHandle: 'out',
          targetHandle: 'in',
          data,
          selected: isSelected,
          ariaLabel: `cable ${cable.name}`,
        };
      }
      next.set(cable.id, edge);
      return edge;
    });
    edgeCache = next;
    return list;
  }

  return { nodes, edges };
}
