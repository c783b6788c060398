import { type ReactNode, useEffect, useId, useRef } from 'react';
import { Button } from './Button';

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
 * A question asked in view before an action that cannot be taken back: a native modal `<dialog>` (centred,
 * focus kept inside, Escape cancels). Focus starts on "Cancel", so Enter alone never confirms.
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
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (open && d && !d.open) {
      d.showModal();
      d.querySelector<HTMLButtonElement>('[data-cancel]')?.focus();
    }
    if (!open && d?.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(34rem,calc(100vw-2rem))] rounded-sm border border-ink bg-paper p-5 text-ink backdrop:bg-ink/50"
    >
      <h2 id={titleId} className="mb-3 text-xl">
        {title}
      </h2>
      <div className="flex flex-col gap-3 text-sm">{children}</div>
      <div className="mt-5 flex flex-wrap gap-3">
        <Button variant={confirmVariant} busy={busy} busyLabel={busyLabel} onClick={onConfirm}>
          {confirmLabel}
        </Button>
        <Button data-cancel onClick={onCancel}>
          {cancelLabel}
        </Button>
      </div>
    </dialog>
  );
}
