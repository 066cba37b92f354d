import { useEffect, useId, useRef, type KeyboardEvent, type ReactNode } from 'react';

const FOCUSABLE =
  'button:not([disabled]), [href], input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

/** showModal() keeps focus off the page behind, but Tab past the last button would leave for the browser's own bar. */
function keepTabInside(dialog: HTMLDialogElement, e: KeyboardEvent<HTMLDialogElement>) {
  const items = [...dialog.querySelectorAll<HTMLElement>(FOCUSABLE)];
  const first = items[0];
  const last = items[items.length - 1];
  if (!first || !last) return;
  if (e.shiftKey && document.activeElement === first) {
    e.preventDefault();
    last.focus();
  } else if (!e.shiftKey && document.activeElement === last) {
    e.preventDefault();
    first.focus();
  }
}

/**
 * A modal dialog on the native <dialog>: showModal() makes the rest of the page inert (focus stays inside)
 * and Escape cancels; Tab cycles through the dialog's own controls. Focus goes back to whatever had it before the dialog opened.
 */
export function Dialog({
  open,
  title,
  children,
  footer,
  onClose,
}: {
  open: boolean;
  title: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
  onClose: () => void;
}) {
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
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      // However it closed (our close(), or the browser's own Escape handling), focus goes back to the opener.
      onClose={() => {
        if (opener.current instanceof HTMLElement && opener.current.isConnected) opener.current.focus();
        if (open) onClose();
      }}
      onClick={(e) => e.target === ref.current && onClose()}
      onKeyDown={(e) => e.key === 'Tab' && ref.current && keepTabInside(ref.current, e)}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-card bg-surface p-0 text-ink-soft shadow-card ring-1 ring-line backdrop:bg-black/50"
    >
      {open ? (
        <div className="p-5">
          <h2 id={titleId} className="text-lg font-extrabold text-ink">
            {title}
          </h2>
          <div className="mt-2 space-y-2">{children}</div>
          {footer ? <div className="mt-5 flex flex-wrap justify-end gap-2">{footer}</div> : null}
        </div>
      ) : null}
    </dialog>
  );
}
