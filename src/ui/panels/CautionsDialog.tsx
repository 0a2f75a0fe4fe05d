import { useEffect } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { CAUTIONS, STANDARD_EDITIONS } from '../../model/cautions.ts';
import { Dialog } from './Dialog.tsx';

/**
 * The cautions: shown by itself at first start until acknowledged once (the store remembers it in
 * localStorage), and reachable at any time through the 'cautions' dialog.
 */
export function CautionsDialog() {
  const open = useEditor((s) => s.view.dialog === 'cautions');
  const acknowledged = useEditor((s) => s.cautionsAcknowledged);
  const openDialog = useEditor((s) => s.openDialog);
  const acknowledge = useEditor((s) => s.acknowledgeCautions);
  const close = useEditor((s) => s.closeDialog);
  const dataSet = useEditor((s) => s.results.dataSet);
  const profile = useEditor((s) => s.results.profile);
  const references = useEditor((s) => s.results.references);

  useEffect(() => {
    if (!acknowledged) openDialog('cautions');
  }, [acknowledged, openDialog]);

  if (!open) return null;
  // Until acknowledged, only the button closes it: Escape or a stray click must not skip the cautions.
  const dismiss = acknowledged ? close : acknowledge;
  const onClose = acknowledged ? close : () => undefined;
  const editions = references.length > 0 ? references : STANDARD_EDITIONS;
  return (
    <Dialog
      title="Before you rely on these figures"
      testId="cautions-dialog"
      onClose={onClose}
      closable={acknowledged}
      footer={
        <button type="button" className="dl-primary" onClick={dismiss} data-testid="cautions-ok">
          {acknowledged ? 'Close' : 'I understand'}
        </button>
      }
    >
      <ul className="dl-cautions">
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <h3>Standards and data used</h3>
      <ul className="dl-cautions">
        {editions.map((e) => (
          <li key={e}>{e}</li>
        ))}
        {dataSet.id !== 'none' && (
          <li>
            Conductor data: {dataSet.title}
            {dataSet.source ? ` (${dataSet.source})` : ''}
          </li>
        )}
        {profile.id !== 'none' && (
          <li>
            Drop limits: {profile.title}
            {profile.source ? ` (${profile.source})` : ''}
          </li>
        )}
      </ul>
    </Dialog>
  );
}
