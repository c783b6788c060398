import { type ReactNode, useState } from 'react';
import { Button } from './Button';

interface InlineConfirmProps {
  /** The opening button's words ("Remove…"); `who` follows them for screen readers ("Remove… Ada Finch"). */
  opener: ReactNode;
  who: string;
  /** The question, the legend of the buttons that answer it. */
  question: ReactNode;
  confirmLabel: ReactNode;
  confirmVariant?: 'primary' | 'danger';
  busy: boolean;
  busyLabel: string;
  cancelLabel?: string;
  /** Takes the action; `close` folds the question away (a removed row simply goes). */
  onConfirm: (close: () => void) => void;
  className?: string;
  openerClassName?: string;
}

/**
 * An action on one row of a table asked about in place, in the row: the opening button makes way for the
 * question and its two answers, the second of which ("Keep") takes it back.
 */
export function InlineConfirm({
  opener,
  who,
  question,
  confirmLabel,
  confirmVariant = 'danger',
  busy,
  busyLabel,
  cancelLabel = 'Keep',
  onConfirm,
  className = 'flex flex-wrap items-center gap-2',
  openerClassName = 'px-2 py-1',
}: InlineConfirmProps) {
  const [open, setOpen] = useState(false);
  if (!open) {
    return (
      <Button variant="quiet" className={openerClassName} onClick={() => setOpen(true)}>
        {opener}
        <span className="sr-only"> {who}</span>
      </Button>
    );
  }
  return (
    <fieldset className={className}>
      <legend className="mb-1 text-sm">{question}</legend>
      <div className="flex flex-wrap gap-2">
        <Button
          variant={confirmVariant}
          className="px-3 py-1"
          busy={busy}
          busyLabel={busyLabel}
          onClick={() => onConfirm(() => setOpen(false))}
        >
          {confirmLabel}
        </Button>
        <Button variant="quiet" className="px-2 py-1" onClick={() => setOpen(false)} disabled={busy}>
          {cancelLabel}
        </Button>
      </div>
    </fieldset>
  );
}
