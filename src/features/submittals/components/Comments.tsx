import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { SubmittalComment } from '@shared/schemas/submittals';
import { type FormEvent, useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { TextArea } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useSubmittalStep } from '../api/mutations';

export function CommentList({ comments }: { comments: SubmittalComment[] }) {
  if (comments.length === 0) return null;
  return (
    <ol className="flex flex-col gap-2">
      {comments.map((c) => (
        <li key={c.id} className="border-l-2 border-rule-strong pl-3 text-sm">
          <p className="text-xs text-ink-muted">
            <span className="font-semibold text-ink">{c.author ?? 'Someone'}</span>
            {c.authorRole ? ` (${PROJECT_ROLE_LABELS[c.authorRole]})` : ''} · {formatDateTime(c.createdAt)}
          </p>
          <p className="whitespace-pre-wrap">{c.body}</p>
        </li>
      ))}
    </ol>
  );
}

/** A comment on the whole submittal (itemId null) or on one item. */
export function CommentForm({
  submittalId,
  itemId,
  label,
}: {
  submittalId: string;
  itemId: string | null;
  label: string;
}) {
  const id = useId();
  const step = useSubmittalStep(submittalId);
  const [body, setBody] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!body.trim()) return;
    step.mutate({ kind: 'comment', body, itemId }, { onSuccess: () => setBody('') });
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-2">
      <label htmlFor={id} className="text-sm font-semibold">
        {label}
      </label>
      <TextArea id={id} value={body} onChange={(e) => setBody(e.target.value)} className="min-h-16" />
      {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
      <div>
        <Button type="submit" disabled={!body.trim()} busy={step.isPending} busyLabel="Posting…">
          Post the comment
        </Button>
      </div>
    </form>
  );
}
