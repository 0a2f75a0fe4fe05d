import { useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import type { ProjectDetails } from '../../model/types.ts';
import { Dialog } from './Dialog.tsx';
import { ElementForm } from './ElementForm.tsx';
import { DETAILS_FIELDS } from './projectFields.ts';

function changed<T extends object>(before: T, after: T): Partial<T> {
  const patch: Partial<T> = {};
  for (const k of Object.keys(after) as (keyof T)[]) {
    if (JSON.stringify(after[k]) !== JSON.stringify(before[k])) patch[k] = after[k];
  }
  return patch;
}

/** The project's details (title block fields); saved together as one undo step. */
export function ProjectDialog() {
  const open = useEditor((s) => s.view.dialog === 'project');
  if (!open) return null;
  return <ProjectForm />;
}

function ProjectForm() {
  const details = useEditor((s) => s.doc.details);
  const dispatch = useEditor((s) => s.dispatch);
  const close = useEditor((s) => s.closeDialog);
  const [draft, setDraft] = useState<ProjectDetails>(details);
  const [error, setError] = useState<string | null>(null);
  const save = () => {
    const patch = changed(details, draft);
    if (Object.keys(patch).length > 0) {
      const out = dispatch({ type: 'updateDetails', patch });
      if (!out.ok) return setError(out.error);
    }
    close();
  };
  return (
    <Dialog
      title="Project details"
      testId="project-dialog"
      onClose={close}
      footer={
        <>
          {error && <span className="dl-reason">{error}</span>}
          <button type="button" onClick={close}>
            Cancel
          </button>
          <button type="button" className="dl-primary" onClick={save} data-testid="project-save">
            Save details
          </button>
        </>
      }
    >
      <ElementForm
        groups={DETAILS_FIELDS}
        element={draft}
        owner="the project"
        onCommit={(patch) => {
          setDraft((d) => ({ ...d, ...patch }));
          return undefined;
        }}
      />
    </Dialog>
  );
}

export { changed };
