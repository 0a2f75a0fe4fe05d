/** The plan's node and edge views: the picture, an element's marker, a route's bend, a cable along its route. */
import { BaseEdge, EdgeLabelRenderer, Handle, Position, type EdgeProps, type NodeProps } from '@xyflow/react';
import { statusLook } from '../../export/statusLook.ts';
import { fmt } from '../../export/format.ts';
import type { BendNode, MarkerNode, PictureNode, PlanEdge } from './planFlow.ts';

const KIND_MARK: Record<string, string> = { supply: 'S', board: 'DB', junction: 'J', load: 'L' };

export function PictureView({ data }: NodeProps<PictureNode>) {
  return (
    <img
      className="pl-picture"
      src={data.image}
      alt="Site plan"
      style={{ width: data.widthPx }}
      draggable={false}
    />
  );
}

export function MarkerView({ data, selected }: NodeProps<MarkerNode>) {
  const el = data.element;
  const look = statusLook(data.status);
  return (
    <div
      className={`pl-marker pl-${el.kind}${selected ? ' is-selected' : ''}`}
      style={{ borderColor: look.colour }}
      title={`${el.kind} ${el.id} ${el.name}${data.status ? ` (${look.word})` : ''}`}
      data-testid={`plan-marker-${el.id}`}
    >
      <Handle type="target" position={Position.Top} className="pl-handle" isConnectable={false} />
      <span aria-hidden="true">{KIND_MARK[el.kind]}</span>
      <Handle type="source" position={Position.Bottom} className="pl-handle" isConnectable={false} />
      <div className="pl-tag">
        <strong>{el.id}</strong>
        {el.kind !== 'load' && ` ${el.name}`}
        {data.cumulativePct !== null && (
          <span style={{ color: look.colour }}>
            {' '}
            {look.glyph} Σ {fmt(data.cumulativePct, 2)} %
          </span>
        )}
      </div>
    </div>
  );
}

export function BendView({ data }: NodeProps<BendNode>) {
  return (
    <div
      className="pl-bend"
      title={`Bend ${data.index + 1} of cable ${data.cableId}: drag to move it, double-click to take it away`}
      data-testid={`plan-bend-${data.cableId}-${data.index}`}
    />
  );
}

/** The SVG path of a route: from the start, each leg along x, then y, through every point. */
export function routePath(
  start: { x: number; y: number },
  points: readonly { x: number; y: number }[],
): string {
  let d = `M ${start.x} ${start.y}`;
  let y = start.y;
  for (const p of points) {
    d += ` L ${p.x} ${y} L ${p.x} ${p.y}`;
    y = p.y;
  }
  return d;
}

export function PlanCableView({
  id,
  sourceX,
  sourceY,
  targetX,
  targetY,
  data,
  selected,
}: EdgeProps<PlanEdge>) {
  if (!data) return null;
  // Both handles sit at the markers' centres, the plan points; the bends lie between.
  const sy = sourceY;
  const path = routePath({ x: sourceX, y: sy }, [...data.bends, { x: targetX, y: targetY }]);
  // The label sits on the first leg.
  const firstX = data.bends[0]?.x ?? targetX;
  const look = statusLook(data.status);
  const measured = data.cable.route !== undefined;
  const text = measured
    ? `${id} · ${fmt(data.cable.lengthM, 1)} m`
    : `${id} · typed ${fmt(data.cable.lengthM, 1)} m (plan ${fmt(data.distanceM, 1)} m)`;
  return (
    <>
      <BaseEdge
        id={id}
        path={path}
        style={{
          stroke: measured ? look.colour : '#8a949c',
          strokeWidth: selected ? 4 : measured ? look.strokeWidth : 1.5,
          strokeDasharray: measured ? look.dash : '3 4',
        }}
      />
      {data.labelled && (
        <EdgeLabelRenderer>
          <div
            className={`pl-cable-label${measured ? '' : ' is-typed'}`}
            style={{
              transform: `translate(-50%, -100%) translate(${(sourceX + firstX) / 2}px, ${sy - 2}px)`,
            }}
            data-testid={`plan-cable-${id}`}
          >
            {text}
          </div>
        </EdgeLabelRenderer>
      )}
    </>
  );
}
