import { STATUS_LOOK } from '../../export/statusLook.ts';
import type { Status } from '../../solver/results.ts';
import { useEditor } from '../../store/editorStore.ts';
import { statusBasis } from '../canvas/labels.ts';

const ORDER: (Status | 'none')[] = ['within', 'close', 'over', 'none'];

/** The key to the status styling, always on screen: word, glyph, colour and line style together. */
export function StatusKey() {
  const basis = statusBasis(useEditor((s) => s.view.labelMode));
  return (
    <div className="ed-key" aria-label="Status key" data-testid="status-key">
      {ORDER.map((s) => {
        const look = STATUS_LOOK[s];
        return (
          <span key={s} className="ed-key-item" title={look.meaning}>
            <svg width="30" height="10" aria-hidden="true">
              <line
                x1="1"
                y1="5"
                x2="29"
                y2="5"
                stroke={look.colour}
                strokeWidth={look.strokeWidth}
                strokeDasharray={look.dash || undefined}
              />
            </svg>
            <span style={{ color: look.colour }}>{look.glyph}</span> {look.word}
          </span>
        );
      })}
      <span className="ed-key-note" title={basis.long} data-testid="status-basis">
        {basis.short}
      </span>
    </div>
  );
}
