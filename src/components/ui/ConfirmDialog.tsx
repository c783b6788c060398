import type { ReactNode } from 'react';
import { Button } from './Button';
import { Dialog } from './Dialog';

interface ConfirmDialogProps {
  open: boolean;
  title: ReactNode;
  children?: ReactNode;
  confirmLabel: ReactNode;
  /** Primary by default; `danger` when confirming loses work. */
  confirmVariant?: 'primary' | 'danger';
  cancelLabel?: ReactNode;
  busy?: boolean;
  busyLabel?: ReactNode;
  onConfirm: () => void;
  onCancel: () => void;
}

/**
 * A question asked in view before an action that cannot be taken back, in a modal `Dialog` (Escape
 * cancels). Focus starts on "Cancel", so Enter alone never confirms.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  confirmVariant = 'primary',
  cancelLabel = 'Cancel',
  busy = false,
  busyLabel,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog open={open} title={title} onClose={onCancel}>
      <div className="flex flex-col gap-3 text-sm">{children}</div>
      <div className="mt-5 flex flex-wrap gap-3">
        <Button variant={confirmVariant} busy={busy} busyLabel={busyLabel} onClick={onConfirm}>
          {confirmLabel}
        </Button>
        <Button data-autofocus onClick={onCancel}>
          {cancelLabel}
        </Button>
      </div>
    </Dialog>
  );
}
