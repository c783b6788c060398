import {
  DECISIONS_NEEDING_A_NOTE,
  SUBMITTAL_DECISIONS,
  SUBMITTAL_STATUS_TEXT,
  type Submittal,
  type SubmittalDecision,
} from '@shared/schemas/submittals';
import { type FormEvent, useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { TextArea } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useSubmittalStep } from '../api/mutations';

const DECISION_HINT: Record<SubmittalDecision, string> = {
  approved: 'Proceed as submitted.',
  approved_as_noted: 'Proceed, taking the notes into account.',
  revise_and_resubmit: 'Opens the next revision as a draft for the submitter.',
  rejected: 'Closes the submittal.',
};

/** Submit (submitting side), start the review and decide (named reviewers), by role and status. */
export function ReviewPanel({
  s,
  maySubmit,
  isReviewer,
}: {
  s: Submittal;
  maySubmit: boolean;
  isReviewer: boolean;
}) {
  const id = useId();
  const step = useSubmittalStep(s.id);
  const [decision, setDecision] = useState<SubmittalDecision>('approved');
  const [note, setNote] = useState('');
  const needsNote = DECISIONS_NEEDING_A_NOTE.includes(decision);

  const decide = (e: FormEvent) => {
    e.preventDefault();
    step.mutate({ kind: 'decision', decision, note, version: s.version });
  };

  const failure = step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null;

  if (s.status === 'draft' && maySubmit)
    return (
      <div className="flex flex-col gap-2">
        <p className="text-sm">
          Submitting sends revision {s.revision} to its {s.reviewers.length} reviewer
          {s.reviewers.length === 1 ? '' : 's'} by e-mail; its items cannot change afterwards.
        </p>
        {failure}
        <div>
          <Button
            variant="primary"
            busy={step.isPending}
            busyLabel="Submitting…"
            onClick={() => step.mutate({ kind: 'submit', version: s.version })}
            disabled={s.items.length === 0 || s.reviewers.length === 0}
          >
            Submit for review
          </Button>
        </div>
        {s.items.length === 0 || s.reviewers.length === 0 ? (
          <p className="text-sm text-ink-muted">
            {s.items.length === 0 ? 'Add a compliance sheet or a file first. ' : ''}
            {s.reviewers.length === 0 ? 'Name at least one reviewer first (edit the details).' : ''}
          </p>
        ) : null}
      </div>
    );

  if ((s.status === 'submitted' || s.status === 'under_review') && isReviewer)
    return (
      <div className="flex flex-col gap-4">
        {s.status === 'submitted' ? (
          <div>
            <Button
              busy={step.isPending}
              busyLabel="Starting…"
              onClick={() => step.mutate({ kind: 'review', version: s.version })}
            >
              Start the review
            </Button>
          </div>
        ) : null}
        <form onSubmit={decide} className="flex flex-col gap-3">
          <fieldset className="flex flex-col gap-2">
            <legend className="text-sm font-semibold">Decision</legend>
            {SUBMITTAL_DECISIONS.map((d) => (
              <label key={d} className="flex items-start gap-2 text-sm">
                <input
                  type="radio"
                  name="decision"
                  value={d}
                  checked={decision === d}
                  onChange={() => setDecision(d)}
                  className="mt-1"
                />
                <span>
                  <span aria-hidden="true">{SUBMITTAL_STATUS_TEXT[d].glyph} </span>
                  <span className="font-semibold">{SUBMITTAL_STATUS_TEXT[d].label}</span>
                  <span className="text-ink-muted"> — {DECISION_HINT[d]}</span>
                </span>
              </label>
            ))}
          </fieldset>
          <div className="flex flex-col gap-1">
            <label htmlFor={id} className="text-sm font-semibold">
              Reviewer’s note{needsNote ? ' (required)' : ' (optional)'}
            </label>
            <TextArea
              id={id}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              aria-required={needsNote}
            />
          </div>
          {failure}
          <div>
            <Button
              type="submit"
              variant="primary"
              busy={step.isPending}
              busyLabel="Recording…"
              disabled={needsNote && !note.trim()}
            >
              Record the decision
            </Button>
          </div>
        </form>
      </div>
    );

  if (s.status === 'submitted' || s.status === 'under_review')
    return (
      <p className="text-sm">
        Waiting for the review by {s.reviewers.map((r) => r.name).join(', ') || 'its reviewers'}.
      </p>
    );
  if (s.status === 'draft')
    return <p className="text-sm">A draft: the submitting side has not sent it yet.</p>;
  return null;
}
