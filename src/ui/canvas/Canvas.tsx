/**
 * The diagram: a React Flow view over the store. Flow nodes and edges are derived from the
 * document; React Flow's change events become store actions (a drag is transient until it ends,
 * a selection goes to view state, dimension changes are ignored because node sizes are fixed).
 */
import { useCallback, useEffect, useMemo, useState } from 'react';
import {
  Background,
  BackgroundVariant,
  ConnectionLineType,
  Controls,
  MiniMap,
  ReactFlow,
  ReactFlowProvider,
  useReactFlow,
  type Connection,
  type EdgeChange,
  type NodeChange,
  type OnMove,
  type ReactFlowInstance,
} from '@xyflow/react';
import { useEditor, editorStore } from '../../store/editorStore.ts';
import { GRID, NODE_SIZE } from '../../model/layout.ts';
import { connectionProblem } from '../../model/commands/cables.ts';
import { createFlowBuilder } from './toFlow.ts';
import { ElementNode } from './ElementNode.tsx';
import { CableEdge } from './CableEdge.tsx';
import { detailForZoom, type CableFlowEdge, type Detail, type ElementFlowNode } from './flowTypes.ts';
import { registerCanvas } from '../canvasApi.ts';
import { fitViewport, MIN_ZOOM, startViewport } from './startView.ts';
import { addPart, snap } from '../actions.ts';
import { isPartKind, PART_MIME } from '../parts.ts';
import { ContextMenu, type MenuTarget } from './ContextMenu.tsx';
import { statusLook } from '../../export/statusLook.ts';
import type { Id } from '../../model/types.ts';

const nodeTypes = { element: ElementNode };
const edgeTypes = { cable: CableEdge };

function applySelectChanges(changes: (NodeChange | EdgeChange)[]): void {
  const picks = changes.filter((c) => c.type === 'select');
  if (picks.length === 0) return;
  const s = editorStore.getState();
  const set = new Set(s.selection);
  for (const c of picks) {
    if (c.selected) set.add(c.id);
    else set.delete(c.id);
  }
  s.setSelection([...set]);
}

function screenSize(): { width: number; height: number } {
  const r = document.querySelector('.ed-canvas .react-flow')?.getBoundingClientRect();
  return r ? { width: r.width, height: r.height } : { width: 800, height: 600 };
}

function reportFlowError(code: string, message: string): void {
  // Shown in the console so the browser tests, which fail on console errors, catch it.
  console.error(`React Flow error ${code}: ${message}`);
}

function FlowView() {
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const selection = useEditor((s) => s.selection);
  const dragPositions = useEditor((s) => s.dragPositions);
  const labelMode = useEditor((s) => s.view.labelMode);
  const showLabels = useEditor((s) => s.view.showLabels);
  const revealRequest = useEditor((s) => s.revealRequest);
  const [detail, setDetail] = useState<Detail>(2);
  const [builder] = useState(createFlowBuilder);
  const [menu, setMenu] = useState<{ x: number; y: number; target: MenuTarget } | null>(null);
  const flow = useReactFlow<ElementFlowNode, CableFlowEdge>();

  const nodes = useMemo(
    () => builder.nodes({ doc, results, selection, dragPositions, labelMode, showLabels, detail }),
    [builder, doc, results, selection, dragPositions, labelMode, showLabels, detail],
  );
  // Edges do not depend on drag positions: React Flow re-routes them from the nodes it is moving.
  const edges = useMemo(
    () => builder.edges({ doc, results, selection, dragPositions: null, labelMode, showLabels, detail }),
    [builder, doc, results, selection, labelMode, showLabels, detail],
  );

  useEffect(() => {
    registerCanvas({
      fitView: () =>
        void flow.setViewport(fitViewport(editorStore.getState().doc, screenSize()), { duration: 250 }),
      startView: () => void flow.setViewport(startViewport(editorStore.getState().doc, screenSize())),
      zoomActual: () => void flow.zoomTo(1, { duration: 0 }),
      centreOn: (p) => void flow.setCenter(p.x, p.y, { zoom: Math.max(flow.getZoom(), 1), duration: 300 }),
      viewCentre: () => {
        const el = document.querySelector('.react-flow');
        const r = el?.getBoundingClientRect();
        if (!r) return { x: 0, y: 0 };
        return flow.screenToFlowPosition({ x: r.left + r.width / 2, y: r.top + r.height / 2 });
      },
      reveal: (box) => {
        const el = document.querySelector('.react-flow');
        const r = el?.getBoundingClientRect();
        if (!r) return;
        // Keep clear of the drawer and the panels that may cover the bottom of the canvas.
        const drawer = document.querySelector('.dl-drawer')?.getBoundingClientRect();
        const bottom = drawer && drawer.top > r.top ? drawer.top : r.bottom;
        const a = flow.flowToScreenPosition({ x: box.x, y: box.y });
        const b = flow.flowToScreenPosition({ x: box.x + box.width, y: box.y + box.height });
        const inside = a.x >= r.left && a.y >= r.top && b.x <= r.right && b.y <= bottom - 40;
        if (!inside)
          void flow.setCenter(box.x + box.width / 2, box.y + box.height / 2, {
            zoom: flow.getZoom(),
            duration: 250,
          });
      },
    });
    return () => registerCanvas(null);
  }, [flow]);

  useEffect(() => {
    if (!revealRequest) return;
    const { doc: d } = editorStore.getState();
    const node = d.nodes.find((n) => n.id === revealRequest.id);
    const cable = d.cables.find((c) => c.id === revealRequest.id);
    const centreOf = (id: Id) => {
      const n = d.nodes.find((x) => x.id === id);
      if (!n) return null;
      const size = NODE_SIZE[n.kind];
      return { x: n.position.x + size.width / 2, y: n.position.y + size.height / 2 };
    };
    const target = node ? centreOf(node.id) : cable ? centreOf(cable.to) : null;
    if (target) void flow.setCenter(target.x, target.y, { zoom: Math.max(flow.getZoom(), 1), duration: 300 });
  }, [revealRequest, flow]);

  const onNodesChange = useCallback((changes: NodeChange<ElementFlowNode>[]) => {
    let drag: Record<Id, { x: number; y: number }> | null = null;
    for (const c of changes) {
      if (c.type === 'position' && c.position && c.dragging) {
        drag ??= { ...(editorStore.getState().dragPositions ?? {}) };
        drag[c.id] = { x: c.position.x, y: c.position.y };
      }
    }
    if (drag) editorStore.getState().setDragPositions(drag);
    applySelectChanges(changes);
  }, []);

  const onEdgesChange = useCallback(
    (changes: EdgeChange<CableFlowEdge>[]) => applySelectChanges(changes),
    [],
  );
  const onNodeDragStop = useCallback(() => editorStore.getState().commitDrag(), []);

  const onConnect = useCallback((c: Connection) => {
    editorStore.getState().dispatch({ type: 'connectCable', from: c.source, to: c.target });
  }, []);
  const isValidConnection = useCallback(
    (c: Connection | CableFlowEdge) =>
      connectionProblem(editorStore.getState().doc, c.source, c.target) === null,
    [],
  );

  // The project opened before the first render: open on a readable view of it.
  const onInit = useCallback((instance: ReactFlowInstance<ElementFlowNode, CableFlowEdge>) => {
    const vp = startViewport(editorStore.getState().doc, screenSize());
    void instance.setViewport(vp);
    setDetail(detailForZoom(vp.zoom));
  }, []);

  const onMove: OnMove = useCallback((_e, viewport) => setDetail(detailForZoom(viewport.zoom)), []);

  const onDragOver = useCallback((e: React.DragEvent) => {
    if (e.dataTransfer.types.includes(PART_MIME)) {
      e.preventDefault();
      e.dataTransfer.dropEffect = 'copy';
    }
  }, []);
  const onDrop = useCallback(
    (e: React.DragEvent) => {
      const part = e.dataTransfer.getData(PART_MIME);
      if (!part || !isPartKind(part)) return;
      e.preventDefault();
      e.stopPropagation();
      const p = flow.screenToFlowPosition({ x: e.clientX, y: e.clientY });
      const kind = part.startsWith('load:') ? 'load' : (part as 'supply' | 'board' | 'junction');
      const size = NODE_SIZE[kind];
      addPart(part, snap({ x: p.x - size.width / 2, y: p.y - size.height / 2 }));
    },
    [flow],
  );

  const openMenu = (e: React.MouseEvent, target: MenuTarget) => {
    e.preventDefault();
    if (target.kind !== 'pane' && !editorStore.getState().selection.includes(target.id)) {
      editorStore.getState().setSelection([target.id]);
    }
    setMenu({ x: e.clientX, y: e.clientY, target });
  };

  return (
    <div className="ed-canvas" onDragOver={onDragOver} onDrop={onDrop} data-testid="canvas">
      <ReactFlow<ElementFlowNode, CableFlowEdge>
        nodes={nodes}
        edges={edges}
        nodeTypes={nodeTypes}
        edgeTypes={edgeTypes}
        onNodesChange={onNodesChange}
        onEdgesChange={onEdgesChange}
        onNodeDragStop={onNodeDragStop}
        onConnect={onConnect}
        isValidConnection={isValidConnection}
        onMove={onMove}
        onError={reportFlowError}
        onNodeContextMenu={(e, n) => openMenu(e, { kind: 'node', id: n.id })}
        onEdgeContextMenu={(e, ed) => openMenu(e, { kind: 'cable', id: ed.id })}
        onPaneContextMenu={(e) => openMenu(e as React.MouseEvent, { kind: 'pane' })}
        onPaneClick={() => setMenu(null)}
        connectionLineType={ConnectionLineType.SmoothStep}
        snapToGrid
        snapGrid={[GRID, GRID]}
        onlyRenderVisibleElements
        deleteKeyCode={null}
        disableKeyboardA11y
        minZoom={MIN_ZOOM}
        maxZoom={2.5}
        onInit={onInit}
      >
        <Background variant={BackgroundVariant.Dots} gap={GRID} size={1} color="#c9cfd6" />
        <Controls showInteractive={false} position="bottom-left" />
        <MiniMap
          pannable
          zoomable
          position="bottom-right"
          nodeColor={(n) => statusLook((n as ElementFlowNode).data.status).colour}
          nodeStrokeWidth={0}
          ariaLabel="overview map"
        />
      </ReactFlow>
      {menu && <ContextMenu x={menu.x} y={menu.y} target={menu.target} onClose={() => setMenu(null)} />}
    </div>
  );
}

export function Canvas() {
  return (
    <ReactFlowProvider>
      <FlowView />
    </ReactFlowProvider>
  );
}
