import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A modal dialog on the native <dialog>: showModal() makes the rest of the page inert (focus stays inside)
 * and Escape cancels. Focus goes back to whatever had it before the dialog opened.
 */
export function Dialog({ open, title, children, footer, onClose }: { open: boolean; title: ReactNode; children: ReactNode; footer?: ReactNode; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const opener = useRef<Element | null>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      opener.current = document.activeElement;
      d.showModal();
    }
    if (!open && d.open) {
      d.close();
      if (opener.current instanceof HTMLElement && opener.current.isConnected) opener.current.focus();
    }
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      onClick={(e) => e.target === ref.current && onClose()}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-card bg-surface p-0 text-ink-soft shadow-card ring-1 ring-line backdrop:bg-black/50"
    >
      {open ? (
        <div className="p-5">
          <h2 id={titleId} className="text-lg font-extrabold text-ink">{title}</h2>
          <div className="mt-2 space-y-2">{children}</div>
          {footer ? <div className="mt-5 flex flex-wrap justify-end gap-2">{footer}</div> : null}
        </div>
      ) : null}
    </dialog>
  );
}
