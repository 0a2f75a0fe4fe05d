import { useRef } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { canvas } from '../canvasApi.ts';
import { tidy } from '../actions.ts';
import { newDocument, openFile, saveProject } from '../files/fileActions.ts';
import { shortcutText } from '../shortcuts.ts';

function Btn(props: {
  label: string;
  onClick: () => void;
  keys?: string;
  disabled?: boolean;
  testId?: string;
  pressed?: boolean;
  /** A longer explanation for the tooltip. */
  hint?: string;
}) {
  return (
    <button
      type="button"
      className="ed-btn"
      onClick={props.onClick}
      disabled={props.disabled}
      title={props.hint ?? (props.keys ? `${props.label} (${props.keys})` : props.label)}
      data-testid={props.testId}
      aria-pressed={props.pressed}
    >
      {props.label}
    </button>
  );
}

export function TopBar() {
  const title = useEditor((s) => s.doc.details.title);
  const fileName = useEditor((s) => s.fileName);
  const canUndo = useEditor((s) => s.canUndo);
  const canRedo = useEditor((s) => s.canRedo);
  const view = useEditor((s) => s.view);
  const findings = useEditor((s) => s.results.findings.length);
  const alternatives = useEditor((s) => s.doc.alternatives.length);
  const undo = useEditor((s) => s.undo);
  const redo = useEditor((s) => s.redo);
  const openDrawer = useEditor((s) => s.openDrawer);
  const openDialog = useEditor((s) => s.openDialog);
  const input = useRef<HTMLInputElement>(null);

  return (
    <header className="ed-topbar">
      <div className="ed-brand" aria-label="Dropline">
        <svg width="22" height="22" viewBox="0 0 22 22" aria-hidden="true">
          <path
            d="M3 4 H19 M11 4 V18 M6 18 H16"
            stroke="#17707d"
            strokeWidth="2.4"
            fill="none"
            strokeLinecap="round"
          />
          <circle cx="11" cy="11" r="2.6" fill="#b06f00" />
        </svg>
        <span>Dropline</span>
      </div>
      <div className="ed-doc-title" title={`${title}\n${fileName ?? 'not saved to a file yet'}`}>
        <strong data-testid="project-title">{title}</strong>
        <span>{fileName ?? 'unsaved file · kept in this browser'}</span>
      </div>
      <nav className="ed-group" aria-label="File">
        <Btn label="New" onClick={newDocument} testId="file-new" />
        <Btn
          label="Open…"
          onClick={() => input.current?.click()}
          keys={shortcutText('open')}
          testId="file-open"
        />
        <Btn
          label="Save"
          onClick={() => void saveProject(false)}
          keys={shortcutText('save')}
          testId="file-save"
        />
        <Btn label="Save as…" onClick={() => void saveProject(true)} keys={shortcutText('saveAs')} />
        <Btn
          label="Tender pack"
          hint="The tender pack (PDF, A3): diagram, summary and cautions, schedules, findings and the working behind every figure"
          onClick={() => openDialog('pack')}
          testId="export-pack"
        />
        <input
          ref={input}
          type="file"
          accept=".json,application/json"
          hidden
          data-testid="open-file-input"
          onChange={(e) => {
            const f = e.target.files?.[0];
            if (f) void openFile(f);
            e.target.value = '';
          }}
        />
      </nav>
      <nav className="ed-group" aria-label="Edit">
        <Btn label="Undo" onClick={undo} disabled={!canUndo} keys={shortcutText('undo')} testId="undo" />
        <Btn label="Redo" onClick={redo} disabled={!canRedo} keys={shortcutText('redo')} testId="redo" />
        <Btn label="Tidy" onClick={tidy} keys={shortcutText('tidy')} testId="tidy" />
        <Btn label="Fit" onClick={() => canvas()?.fitView()} keys={shortcutText('fit')} />
      </nav>
      <nav className="ed-group ed-views" aria-label="Views">
        <Btn
          label="Schedules"
          pressed={view.drawer === 'schedules'}
          onClick={() => openDrawer(view.drawer === 'schedules' ? null : 'schedules')}
          testId="open-schedules"
        />
        <Btn
          label={`Findings${findings ? ` (${findings})` : ''}`}
          pressed={view.drawer === 'findings'}
          onClick={() => openDrawer(view.drawer === 'findings' ? null : 'findings')}
          testId="open-findings"
        />
        <Btn label="Project" onClick={() => openDialog('project')} testId="open-project" />
        <Btn label="Settings" onClick={() => openDialog('settings')} testId="open-settings" />
        <Btn label="Sizing" onClick={() => openDialog('sizing')} testId="open-sizing" />
        <Btn
          label={`Alternatives${alternatives ? ` (${alternatives})` : ''}`}
          hint="Keep the design under a name, compare designs side by side, open one on the canvas"
          onClick={() => openDialog('alternatives')}
          testId="open-alternatives"
        />
        <Btn label="Cautions" onClick={() => openDialog('cautions')} testId="open-cautions" />
        <Btn label="Help" onClick={() => openDialog('help')} keys="?" testId="open-help" />
      </nav>
    </header>
  );
}
