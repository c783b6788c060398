import type { ReactNode } from 'react';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { LabelledOptions } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { type SubmittalStep, useSubmittalStep } from '../api/mutations';

/** The words of one kind of attachment picker. */
export interface AttachWords {
  label: string;
  hint?: string;
  /** The box's width in the row with the button. */
  fieldClassName: string;
  placeholder: string;
  add: string;
}

/**
 * Picks one record of the project (a check run, an inspection) and adds what it prints to the submittal as an
 * item; says so when there is nothing to pick, and shows the list's and the request's failures.
 */
export function AttachChoice({
  submittalId,
  list,
  none,
  choices,
  words,
  step: stepOf,
}: {
  submittalId: string;
  /** The records' query: its failure is shown above the box. */
  list: { isError: boolean; error: unknown };
  /** Said instead of the box when there is nothing to pick (`null`: the box). */
  none: ReactNode;
  /** The records as the box's choices: value the record's id. */
  choices: readonly { value: string; label: ReactNode }[];
  words: AttachWords;
  /** The request that adds the chosen record. */
  step: (id: string) => SubmittalStep;
}) {
  const step = useSubmittalStep(submittalId);
  const [chosen, setChosen] = useState('');

  return (
    <div className="flex flex-col gap-3 border border-rule bg-paper-raised p-4">
      {list.isError ? <Notice tone="caution" title={errorMessage(list.error)} /> : null}
      {none ? (
        <p className="text-sm">{none}</p>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          <Field label={words.label} hint={words.hint} className={words.fieldClassName}>
            {(c) => (
              <Select {...c} value={chosen} onChange={(e) => setChosen(e.target.value)}>
                <option value="">{words.placeholder}</option>
                <LabelledOptions options={choices} />
              </Select>
            )}
          </Field>
          <Button
            disabled={!chosen}
            busy={step.isPending}
            busyLabel="Adding…"
            onClick={() => step.mutate(stepOf(chosen), { onSuccess: () => setChosen('') })}
          >
            {words.add}
          </Button>
        </div>
      )}
      {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
    </div>
  );
}
