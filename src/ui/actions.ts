/**
 * Editor actions shared by the top bar, keyboard shortcuts, context menu and tray. Each turns a
 * user intent into store commands; none edits the document directly.
 */
import type { Id, NodeElement, PlanPoint, Position } from '../model/types.ts';
import { GRID, NODE_SIZE } from '../model/layout.ts';
import { editorStore } from '../store/editorStore.ts';
import { buildNode, type PartKind } from './parts.ts';
import { copySelection, takeClip } from './clipboard.ts';
import { canvas } from './canvasApi.ts';

const store = editorStore;

export function snap(p: Position): Position {
  return { x: Math.round(p.x / GRID) * GRID, y: Math.round(p.y / GRID) * GRID };
}

/** Plan markers closer than this, metres, are nudged apart when a part is placed from the tray. */
const PLAN_SPACING_M = 3;

/** `point`, moved right past any element already standing there, so a new marker is not hidden. */
function freePlanPoint(nodes: readonly NodeElement[], point: PlanPoint): PlanPoint {
  let p = point;
  for (let k = 0; k < nodes.length; k++) {
    const taken = nodes.some(
      (n) =>
        n.plan && Math.abs(n.plan.xM - p.xM) < PLAN_SPACING_M && Math.abs(n.plan.yM - p.yM) < PLAN_SPACING_M,
    );
    if (!taken) break;
    p = { xM: Math.round((p.xM + PLAN_SPACING_M) * 10) / 10, yM: p.yM };
  }
  return p;
}

/** A free place on the diagram below everything drawn, for a part added while the plan is shown. */
function belowDiagram(nodes: readonly NodeElement[]): Position {
  if (nodes.length === 0) return { x: 0, y: 0 };
  let left = Infinity;
  let bottom = -Infinity;
  for (const n of nodes) {
    left = Math.min(left, n.position.x);
    bottom = Math.max(bottom, n.position.y + NODE_SIZE[n.kind].height);
  }
  return { x: left, y: bottom + 4 * GRID };
}

/**
 * Adds a part. Without a position it lands below the one selected board/junction/supply and is fed
 * from it (the quick way to hang loads off a board), or else in the middle of the view. While the
 * site plan is shown it is also placed on the plan, in the middle of the view; a cable feeding it
 * from an element on the plan is then measured on the plan, with the plan bar's allowance.
 */
export function addPart(part: PartKind, at?: Position): void {
  const s = store.getState();
  const onPlan = at ? undefined : canvas()?.planPlacement?.();
  let feedFrom: Id | undefined;
  let position = at;
  if (!position) {
    const only = s.selection.length === 1 ? s.doc.nodes.find((n) => n.id === s.selection[0]) : undefined;
    if (only && only.kind !== 'load' && part !== 'supply') {
      feedFrom = only.id;
      const fedAlready = s.doc.cables.filter((c) => c.from === only.id).length;
      const size = NODE_SIZE[only.kind];
      position = {
        x: only.position.x + size.width / 2 - 48 + fedAlready * 128,
        y: only.position.y + size.height + 112,
      };
    } else if (onPlan) {
      position = belowDiagram(s.doc.nodes);
    } else {
      const c = canvas()?.viewCentre() ?? { x: 0, y: 0 };
      position = { x: c.x - 48, y: c.y - 40 };
    }
  }
  const built = buildNode(s.doc, part, snap(position));
  const node = onPlan ? { ...built, plan: freePlanPoint(s.doc.nodes, onPlan.point) } : built;
  const measure =
    onPlan && feedFrom && onPlan.allowanceM !== null ? { routeAllowanceM: onPlan.allowanceM } : {};
  const out = s.dispatch({ type: 'addNode', node, ...(feedFrom ? { feedFrom, ...measure } : {}) });
  // Loads hung off a board keep the board selected, so the next click hangs another one there;
  // a new board or junction becomes the place to hang the next parts from.
  if (out.ok) s.setSelection(feedFrom && node.kind === 'load' ? [feedFrom] : [node.id]);
  // A part added below the selected board may land off screen: bring it into view, so every
  // click is seen to do something.
  if (out.ok && !at && !onPlan) canvas()?.reveal?.({ ...node.position, ...NODE_SIZE[node.kind] });
}

export function deleteSelection(): void {
  const s = store.getState();
  if (s.selection.length > 0) s.dispatch({ type: 'deleteElements', ids: s.selection });
}

export function copy(): void {
  const s = store.getState();
  const n = copySelection(s.doc, s.selection);
  if (n === 0) s.notify('Select one or more elements to copy.');
}

export function cut(): void {
  const s = store.getState();
  if (copySelection(s.doc, s.selection) > 0) deleteSelection();
}

export function paste(): void {
  const s = store.getState();
  const c = takeClip();
  if (!c) {
    s.notify('Nothing to paste: copy some elements first.');
    return;
  }
  const step = GRID * 2 * c.step;
  s.dispatch({ type: 'pasteElements', nodes: c.nodes, cables: c.cables, offset: { x: step, y: step } });
}

export function duplicate(): void {
  const s = store.getState();
  if (copySelection(s.doc, s.selection) > 0) paste();
}

export function selectAll(): void {
  const { doc, setSelection } = store.getState();
  setSelection([...doc.nodes.map((n) => n.id), ...doc.cables.map((c) => c.id)]);
}

export function nudge(dx: number, dy: number): void {
  const s = store.getState();
  const ids = new Set(s.selection);
  const moves = s.doc.nodes
    .filter((n) => ids.has(n.id))
    .map((n) => ({ id: n.id, position: { x: n.position.x + dx, y: n.position.y + dy } }));
  if (moves.length > 0) s.dispatch({ type: 'moveNodes', moves });
}

export function tidy(): void {
  const out = store.getState().dispatch({ type: 'tidyLayout' });
  if (out.ok) requestAnimationFrame(() => canvas()?.fitView());
}

/** Selects a load's path from the supply: its cables and the nodes along it. */
export function selectPath(id: Id): void {
  const s = store.getState();
  const r = s.results.nodes[id];
  if (!r || r.path.length === 0) {
    s.notify('This element is not fed from a supply, so it has no path.');
    return;
  }
  const nodes = new Set<Id>([id]);
  for (const cid of r.path) {
    const c = s.doc.cables.find((x) => x.id === cid);
    if (c) {
      nodes.add(c.from);
      nodes.add(c.to);
    }
  }
  s.setSelection([...nodes, ...r.path]);
}

/** Replaces a cable by two through a new junction, halfway; the lengths are edited afterwards. */
export function splitWithJunction(id: Id): void {
  const s = store.getState();
  const out = s.dispatch({ type: 'splitCable', id });
  if (!out.ok) return;
  const [junctionId, onwardId] = out.created;
  const up = out.doc.cables.find((c) => c.id === id);
  const onward = out.doc.cables.find((c) => c.id === onwardId);
  if (!junctionId || !up || !onward) return;
  s.setSelection([junctionId]);
  s.notify(
    `${id} now runs ${up.lengthM} m to junction ${junctionId}, then ${onwardId} ${onward.lengthM} m on; select either cable to set its length.`,
  );
}
