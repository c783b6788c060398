import {
  confirmsFailingSheet,
  DECISIONS_NEEDING_A_NOTE,
  FAILING_SHEET_CONFIRMATION,
  isApproval,
  SUBMITTAL_DECISIONS,
  SUBMITTAL_STATUS_TEXT,
  type Submittal,
  type SubmittalDecision,
  type SubmittalItem,
  sheetsWithVerdict,
} from '@shared/schemas/submittals';
import { type FormEvent, useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useSubmittalStep } from '../api/mutations';

type Reviewer = Submittal['reviewers'][number];

const DECISION_HINT: Record<SubmittalDecision, string> = {
  approved: 'Proceed as submitted.',
  approved_as_noted: 'Proceed, taking the notes into account.',
  revise_and_resubmit: 'The submitter revises and sends the next revision.',
  rejected: 'Closes the submittal.',
};

const sheetName = (i: Extract<SubmittalItem, { kind: 'sheet' }>) =>
  `${i.sheet.assemblyName}, revision ${i.sheet.assemblyRevision} — ${i.sheet.criteriaSetName}, version ${i.sheet.criteriaSetVersion}`;

/** The attached sheets that fail or are incomplete, in words; nothing when every sheet passes. */
function SheetVerdictNotices({ items, failingTitle }: { items: SubmittalItem[]; failingTitle: string }) {
  const failing = sheetsWithVerdict(items, 'fail');
  const incomplete = sheetsWithVerdict(items, 'incomplete');
  return (
    <>
      {failing.length > 0 ? (
        <Notice tone="caution" title={failingTitle} live>
          <ul className="list-disc pl-5">
            {failing.map((i) => (
              <li key={i.id}>✕ fails: {sheetName(i)}</li>
            ))}
          </ul>
          <p>
            A failing sheet shows a wall that does not meet the code table it was checked against. Where the
            failing check is attachment, fire or moisture, that can hurt people: read the sheet first.
          </p>
        </Notice>
      ) : null}
      {incomplete.length > 0 ? (
        <Notice tone="warning" title="An attached compliance sheet is incomplete.">
          <ul className="list-disc pl-5">
            {incomplete.map((i) => (
              <li key={i.id}>▲ incomplete: {sheetName(i)}</li>
            ))}
          </ul>
          <p>Some of its checks were not evaluated; the sheet says which and why.</p>
        </Notice>
      ) : null}
    </>
  );
}

/** The submitting side sends the draft, after a confirmation that names the reviewers and any failing sheet. */
function SubmitControl({ s }: { s: Submittal }) {
  const step = useSubmittalStep(s.id);
  const [asking, setAsking] = useState(false);
  const notReady = s.items.length === 0 || s.reviewers.length === 0;
  const names = s.reviewers.map((r) => r.name).join(', ');
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm">
        Submitting sends revision {s.revision} to its {s.reviewers.length} reviewer
        {s.reviewers.length === 1 ? '' : 's'} by e-mail; its items cannot change afterwards.
      </p>
      {step.isError && !asking ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
      <div>
        <Button variant="primary" onClick={() => setAsking(true)} disabled={notReady}>
          Submit for review
        </Button>
      </div>
      {notReady ? (
        <p className="text-sm text-ink-muted">
          {s.items.length === 0 ? 'Add a compliance sheet or a file first. ' : ''}
          {s.reviewers.length === 0 ? 'Name at least one reviewer first (edit the details).' : ''}
        </p>
      ) : null}
      <ConfirmDialog
        open={asking}
        title={`Submit revision ${s.revision} of ${s.number} for review?`}
        confirmLabel={`Submit revision ${s.revision}`}
        busy={step.isPending}
        busyLabel="Submitting…"
        onConfirm={() =>
          step.mutate({ kind: 'submit', version: s.version }, { onSuccess: () => setAsking(false) })
        }
        onCancel={() => setAsking(false)}
      >
        <p>
          It goes by e-mail to {names} ({s.items.length} item{s.items.length === 1 ? '' : 's'}). Its items
          cannot change afterwards; a change needs the next revision.
        </p>
        <SheetVerdictNotices
          items={s.items}
          failingTitle="An attached compliance sheet fails. The reviewers will see it."
        />
        {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
      </ConfirmDialog>
    </div>
  );
}

/**
 * A named reviewer's decision. Nothing is chosen beforehand; approving a package whose attached sheet fails
 * asks for the word APPROVE to be typed (the server refuses it without).
 */
function DecisionForm({ s, me }: { s: Submittal; me: Reviewer }) {
  const id = useId();
  const step = useSubmittalStep(s.id);
  const [decision, setDecision] = useState<SubmittalDecision | null>(null);
  const [note, setNote] = useState('');
  const [typed, setTyped] = useState('');
  const [tried, setTried] = useState(false);
  const approving = decision !== null && isApproval(decision);
  const failing = sheetsWithVerdict(s.items, 'fail').length > 0;
  const mustConfirm = approving && failing;
  const needsNote = decision !== null && DECISIONS_NEEDING_A_NOTE.includes(decision);
  const problems = {
    decision: decision === null ? 'Choose a decision: nothing is chosen for you.' : undefined,
    note: needsNote && !note.trim() ? 'say what is noted, what to revise or why it is rejected' : undefined,
    typed:
      mustConfirm && !confirmsFailingSheet(typed)
        ? `type ${FAILING_SHEET_CONFIRMATION} to approve a package whose sheet fails`
        : undefined,
  };
  const shown: Partial<typeof problems> = tried ? problems : {};
  const others = s.reviewers.filter((r) => r.id !== me.id && !r.decision);

  const decide = (e: FormEvent) => {
    e.preventDefault();
    setTried(true);
    if (decision === null || problems.note || problems.typed) return;
    step.mutate(
      {
        kind: 'decision',
        decision,
        note,
        ...(mustConfirm ? { failingSheetConfirmation: typed } : {}),
      },
      {
        onSuccess: () => {
          setDecision(null);
          setNote('');
          setTyped('');
          setTried(false);
        },
      },
    );
  };

  return (
    <form onSubmit={decide} noValidate className="flex flex-col gap-3" aria-labelledby={`${id}-legend`}>
      {me.decision ? (
        <p className="text-sm">
          You decided{' '}
          <span className="font-semibold">
            {SUBMITTAL_STATUS_TEXT[me.decision.decision].label.toLowerCase()}
          </span>{' '}
          on {formatDateTime(me.decision.at)}. You may change it until{' '}
          {others.length > 0 ? others.map((r) => r.name).join(', ') : 'the others'}{' '}
          {others.length === 1 ? 'has' : 'have'} decided.
        </p>
      ) : null}
      <fieldset
        className="flex flex-col gap-2"
        aria-invalid={Boolean(shown.decision)}
        aria-describedby={shown.decision ? `${id}-decision-error` : undefined}
      >
        <legend id={`${id}-legend`} className="text-sm font-semibold">
          {me.decision ? 'Change your decision' : 'Your decision'}
        </legend>
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
        {shown.decision ? (
          <p id={`${id}-decision-error`} role="alert" className="flex gap-1 text-sm font-medium text-caution">
            <span aria-hidden="true">✕</span>
            <span>{shown.decision}</span>
          </p>
        ) : null}
      </fieldset>
      {approving ? (
        <SheetVerdictNotices
          items={s.items}
          failingTitle="An attached compliance sheet fails. Approving it needs a confirmation."
        />
      ) : null}
      {mustConfirm ? (
        <Field
          label={`Type ${FAILING_SHEET_CONFIRMATION} to approve despite the failing sheet`}
          hint="You confirm that you have read the failing checks and accept them for this package."
          error={shown.typed}
          required
        >
          {(c) => (
            <TextInput
              {...c}
              value={typed}
              onChange={(e) => setTyped(e.target.value)}
              autoComplete="off"
              autoCapitalize="characters"
              spellCheck={false}
            />
          )}
        </Field>
      ) : null}
      <Field
        label={`Reviewer’s note${needsNote ? '' : ' (optional)'}`}
        error={shown.note}
        required={needsNote}
      >
        {(c) => <TextArea {...c} value={note} onChange={(e) => setNote(e.target.value)} />}
      </Field>
      {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
      <div>
        <Button type="submit" variant="primary" busy={step.isPending} busyLabel="Recording…">
          Record {me.decision ? 'the new decision' : 'my decision'}
        </Button>
      </div>
    </form>
  );
}

/** Submit (submitting side), start the review and decide (named reviewers), by role and status. */
export function ReviewPanel({
  s,
  maySubmit,
  me,
}: {
  s: Submittal;
  maySubmit: boolean;
  /** The signed-in user's entry among the reviewers, when they are named and may review. */
  me: Reviewer | null;
}) {
  const step = useSubmittalStep(s.id);
  const open = s.status === 'submitted' || s.status === 'under_review';

  if (s.status === 'draft' && maySubmit) return <SubmitControl s={s} />;

  if (open && me)
    return (
      <div className="flex flex-col gap-4">
        {s.status === 'submitted' ? (
          <div className="flex flex-col gap-2">
            <div>
              <Button
                busy={step.isPending}
                busyLabel="Starting…"
                onClick={() => step.mutate({ kind: 'review', version: s.version })}
              >
                Start the review
              </Button>
            </div>
            {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
          </div>
        ) : null}
        <DecisionForm s={s} me={me} />
      </div>
    );

  if (open) {
    const waiting = s.reviewers.filter((r) => !r.decision);
    return (
      <p className="text-sm">
        Waiting for the decision of {waiting.map((r) => r.name).join(', ') || 'its reviewers'}.
      </p>
    );
  }
  if (s.status === 'draft')
    return <p className="text-sm">A draft: the submitting side has not sent it yet.</p>;
  return null;
}
