import { useEditor } from '../../store/editorStore.ts';
import { GESTURES, SHORTCUTS } from '../shortcuts.ts';
import { Dialog } from './Dialog.tsx';

/** The keyboard shortcuts and mouse gestures, from the same list the key handler uses. */
export function HelpOverlay() {
  const open = useEditor((s) => s.view.dialog === 'help');
  const close = useEditor((s) => s.closeDialog);
  if (!open) return null;
  return (
    <Dialog title="Keys and gestures" testId="help-overlay" onClose={close} wide>
      <div style={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: '0 24px' }}>
        <section>
          <h3>Keyboard</h3>
          <table className="dl-keys">
            <tbody>
              {SHORTCUTS.map((s) => (
                <tr key={s.id} data-shortcut={s.id}>
                  <td style={{ width: '42%' }}>
                    {s.keys.split(' or ').map((k, i) => (
                      <span key={k}>
                        {i > 0 && <span className="dl-hint"> or </span>}
                        <kbd>{k}</kbd>
                      </span>
                    ))}
                  </td>
                  <td>{s.what}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
        <section>
          <h3>Mouse</h3>
          <table className="dl-keys">
            <tbody>
              {GESTURES.map((g) => (
                <tr key={g.gesture}>
                  <td style={{ width: '45%' }}>{g.gesture}</td>
                  <td>{g.what}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      </div>
    </Dialog>
  );
}
