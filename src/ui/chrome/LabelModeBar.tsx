import { useEditor } from '../../store/editorStore.ts';
import { LABEL_MODES, type LabelMode } from '../../store/viewTypes.ts';

const MODE_TITLES: Record<LabelMode, string> = {
  drop: 'Drop',
  current: 'Current',
  zs: 'Zs',
  fault: 'Fault',
  capacity: 'Capacity',
};

/** Chooses what the live labels on the diagram show; sits on the canvas, next to what it changes. */
export function LabelModeBar() {
  const view = useEditor((s) => s.view);
  const setLabelMode = useEditor((s) => s.setLabelMode);
  const setShowLabels = useEditor((s) => s.setShowLabels);
  const setCanvasView = useEditor((s) => s.setCanvasView);
  const views = (
    <span role="group" aria-label="Canvas shows" className="ed-canvas-views">
      {(['diagram', 'plan'] as const).map((v) => (
        <button
          key={v}
          type="button"
          className={`ed-seg${view.canvas === v ? ' is-on' : ''}`}
          aria-pressed={view.canvas === v}
          data-testid={`canvas-${v}`}
          title={
            v === 'diagram'
              ? 'The single-line diagram'
              : 'The site plan: where the boards and loads stand, and cable lengths measured there'
          }
          onClick={() => setCanvasView(v)}
        >
          {v === 'diagram' ? 'Diagram' : 'Site plan'}
        </button>
      ))}
    </span>
  );
  if (view.canvas === 'plan')
    return (
      <div className="ed-labels" role="group" aria-label="Canvas">
        {views}
      </div>
    );
  return (
    <div className="ed-labels" role="group" aria-label="Labels show">
      {views}
      <span className="ed-group-caption">Labels</span>
      {LABEL_MODES.map((m) => (
        <button
          key={m}
          type="button"
          className={`ed-seg${view.labelMode === m && view.showLabels ? ' is-on' : ''}`}
          aria-pressed={view.labelMode === m && view.showLabels}
          data-testid={`label-mode-${m}`}
          onClick={() => {
            setLabelMode(m);
            setShowLabels(true);
          }}
        >
          {MODE_TITLES[m]}
        </button>
      ))}
      <button
        type="button"
        className={`ed-seg${!view.showLabels ? ' is-on' : ''}`}
        aria-pressed={!view.showLabels}
        data-testid="labels-off"
        onClick={() => setShowLabels(!view.showLabels)}
      >
        Off
      </button>
    </div>
  );
}
