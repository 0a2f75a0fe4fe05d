import { useEffect, useRef, type ReactNode } from 'react';
import './panels.css';
import './dialogs.css';

interface Props {
  title: string;
  testId: string;
  onClose: () => void;
  children: ReactNode;
  footer?: ReactNode;
  wide?: boolean;
  /** False hides the close button, for a dialog that must be answered (the first cautions). */
  closable?: boolean;
}

/** A modal frame: a title, a body, a footer of actions; Escape and the backdrop close it. */
export function Dialog({ title, testId, onClose, children, footer, wide, closable = true }: Props) {
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const prev = document.activeElement as HTMLElement | null;
    box.current?.focus();
    return () => prev?.focus?.();
  }, []);
  return (
    <div
      className="dl-panel dl-backdrop"
      onMouseDown={(e) => {
        if (e.target === e.currentTarget) onClose();
      }}
    >
      <div
        ref={box}
        className={`dl-dialog${wide ? ' dl-dialog-wide' : ''}`}
        role="dialog"
        aria-modal="true"
        aria-labelledby={`${testId}-title`}
        data-testid={testId}
        tabIndex={-1}
        onKeyDown={(e) => {
          // Keep the editor's own shortcuts (delete, undo) from acting on the diagram behind.
          e.stopPropagation();
          if (e.key === 'Escape') onClose();
        }}
      >
        <header className="dl-dialog-head">
          <h2 id={`${testId}-title`}>{title}</h2>
          {closable && (
            <button type="button" className="dl-close" onClick={onClose} aria-label="Close">
              ×
            </button>
          )}
        </header>
        <div className="dl-dialog-body">{children}</div>
        {footer && <footer className="dl-dialog-foot">{footer}</footer>}
      </div>
    </div>
  );
}
