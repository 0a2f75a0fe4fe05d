import { PARTS, PART_MIME, type PartInfo } from '../parts.ts';
import { addPart } from '../actions.ts';
import { BoardSymbol, JunctionSymbol, LoadSymbol, SupplySymbol } from '../canvas/symbols.tsx';

function PartIcon({ info }: { info: PartInfo }) {
  if (info.loadKind) return <LoadSymbol kind={info.loadKind} size={28} />;
  if (info.part === 'supply') return <SupplySymbol size={28} />;
  if (info.part === 'board') return <BoardSymbol size={28} />;
  return <JunctionSymbol size={28} />;
}

/** The parts tray: drag a part onto the canvas, or click it to place it (below a selected board, fed from it). */
export function Tray() {
  const groups = [...new Set(PARTS.map((p) => p.group))];
  return (
    <aside className="ed-tray" aria-label="Parts" data-testid="tray">
      <h2 className="ed-tray-title">Parts</h2>
      {groups.map((g) => (
        <section key={g}>
          <h3>{g}</h3>
          <ul>
            {PARTS.filter((p) => p.group === g).map((p) => (
              <li key={p.part}>
                <button
                  type="button"
                  draggable
                  className="ed-part"
                  data-testid={`part-${p.part}`}
                  title={`${p.title}: drag onto the diagram, or click to add (fed from the selected board; placed on the site plan too while it is shown)`}
                  onDragStart={(e) => {
                    e.dataTransfer.setData(PART_MIME, p.part);
                    e.dataTransfer.effectAllowed = 'copy';
                  }}
                  onClick={() => addPart(p.part)}
                >
                  <PartIcon info={p} />
                  <span>{p.title}</span>
                </button>
              </li>
            ))}
          </ul>
        </section>
      ))}
      <p className="ed-tray-hint">
        Draw a cable by dragging from the dot under an element to the one above another.
      </p>
    </aside>
  );
}
