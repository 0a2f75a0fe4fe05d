import { useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import type { Settings } from '../../model/types.ts';
import { Dialog } from './Dialog.tsx';
import { ElementForm } from './ElementForm.tsx';
import { changed } from './ProjectDialog.tsx';
import { SETTINGS_FIELDS } from './projectFields.ts';

/** Limits, voltages and the close-to-limit threshold; saved together as one undo step. */
export function SettingsDialog() {
  const open = useEditor((s) => s.view.dialog === 'settings');
  if (!open) return null;
  return <SettingsForm />;
}

function SettingsForm() {
  const settings = useEditor((s) => s.doc.settings);
  const profile = useEditor((s) => s.results.profile);
  const dispatch = useEditor((s) => s.dispatch);
  const close = useEditor((s) => s.closeDialog);
  const [draft, setDraft] = useState<Settings>(settings);
  const [error, setError] = useState<string | null>(null);
  const save = () => {
    const patch = changed(settings, draft);
    if (Object.keys(patch).length > 0) {
      const out = dispatch({ type: 'updateSettings', patch });
      if (!out.ok) return setError(out.error);
    }
    close();
  };
  return (
    <Dialog
      title="Settings"
      testId="settings-dialog"
      onClose={close}
      wide
      footer={
        <>
          {error && <span className="dl-reason">{error}</span>}
          <button type="button" onClick={close}>
            Cancel
          </button>
          <button type="button" className="dl-primary" onClick={save} data-testid="settings-save">
            Save settings
          </button>
        </>
      }
    >
      <p className="dl-hint">
        Limits in use now: {profile.title}
        {profile.source ? ` (${profile.source})` : ''}.
      </p>
      <ElementForm
        groups={SETTINGS_FIELDS}
        element={draft}
        owner="the settings"
        onCommit={(patch) => {
          setDraft((d) => ({ ...d, ...patch }));
          return undefined;
        }}
      />
    </Dialog>
  );
}
