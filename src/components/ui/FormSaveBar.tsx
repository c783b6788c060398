import type { ReactNode } from 'react';
import { Button } from './Button';

/**
 * The foot of a form that saves a record: Save (busy while saving, held while a conflict is open), Cancel, and
 * how many values need attention, in words.
 */
export function FormSaveBar({
  children,
  busy,
  busyLabel = 'Saving…',
  disabled,
  onCancel,
  errorCount,
}: {
  /** The save button's words ("Save the climate"). */
  children: ReactNode;
  busy: boolean;
  busyLabel?: string;
  disabled?: boolean;
  onCancel?: () => void;
  errorCount: number;
}) {
  return (
    <div className="flex flex-wrap items-center gap-4 border-t border-ink pt-4">
      <Button type="submit" variant="primary" busy={busy} busyLabel={busyLabel} disabled={disabled}>
        {children}
      </Button>
      {onCancel ? (
        <Button variant="secondary" onClick={onCancel} disabled={busy}>
          Cancel
        </Button>
      ) : null}
      {errorCount > 0 ? (
        <p className="text-sm text-caution" role="status">
          <span aria-hidden="true">✕ </span>
          {errorCount === 1 ? 'One value needs attention.' : `${errorCount} values need attention.`}
        </p>
      ) : null}
    </div>
  );
}
