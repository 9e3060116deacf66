import { useEffect, useId, useRef } from 'react';
import type { ReactNode } from 'react';

interface DialogProps {
  title: string;
  open: boolean;
  onClose(): void;
  children: ReactNode;
  actions?: ReactNode;
  wide?: boolean;
}

/** A modal dialog on the native element: focus stays inside, Escape closes, focus returns where it was. */
export function Dialog({ title, open, onClose, children, actions, wide }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref} className={`dialog${wide ? ' dialog--wide' : ''}`} aria-labelledby={titleId}
      onCancel={(e) => { e.preventDefault(); onClose(); }}
    >
      {open ? (
        <>
          <header className="dialog__head">
            <h2 id={titleId}>{title}</h2>
            <button type="button" className="button button--quiet" onClick={onClose} aria-label={`Close ${title}`}>✕</button>
          </header>
          <div className="dialog__body">{children}</div>
          {actions ? <footer className="dialog__actions">{actions}</footer> : null}
        </>
      ) : null}
    </dialog>
  );
}
