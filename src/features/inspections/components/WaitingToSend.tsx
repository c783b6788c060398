import { ITEM_STATE_TEXT } from '@shared/inspections/schema';
import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { useRefusedMutations, useWaitingCount, waitingWords } from '../../../lib/offline/queue';
import { inspectionKeys } from '../../../lib/query-keys';
import { useUnitSystem } from '../../../lib/unit-system';
import { type AnswerVariables, conflictingItem, useAnswerItem } from '../api/answer-item';
import { itemValueText } from '../units';

const useOnline = () =>
  useSyncExternalStore(
    (notify) => onlineManager.subscribe(notify),
    () => onlineManager.isOnline(),
  );

/**
 * The device's queue for this inspection: online or not, how many answers and photos wait to be sent, and
 * what the server refused — above all a conflict: someone else changed the item while this device waited.
 */
export function WaitingToSend({ inspectionId }: { inspectionId: string }) {
  const online = useOnline();
  const waiting = useWaitingCount(inspectionKeys.all);
  const refused = useRefusedMutations(inspectionKeys.all).filter(
    (m) => (m.state.variables as { inspectionId?: string } | undefined)?.inspectionId === inspectionId,
  );
  return (
    <div className="flex flex-col gap-3" data-testid="sync-status">
      <p
        role="status"
        aria-live="polite"
        className="flex flex-wrap items-center gap-x-4 gap-y-1 border border-rule bg-paper-raised px-3 py-2 text-base"
      >
        <span className="font-semibold" data-online={online}>
          <span aria-hidden="true">{online ? '● ' : '○ '}</span>
          {online ? 'Online' : 'Offline — answers are kept on this device'}
        </span>
        <span data-testid="waiting-count" data-count={waiting}>
          {waiting === 0 ? 'Everything sent' : waitingWords(waiting)}
        </span>
      </p>
      {refused.map((m) => (
        <Refused
          key={m.mutationId}
          mutationId={m.mutationId}
          error={m.state.error}
          variables={m.state.variables}
        />
      ))}
    </div>
  );
}

function Refused({
  mutationId,
  error,
  variables,
}: {
  mutationId: number;
  error: unknown;
  variables: unknown;
}) {
  const qc = useQueryClient();
  const system = useUnitSystem();
  const v = variables as AnswerVariables | undefined;
  const answer = useAnswerItem(v?.inspectionId ?? '');
  const dismiss = () => {
    const m = qc.getMutationCache().find({ predicate: (x) => x.mutationId === mutationId });
    if (m) qc.getMutationCache().remove(m);
  };
  const current = conflictingItem(error);
  if (!v) return null;
  if (current && v.answer) {
    const theirs = ITEM_STATE_TEXT[current.state];
    const mine = ITEM_STATE_TEXT[v.answer.state];
    const measured =
      current.measured !== null
        ? `, measured ${itemValueText(current.quantity, current.measured, system)}`
        : '';
    return (
      <Notice
        tone="caution"
        live
        title={`Conflict: “${v.label}” was changed by someone else while this device waited.`}
      >
        <p>
          It is now <strong>{`${theirs.glyph} ${theirs.label}`}</strong>
          {measured}
          {current.answeredByName ? ` (${current.answeredByName})` : ''}. Your answer,{' '}
          <strong>{`${mine.glyph} ${mine.label}`}</strong>, was not saved.
        </p>
        <div className="flex flex-wrap gap-3">
          <Button
            className="min-h-11"
            onClick={() => {
              answer.mutate({ ...v, answer: { ...v.answer, version: current.version } });
              dismiss();
            }}
          >
            Save mine over theirs
          </Button>
          <Button className="min-h-11" variant="quiet" onClick={dismiss}>
            Keep theirs
          </Button>
        </div>
      </Notice>
    );
  }
  return (
    <Notice tone="caution" live title={`“${v.label}” could not be saved: ${errorMessage(error)}`}>
      <Button className="min-h-11" variant="quiet" onClick={dismiss}>
        Dismiss
      </Button>
    </Notice>
  );
}
