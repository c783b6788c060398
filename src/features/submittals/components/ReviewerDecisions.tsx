import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import { DECISIONS_BY_SEVERITY, SUBMITTAL_STATUS_TEXT, type Submittal } from '@shared/schemas/submittals';
import { formatDateTime } from '../../../lib/format';

const severity = DECISIONS_BY_SEVERITY.map((d) => SUBMITTAL_STATUS_TEXT[d].label.toLowerCase()).join(' › ');

/**
 * The rule for several reviewers and, once submitted, where the review stands: every named reviewer
 * decides; the revision closes on the last decision, with the most severe of them. Each reviewer's decision
 * and note, or "still to decide".
 */
export function ReviewerDecisions({ s }: { s: Submittal }) {
  if (s.reviewers.length === 0) return null;
  const decided = s.reviewers.filter((r) => r.decision).length;
  const open = s.status === 'submitted' || s.status === 'under_review';
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm">
        {s.reviewers.length === 1
          ? 'The named reviewer’s decision closes the revision.'
          : `Every named reviewer decides; the revision closes when the last one has, with the most severe of their decisions (${severity}).`}
        {open && s.reviewers.length > 1 ? (
          <>
            {' '}
            <span className="font-semibold">
              {decided} of {s.reviewers.length} have decided.
            </span>
          </>
        ) : null}
      </p>
      {s.status === 'draft' ? null : (
        <ul
          data-testid="reviewer-decisions"
          className="flex flex-col divide-y divide-rule border-y border-rule"
        >
          {s.reviewers.map((r) => (
            <li
              key={r.id}
              data-reviewer={r.name}
              data-decision={r.decision?.decision ?? 'none'}
              className="flex flex-col gap-1 py-2 text-sm sm:flex-row sm:gap-4"
            >
              <span className="sm:w-64 sm:shrink-0">
                <span className="font-semibold">{r.name}</span>
                {r.role ? <span className="text-ink-muted"> — {PROJECT_ROLE_LABELS[r.role]}</span> : null}
              </span>
              {r.decision ? (
                <span className="flex flex-col gap-1">
                  <span>
                    <span aria-hidden="true">{SUBMITTAL_STATUS_TEXT[r.decision.decision].glyph} </span>
                    <span className="font-semibold">{SUBMITTAL_STATUS_TEXT[r.decision.decision].label}</span>
                    <span className="text-ink-muted"> — {formatDateTime(r.decision.at)}</span>
                  </span>
                  {r.decision.note ? <span className="whitespace-pre-wrap">{r.decision.note}</span> : null}
                </span>
              ) : (
                <span className="text-ink-muted">
                  <span aria-hidden="true">○ </span>
                  {open ? 'Still to decide' : 'Did not decide'}
                </span>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
