import { memo } from 'react';
import { Handle, Position, type NodeProps } from '@xyflow/react';
import type { ElementFlowNode } from './flowTypes.ts';
import { JunctionSymbol, LoadSymbol, SupplySymbol, TransformerSymbol, loadTitle } from './symbols.tsx';
import { statusLook } from '../../export/statusLook.ts';
import type { Status } from '../../solver/results.ts';

/** The line voltage a three-phase system of this U0 is named by (400/230 V), as on nameplates. */
const NOMINAL_LINE_V: Record<number, number> = { 127: 220, 220: 380, 230: 400, 240: 415, 277: 480 };
function nominalLineVolts(u0V: number): number {
  return NOMINAL_LINE_V[u0V] ?? Math.round(u0V * Math.sqrt(3));
}

function Badge({
  status,
  label,
  detail,
  feeds = false,
  setBy = null,
}: {
  status: Status | null;
  label: string;
  detail: number;
  /** A board's status is that of the worst load it feeds, not of its own figure. */
  feeds?: boolean;
  /** The load that sets a board's close or over status, with its drop ("L27 5.90 %"). */
  setBy?: string | null;
}) {
  const look = statusLook(status);
  const title = !feeds
    ? `${look.word}: ${look.meaning}`
    : setBy
      ? `${look.word}: load ${setBy} is the worst fed from here, and it is ${look.meaning}; the first figure is this point's own drop from the origin`
      : `${look.word}: the worst load fed from here is ${look.meaning}; the figure is this point's own drop from the origin`;
  const text = label && setBy ? `${label} · ${setBy}` : label;
  return (
    <span
      className={`ed-badge ed-badge-${status ?? 'none'}`}
      style={{ color: look.colour, background: look.tint, borderColor: look.colour }}
      title={title}
      data-testid="node-badge"
    >
      <span aria-hidden="true">{look.glyph}</span>
      {detail > 0 && text ? (
        <span className="ed-badge-text">{text}</span>
      ) : (
        <span className="ed-sr">{look.word}</span>
      )}
    </span>
  );
}

function ElementNodeView({ data, selected }: NodeProps<ElementFlowNode>) {
  const { element, status, label, detail, problem, setBy } = data;
  const cls = `ed-node ed-node-${element.kind}${selected ? ' is-selected' : ''}${problem ? ' has-problem' : ''}`;
  return (
    <div
      className={cls}
      data-testid={`node-${element.id}`}
      data-status={status ?? 'none'}
      title={problem ?? element.name}
    >
      {element.kind !== 'supply' && (
        <Handle type="target" position={Position.Top} id="in" className="ed-handle" />
      )}
      {element.kind === 'supply' && (
        <>
          <span className="ed-symbol">{element.transformer ? <TransformerSymbol /> : <SupplySymbol />}</span>
          {detail > 0 && (
            <span className="ed-side-text">
              <strong>{element.name}</strong>
              <span>
                {element.phases === 3
                  ? `3~ ${nominalLineVolts(element.u0V)}/${element.u0V}`
                  : `1~ ${element.u0V}`}{' '}
                V {element.earthing}
              </span>
            </span>
          )}
        </>
      )}
      {element.kind === 'board' && (
        <>
          <span className="ed-busbar" />
          <span className="ed-board-name">{detail > 0 ? element.name : ''}</span>
          <span className="ed-board-foot">
            <Badge status={status} label={label} detail={detail} feeds setBy={setBy} />
          </span>
        </>
      )}
      {element.kind === 'junction' && (
        <span className="ed-symbol">
          <JunctionSymbol size={16} />
        </span>
      )}
      {element.kind === 'load' && (
        <>
          <span className="ed-symbol" aria-label={loadTitle(element.loadKind)}>
            <LoadSymbol kind={element.loadKind} size={36} />
          </span>
          {detail > 0 && <span className="ed-load-name">{element.name}</span>}
          <Badge status={status} label={label} detail={detail} />
        </>
      )}
      {element.kind !== 'load' && (
        <Handle type="source" position={Position.Bottom} id="out" className="ed-handle" />
      )}
    </div>
  );
}

export const ElementNode = memo(ElementNodeView);
