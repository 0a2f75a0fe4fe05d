import { memo } from 'react';
import { BaseEdge, EdgeLabelRenderer, getSmoothStepPath, type EdgeProps } from '@xyflow/react';
import type { CableFlowEdge } from './flowTypes.ts';
import { statusLook } from '../status.ts';

function CableEdgeView(props: EdgeProps<CableFlowEdge>) {
  const { id, sourceX, sourceY, targetX, targetY, sourcePosition, targetPosition, data, selected } = props;
  const [path] = getSmoothStepPath({
    sourceX,
    sourceY,
    sourcePosition,
    targetX,
    targetY,
    targetPosition,
    borderRadius: 6,
  });
  const look = statusLook(data?.status);
  const style = {
    stroke: look.colour,
    strokeWidth: look.strokeWidth + (selected ? 1.5 : 0),
    strokeDasharray: look.dash || undefined,
  };
  return (
    <>
      {selected && <path d={path} className="ed-edge-halo" />}
      <BaseEdge id={id} path={path} style={style} interactionWidth={14} />
      {data?.showLabel && data.lines.length > 0 && (
        <EdgeLabelRenderer>
          <div
            className={`ed-edge-label${selected ? ' is-selected' : ''}`}
            data-testid={`cable-label-${id}`}
            style={{
              transform: `translate(-50%, -100%) translate(${targetX}px, ${targetY - 14}px)`,
              borderColor: look.colour,
            }}
          >
            <span className="ed-edge-name">{data.cable.name}</span>
            {data.lines.slice(0, data.detail === 2 ? data.lines.length : 1).map((line, i) => (
              <span key={i} className="ed-edge-line">
                {i === data.lines.length - 1 && data.detail === 2 ? (
                  <span style={{ color: look.colour }} aria-label={look.word}>
                    {look.glyph}{' '}
                  </span>
                ) : null}
                {line}
              </span>
            ))}
          </div>
        </EdgeLabelRenderer>
      )}
    </>
  );
}

export const CableEdge = memo(CableEdgeView);
