import { memo } from 'react';
import { BaseEdge, EdgeLabelRenderer, getSmoothStepPath, type EdgeProps } from '@xyflow/react';
import type { CableFlowEdge } from './flowTypes.ts';
import { statusLook } from '../../export/statusLook.ts';

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
            className={`ed-edge-label${selected ? ' is-selected' : ''}${data.detail < 2 ? ' is-short' : ''}`}
            data-testid={`cable-label-${id}`}
            title={data.title}
            style={{
              transform:
                data.labelSide === 'beside'
                  ? // Beside the junction dot, on the side away from the sending end, its foot level
                    // with the dot's, so it clears the label above the next element down.
                    sourceX >= targetX
                    ? `translate(-100%, -100%) translate(${targetX - 12}px, ${targetY + 16}px)`
                    : `translate(0, -100%) translate(${targetX + 12}px, ${targetY + 16}px)`
                  : `translate(-50%, -100%) translate(${targetX}px, ${targetY - 6 - data.raisePx}px)`,
              borderColor: look.colour,
            }}
          >
            {data.detail === 2 ? (
              <>
                <span className="ed-edge-name">{data.heading}</span>
                {data.lines.map((line, i) => (
                  <span key={i} className="ed-edge-line">
                    {i === data.lines.length - 1 ? (
                      <span style={{ color: look.colour }} aria-label={look.word}>
                        {look.glyph}{' '}
                      </span>
                    ) : null}
                    {line}
                  </span>
                ))}
              </>
            ) : (
              <span className="ed-edge-line">
                <span style={{ color: look.colour }} aria-label={look.word}>
                  {look.glyph}{' '}
                </span>
                {data.short}
              </span>
            )}
          </div>
        </EdgeLabelRenderer>
      )}
    </>
  );
}

export const CableEdge = memo(CableEdgeView);
