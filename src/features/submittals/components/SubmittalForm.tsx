import { zodResolver } from '@hookform/resolvers/zod';
import { can, PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Member } from '@shared/schemas/members';
import { type SubmittalCreate, submittalCreateSchema } from '@shared/schemas/submittals';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { applyServerFieldErrors } from '../../../lib/form-errors';

type Values = z.input<typeof submittalCreateSchema>;

/** MasterFormat sections a metal-panel wall submittal usually falls under (the person may type any other). */
export const COMMON_SECTIONS: [string, string][] = [
  ['07 42 13', 'Metal Wall Panels'],
  ['07 42 93', 'Soffit Panels'],
  ['07 42 43', 'Composite Wall Panels'],
  ['07 62 00', 'Sheet Metal Flashing and Trim'],
  ['07 92 00', 'Joint Sealants'],
  ['07 21 00', 'Thermal Insulation'],
  ['07 27 00', 'Air Barriers'],
  ['05 40 00', 'Cold-Formed Metal Framing'],
];

const FIELDS = ['number', 'title', 'description', 'specSection', 'specTitle', 'dueDate', 'reviewerIds'];

/**
 * The details of a submittal: title, specification section (number and title), due date, reviewers.
 * Used to start one (with an optional number) and to edit a draft.
 */
export function SubmittalForm({
  members,
  initial,
  withNumber,
  submitLabel,
  busyLabel,
  onSubmit,
  onCancel,
}: {
  members: Member[];
  initial?: Partial<Values>;
  withNumber: boolean;
  submitLabel: string;
  busyLabel: string;
  onSubmit: (values: SubmittalCreate) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [failure, setFailure] = useState<string | null>(null);
  const reviewers = members.filter((m) => can(m.role, 'submittal.review'));
  const {
    register,
    handleSubmit,
    setValue,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Values, unknown, SubmittalCreate>({
    resolver: zodResolver(submittalCreateSchema),
    defaultValues: {
      number: '',
      title: '',
      description: '',
      specSection: '07 42 13',
      specTitle: 'Metal Wall Panels',
      dueDate: null,
      reviewerIds: [],
      ...initial,
    },
  });

  const submit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await onSubmit({ ...values, number: values.number || undefined });
    } catch (e) {
      const unmatched = applyServerFieldErrors(e, setError, FIELDS, 'changes.');
      const markedOnFields = isApiRequestError(e) && e.fields && unmatched.length === 0;
      if (!markedOnFields) setFailure([errorMessage(e), ...unmatched].join(' '));
    }
  });
  const reviewerError =
    errors.reviewerIds?.message ??
    (errors.reviewerIds as { root?: { message?: string } } | undefined)?.root?.message;

  return (
    <form onSubmit={submit} noValidate className="flex max-w-form flex-col gap-4">
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <Field label="Title" error={errors.title?.message} required>
        {(c) => <TextInput {...c} {...register('title')} />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-[13rem_1fr]">
        <Field
          label="Section number"
          hint="MasterFormat, e.g. 07 42 13"
          error={errors.specSection?.message}
          required
        >
          {(c) => (
            <TextInput
              {...c}
              {...register('specSection', {
                onChange: (e) => {
                  const known = COMMON_SECTIONS.find(([n]) => n === e.target.value);
                  if (known) setValue('specTitle', known[1]);
                },
              })}
              list="masterformat-sections"
              inputMode="numeric"
              className="num"
            />
          )}
        </Field>
        <Field label="Section title" error={errors.specTitle?.message} required>
          {(c) => <TextInput {...c} {...register('specTitle')} />}
        </Field>
      </div>
      <datalist id="masterformat-sections">
        {COMMON_SECTIONS.map(([n, t]) => (
          <option key={n} value={n}>
            {t}
          </option>
        ))}
      </datalist>
      <div className="grid gap-4 sm:grid-cols-2">
        {withNumber ? (
          <Field
            label="Number"
            hint="Leave empty for the next number of the section"
            error={errors.number?.message}
          >
            {(c) => <TextInput {...c} {...register('number')} className="num" />}
          </Field>
        ) : null}
        <Field label="Review due" error={errors.dueDate?.message}>
          {(c) => <TextInput {...c} type="date" {...register('dueDate', { setValueAs: (v) => v || null })} />}
        </Field>
      </div>
      <Field label="Description" error={errors.description?.message}>
        {(c) => <TextArea {...c} {...register('description')} />}
      </Field>
      <fieldset className="flex flex-col gap-2" aria-describedby="reviewers-hint">
        <legend className="text-sm font-semibold">Reviewers</legend>
        <p id="reviewers-hint" className="text-sm text-ink-muted">
          Project members who review submittals; each gets an e-mail when it is submitted.
        </p>
        {reviewers.length === 0 ? (
          <p className="text-sm">Nobody on this project reviews submittals yet.</p>
        ) : (
          reviewers.map((m) => (
            <label key={m.userId} className="flex items-center gap-2 text-sm">
              <input type="checkbox" value={m.userId} {...register('reviewerIds')} />
              <span>
                {m.name} <span className="text-ink-muted">— {PROJECT_ROLE_LABELS[m.role]}</span>
              </span>
            </label>
          ))
        )}
        {reviewerError ? (
          <p className="text-sm font-medium text-caution">
            <span aria-hidden="true">✕ </span>
            {reviewerError}
          </p>
        ) : null}
      </fieldset>
      <div className="flex gap-3">
        <Button type="submit" variant="primary" busy={isSubmitting} busyLabel={busyLabel}>
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
