import { SUBMITTAL_STATUS_TEXT, type SubmittalStatus } from '@shared/schemas/submittals';

const TONE: Record<SubmittalStatus, string> = {
  draft: 'border-rule-strong text-ink-muted',
  submitted: 'border-pencil text-pencil',
  under_review: 'border-pencil text-pencil',
  approved: 'border-meets text-meets',
  approved_as_noted: 'border-meets text-meets',
  revise_and_resubmit: 'border-warning text-warning',
  rejected: 'border-caution text-caution',
};

/** A submittal's status in words and a glyph (never by colour alone). */
export function StatusBadge({ status }: { status: SubmittalStatus }) {
  const t = SUBMITTAL_STATUS_TEXT[status];
  return (
    <span
      className={`inline-flex items-center gap-1 whitespace-nowrap border px-2 py-0.5 text-xs font-semibold ${TONE[status]}`}
      data-status={status}
    >
      <span aria-hidden="true">{t.glyph}</span>
      <span className="text-ink">{t.label}</span>
    </span>
  );
}
