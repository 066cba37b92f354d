import { useState, type ReactNode } from 'react';
import { Button, type ButtonVariant } from './button';
import { Dialog } from './dialog';
import { useToast } from './toast';

/** A question before an action: confirm or cancel; Escape or the backdrop cancels. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  tone = 'primary',
  busy,
  onConfirm,
  onCancel,
}: {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  tone?: 'primary' | 'danger';
  busy?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  return (
    <Dialog
      open={open}
      title={title}
      onClose={onCancel}
      footer={
        <>
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
          <Button variant={tone} busy={busy} onClick={onConfirm}>
            {confirmLabel}
          </Button>
        </>
      }
    >
      {children}
    </Dialog>
  );
}

/**
 * A button for an action that cannot be taken back (withdraw, end, delete): it asks first, in the app's own
 * dialog, and runs `onConfirm` only on a yes; if that fails, a toast says why.
 */
export function ConfirmButton({
  children,
  title,
  question,
  confirmLabel,
  busy,
  onConfirm,
  variant = 'ghost',
}: {
  children: ReactNode;
  title: string;
  question: ReactNode;
  confirmLabel: string;
  busy?: boolean;
  onConfirm: () => Promise<unknown> | void;
  variant?: ButtonVariant;
}) {
  const [open, setOpen] = useState(false);
  const toast = useToast();
  return (
    <>
      <Button variant={variant} busy={busy} onClick={() => setOpen(true)}>
        {children}
      </Button>
      <ConfirmDialog
        open={open}
        title={title}
        confirmLabel={confirmLabel}
        tone="danger"
        busy={busy}
        onCancel={() => setOpen(false)}
        onConfirm={async () => {
          try {
            await onConfirm();
          } catch (e) {
            toast.error(
              e instanceof Error ? e.message : 'That did not work. Check your connection and try again.',
            );
          } finally {
            setOpen(false);
          }
        }}
      >
        <p>{question}</p>
      </ConfirmDialog>
    </>
  );
}
