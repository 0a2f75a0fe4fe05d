/**
 * The site plan: the elements placed on a scaled drawing of the site, and each cable along the
 * route its length is measured on. Dragging a board re-measures the cables that follow the plan
 * and solves again while it moves; letting go is one undo step.
 */
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { registerCanvas } from '../canvasApi.ts';
import {
  Background,
  BackgroundVariant,
  Controls,
  Panel,
  ReactFlow,
  ReactFlowProvider,
  useReactFlow,
  type NodeChange,
} from '@xyflow/react';
import { useEditor, editorStore } from '../../store/editorStore.ts';
import { safeSolve } from '../../store/safeSolve.ts';
import { applyCommand } from '../../model/commands.ts';
import type { Id, PlanPoint } from '../../model/types.ts';
import { BendView, MarkerView, PictureView, PlanCableView } from './PlanParts.tsx';
import {
  BEND,
  MARKER,
  PICTURE_ID,
  PX_PER_M,
  bendIndex,
  parseBendId,
  planEdges,
  planNodes,
  type PlanEdge,
  type PlanNode,
} from './planFlow.ts';
import { routePoints } from '../../model/planLengths.ts';
import type { Cable, ProjectDocument } from '../../model/types.ts';
import type { Command } from '../../model/commands.ts';
import { readPlanPicture } from './planPicture.ts';
import { MAX_ALLOWANCE_M } from '../../model/schema.ts';
import './plan.css';

const nodeTypes = { marker: MarkerView, picture: PictureView, bend: BendView };
const edgeTypes = { planCable: PlanCableView };

/** A plan point to 0.1 m, from the top-left corner of a box `size` pixels across centred on it. */
function toPoint(x: number, y: number, size = MARKER): PlanPoint {
  const r = (v: number) => Math.round(v * 10) / 10;
  return { xM: r((x + size / 2) / PX_PER_M), yM: r((y + size / 2) / PX_PER_M) };
}

/**
 * The command a drag on the plan makes: markers moved (one placeOnPlan), or a bend moved (its
 * cable's route with the bend's new place). A bend is not selectable, so it moves on its own.
 */
function dragCommand(doc: ProjectDocument, moved: Record<Id, PlanPoint>): Command | null {
  const markers: { id: Id; plan: PlanPoint }[] = [];
  let cable: Cable | undefined;
  let via: PlanPoint[] | undefined;
  for (const [id, plan] of Object.entries(moved)) {
    const bend = parseBendId(id);
    if (!bend) {
      markers.push({ id, plan });
      continue;
    }
    cable ??= doc.cables.find((c) => c.id === bend.cableId);
    if (!cable?.route?.via || cable.id !== bend.cableId) continue;
    via ??= cable.route.via.slice();
    if (bend.index < via.length) via[bend.index] = plan;
  }
  if (cable?.route && via)
    return { type: 'updateCable', id: cable.id, patch: { route: { ...cable.route, via } } };
  return markers.length > 0 ? { type: 'placeOnPlan', moves: markers } : null;
}

/** Two clicks on the plan and the real distance between them: the plan's scale, the usual way. */
export interface ScalePick {
  points: { x: number; y: number }[];
}

function ScaleByPoints({ pick, onPick }: { pick: ScalePick | null; onPick: (p: ScalePick | null) => void }) {
  const doc = useEditor((s) => s.doc);
  const dispatch = useEditor((s) => s.dispatch);
  const [metres, setMetres] = useState('');
  if (!doc.plan) return null;
  if (!pick)
    return (
      <button
        type="button"
        data-testid="plan-scale"
        title="Click the two ends of a dimension you know on the plan (a wall, a grid line, the scale bar), then give its length"
        onClick={() => {
          setMetres('');
          onPick({ points: [] });
        }}
      >
        Set the scale from two points…
      </button>
    );
  const [a, b] = pick.points;
  const measuredM = a && b ? Math.hypot(b.x - a.x, b.y - a.y) / PX_PER_M : null;
  const real = Number(metres);
  const usable =
    measuredM !== null && measuredM > 0 && metres.trim() !== '' && Number.isFinite(real) && real > 0;
  return (
    <span className="pl-scale" data-testid="plan-scale-pick">
      {measuredM === null ? (
        <span>Click {a ? 'the other end' : 'one end'} of a dimension you know on the plan.</span>
      ) : (
        <label>
          The two points are{' '}
          <input
            value={metres}
            autoFocus
            onChange={(e) => setMetres(e.target.value)}
            className="pl-short"
            data-testid="plan-scale-metres"
          />{' '}
          m apart (now {measuredM.toFixed(2)} m)
        </label>
      )}
      <button
        type="button"
        className="dl-primary"
        disabled={!usable}
        data-testid="plan-scale-apply"
        onClick={() => {
          if (!usable || !doc.plan || measuredM === null) return;
          const out = dispatch({ type: 'scaleSitePlan', widthM: (doc.plan.widthM * real) / measuredM });
          if (out.ok) onPick(null);
        }}
      >
        Apply
      </button>
      <button type="button" onClick={() => onPick(null)}>
        Cancel
      </button>
    </span>
  );
}

/** The allowance field's text as metres, or null where it is not a usable allowance. */
function allowanceMetres(text: string): number | null {
  const m = Number(text);
  return text.trim() !== '' && Number.isFinite(m) && m >= 0 && m <= MAX_ALLOWANCE_M ? m : null;
}

/** The plan point in the middle of what the plan view shows. */
function planViewCentre(flow: ReturnType<typeof useReactFlow>): PlanPoint {
  const el = document.querySelector('.pl-canvas .react-flow')?.getBoundingClientRect();
  const centre = el
    ? flow.screenToFlowPosition({ x: el.left + el.width / 2, y: el.top + el.height / 2 })
    : { x: 0, y: 0 };
  return toPoint(centre.x - MARKER / 2, centre.y - MARKER / 2);
}

function PlanBar({
  pick,
  onPick,
  allowance,
  setAllowance,
}: {
  pick: ScalePick | null;
  onPick: (p: ScalePick | null) => void;
  allowance: string;
  setAllowance: (text: string) => void;
}) {
  const doc = useEditor((s) => s.doc);
  const selection = useEditor((s) => s.selection);
  const dispatch = useEditor((s) => s.dispatch);
  const notify = useEditor((s) => s.notify);
  const flow = useReactFlow();
  const file = useRef<HTMLInputElement>(null);
  const unplaced = doc.nodes.filter((n) => !n.plan);
  const selectedPlaced = doc.nodes.filter((n) => n.plan && selection.includes(n.id));
  // One measured cable picked: how to bend its route.
  const picked = selection.length === 1 ? doc.cables.find((c) => c.id === selection[0]) : undefined;
  const routed = picked?.route ? picked : undefined;
  const placedIds = new Set(doc.nodes.filter((n) => n.plan).map((n) => n.id));
  const measurable = doc.cables.filter((c) => placedIds.has(c.from) && placedIds.has(c.to));
  // With a selection, the selected cables (a new allowance for measured ones too); without, only
  // the cables not measured yet, so allowances already set are never overwritten in bulk.
  const chosen =
    selection.length > 0
      ? measurable.filter((c) => selection.includes(c.id))
      : measurable.filter((c) => !c.route);
  const allowanceM = allowanceMetres(allowance) ?? 0;
  const allowanceOk = allowanceMetres(allowance) !== null;

  const placeAtCentre = (id: Id) =>
    dispatch({ type: 'placeOnPlan', moves: [{ id, plan: planViewCentre(flow) }] });

  return (
    <Panel position="top-left" className="pl-bar">
      <div className="pl-row">
        <button type="button" onClick={() => file.current?.click()} data-testid="plan-picture">
          {doc.plan ? 'Change plan picture…' : 'Plan picture…'}
        </button>
        <input
          ref={file}
          type="file"
          accept="image/png,image/jpeg,image/svg+xml"
          hidden
          data-testid="plan-picture-input"
          onChange={(e) => {
            const f = e.target.files?.[0];
            e.target.value = '';
            if (!f) return;
            void readPlanPicture(f).then(
              (image) => dispatch({ type: 'setSitePlan', plan: { image, widthM: doc.plan?.widthM ?? 50 } }),
              (err: unknown) => notify(err instanceof Error ? err.message : String(err), 'error'),
            );
          }}
        />
        {doc.plan && (
          <label title="How many metres the plan picture spans from its left edge to its right edge: its scale">
            Picture width{' '}
            <input
              key={doc.plan.widthM}
              type="number"
              min={0.1}
              step="any"
              defaultValue={doc.plan.widthM}
              data-testid="plan-width"
              onBlur={(e) => {
                const widthM = Number(e.target.value);
                if (doc.plan && widthM !== doc.plan.widthM) dispatch({ type: 'scaleSitePlan', widthM });
              }}
              onKeyDown={(e) => {
                if (e.key === 'Enter') (e.target as HTMLInputElement).blur();
              }}
            />{' '}
            m
          </label>
        )}
        <ScaleByPoints pick={pick} onPick={onPick} />
        <span className="pl-sep" />
        <label title="Added to each measured length for rises, drops and terminations">
          Allowance{' '}
          <input
            value={allowance}
            onChange={(e) => setAllowance(e.target.value)}
            className="pl-short"
            data-testid="plan-allowance"
            aria-invalid={!allowanceOk}
          />{' '}
          m
        </label>
        <button
          type="button"
          disabled={chosen.length === 0 || !allowanceOk}
          data-testid="plan-measure"
          title="The length of each cable becomes its route on the plan (along x, then y) plus the allowance; moving its ends changes it"
          onClick={() => {
            const out = dispatch({
              type: 'applyProposals',
              // A new allowance keeps the bends a route already has.
              changes: chosen.map((c) => ({
                target: 'cable',
                id: c.id,
                patch: { route: { ...c.route, allowanceM } },
              })),
            });
            if (out.ok)
              notify(
                `${chosen.length} ${chosen.length === 1 ? 'cable is' : 'cables are'} now measured on the plan. Undo puts the typed lengths back.`,
              );
          }}
        >
          {selection.length > 0
            ? `Measure the selected cables on the plan (${chosen.length})`
            : `Measure the cables not measured yet (${chosen.length})`}
        </button>
      </div>
      {selectedPlaced.length > 0 && (
        <div className="pl-row">
          <button
            type="button"
            data-testid="plan-unplace"
            title="The element stays in the design; cables measured to it keep their last length until it is placed again"
            onClick={() =>
              dispatch({ type: 'placeOnPlan', moves: selectedPlaced.map((n) => ({ id: n.id, plan: null })) })
            }
          >
            Take {selectedPlaced.length === 1 ? selectedPlaced[0]!.id : `${selectedPlaced.length} elements`}{' '}
            off the plan
          </button>
        </div>
      )}
      {routed && (
        <div className="pl-row pl-hint-row" data-testid="plan-route-hint">
          <span>
            {routed.id} is measured on the plan
            {routed.route?.via
              ? ` through ${routed.route.via.length} ${routed.route.via.length === 1 ? 'bend' : 'bends'}`
              : ''}
            . Double-click its route to add a bend, drag a bend to route it round an obstacle, double-click a
            bend to take it away.
          </span>
          {routed.route?.via && (
            <button
              type="button"
              data-testid="plan-straighten"
              onClick={() =>
                dispatch({
                  type: 'updateCable',
                  id: routed.id,
                  patch: { route: { allowanceM: routed.route!.allowanceM } },
                })
              }
            >
              Remove the bends
            </button>
          )}
        </div>
      )}
      {unplaced.length > 0 && (
        <div className="pl-row pl-unplaced" data-testid="plan-unplaced">
          <span>Not on the plan yet ({unplaced.length}):</span>
          {unplaced.slice(0, 40).map((n) => (
            <button
              key={n.id}
              type="button"
              title={`Place ${n.name} in the middle of the view`}
              onClick={() => placeAtCentre(n.id)}
            >
              {n.id}
            </button>
          ))}
          {unplaced.length > 40 && <span>… and {unplaced.length - 40} more</span>}
        </div>
      )}
      {!doc.plan && (
        <p className="pl-hint">
          Load a picture of the site plan (PNG, JPEG or SVG) and give its width in metres; then place the
          boards and loads where they stand. Cables measured on the plan change length when their ends move.
        </p>
      )}
    </Panel>
  );
}

function PlanView() {
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const selection = useEditor((s) => s.selection);
  const [drag, setDrag] = useState<Record<Id, PlanPoint> | null>(null);
  const [pick, setPick] = useState<ScalePick | null>(null);
  const flow = useReactFlow();
  const [allowance, setAllowance] = useState('2');
  const allowanceNow = useRef(allowance);
  allowanceNow.current = allowance;
  // Fit and 1:1 from the top bar and the keyboard act on the plan while it is shown. A part added
  // from the tray goes on the plan in the middle of the view (and on the diagram below the rest).
  useEffect(() => {
    registerCanvas({
      fitView: () => void flow.fitView({ duration: 250 }),
      startView: () => void flow.fitView(),
      zoomActual: () => void flow.zoomTo(1, { duration: 0 }),
      centreOn: (p) => void flow.setCenter(p.x, p.y, { zoom: Math.max(flow.getZoom(), 1), duration: 300 }),
      viewCentre: () => ({ x: 0, y: 0 }),
      planPlacement: () => ({
        point: planViewCentre(flow),
        allowanceM: allowanceMetres(allowanceNow.current),
      }),
    });
    return () => registerCanvas(null);
  }, [flow]);
  // The picture's height comes from the browser (its aspect ratio); everything else is fixed.
  const [pictureHeight, setPictureHeight] = useState<number | null>(null);

  // While a marker or a bend moves, the cables measured on the plan are measured again and solved live.
  const live = useMemo(() => {
    const command = drag && dragCommand(doc, drag);
    if (!command) return { doc, results };
    const out = applyCommand(doc, command);
    return out.ok ? { doc: out.doc, results: safeSolve(out.doc) } : { doc, results };
  }, [doc, results, drag]);

  const nodes = useMemo(
    () => planNodes(live.doc, live.results, selection, pictureHeight),
    [live, selection, pictureHeight],
  );
  const edges = useMemo(() => planEdges(live.doc, live.results, selection), [live, selection]);

  const onNodesChange = useCallback((changes: NodeChange<PlanNode>[]) => {
    let next: Record<Id, PlanPoint> | null = null;
    const picks: Id[] = [];
    let picked = false;
    for (const c of changes) {
      if (c.type === 'position' && c.position && c.dragging) {
        next ??= {};
        next[c.id] = toPoint(c.position.x, c.position.y, parseBendId(c.id) ? BEND : MARKER);
      }
      if (c.type === 'dimensions' && c.id === PICTURE_ID && c.dimensions)
        setPictureHeight(c.dimensions.height);
      if (c.type === 'select') {
        picked = true;
        if (c.selected) picks.push(c.id);
      }
    }
    if (next) {
      const moved = next;
      setDrag((d) => ({ ...(d ?? {}), ...moved }));
    }
    if (picked) editorStore.getState().setSelection(picks);
  }, []);

  const onNodeDragStop = useCallback(() => {
    setDrag((d) => {
      const store = editorStore.getState();
      const command = d && dragCommand(store.doc, d);
      if (command) store.dispatch(command);
      return null;
    });
  }, []);

  // A double-click on a measured route puts a bend there (on the route, so the length stays until
  // the bend is dragged); a double-click on a bend takes it away.
  const onEdgeDoubleClick = useCallback(
    (e: React.MouseEvent, edge: PlanEdge) => {
      const store = editorStore.getState();
      const cable = store.doc.cables.find((c) => c.id === edge.id);
      const a = store.doc.nodes.find((n) => n.id === cable?.from)?.plan;
      const b = store.doc.nodes.find((n) => n.id === cable?.to)?.plan;
      if (!cable || !a || !b) return;
      if (!cable.route) {
        store.notify(`Measure ${cable.id} on the plan first (the Measure button); its length is typed.`);
        return;
      }
      const px = flow.screenToFlowPosition({ x: e.clientX, y: e.clientY });
      const p = toPoint(px.x, px.y, 0);
      const via = (cable.route.via ?? []).slice();
      via.splice(bendIndex(routePoints(cable, a, b), p), 0, p);
      store.dispatch({ type: 'updateCable', id: cable.id, patch: { route: { ...cable.route, via } } });
      store.setSelection([cable.id]);
    },
    [flow],
  );
  const onNodeDoubleClick = useCallback((_e: React.MouseEvent, node: PlanNode) => {
    const bend = parseBendId(node.id);
    if (!bend) return;
    const store = editorStore.getState();
    const cable = store.doc.cables.find((c) => c.id === bend.cableId);
    if (!cable?.route?.via) return;
    const via = cable.route.via.filter((_p, k) => k !== bend.index);
    const { via: _dropped, ...route } = cable.route;
    store.dispatch({
      type: 'updateCable',
      id: cable.id,
      patch: { route: via.length > 0 ? { ...route, via } : route },
    });
  }, []);

  return (
    <div className="pl-canvas" data-testid="plan-canvas">
      <ReactFlow<PlanNode, PlanEdge>
        nodes={nodes}
        edges={edges}
        nodeTypes={nodeTypes}
        edgeTypes={edgeTypes}
        onNodesChange={onNodesChange}
        onEdgeClick={(_e, edge) => editorStore.getState().setSelection([edge.id])}
        onEdgeDoubleClick={onEdgeDoubleClick}
        onNodeDoubleClick={onNodeDoubleClick}
        zoomOnDoubleClick={false}
        onPaneClick={(e) => {
          if (pick && pick.points.length < 2) {
            const p = flow.screenToFlowPosition({ x: e.clientX, y: e.clientY });
            setPick({ points: [...pick.points, p] });
          } else editorStore.getState().setSelection([]);
        }}
        onNodeDragStop={onNodeDragStop}
        nodesConnectable={false}
        deleteKeyCode={null}
        disableKeyboardA11y
        minZoom={0.05}
        maxZoom={4}
        fitView
        onError={(code, message) => console.error(`React Flow error ${code}: ${message}`)}
      >
        <Background variant={BackgroundVariant.Lines} gap={PX_PER_M * 5} color="#eef1f3" />
        <Controls showInteractive={false} position="bottom-left" />
        <PlanBar pick={pick} onPick={setPick} allowance={allowance} setAllowance={setAllowance} />
      </ReactFlow>
    </div>
  );
}

export function PlanCanvas() {
  return (
    <ReactFlowProvider>
      <PlanView />
    </ReactFlowProvider>
  );
}
