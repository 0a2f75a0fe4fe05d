import { useEffect } from 'react';
import { useEditor } from '../../store/editorStore.ts';

/** The last message from the editor (a refused command, a saved file); errors stay until dismissed. */
export function NoticeBar() {
  const notice = useEditor((s) => s.notice);
  const dismiss = useEditor((s) => s.dismissNotice);
  useEffect(() => {
    if (!notice || notice.kind === 'error') return;
    const t = setTimeout(dismiss, 5000);
    return () => clearTimeout(t);
  }, [notice, dismiss]);
  if (!notice) return null;
  return (
    <div
      className={`ed-notice is-${notice.kind}`}
      role={notice.kind === 'error' ? 'alert' : 'status'}
      data-testid="notice"
    >
      <span>{notice.text}</span>
      <button type="button" onClick={dismiss} aria-label="Dismiss message">
        ×
      </button>
    </div>
  );
}
