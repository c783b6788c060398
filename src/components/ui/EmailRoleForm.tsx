import { zodResolver } from '@hookform/resolvers/zod';
import { type ReactNode, useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { errorMessage, isApiRequestError } from '../../lib/api';
import { applyServerFieldErrors } from '../../lib/form-errors';
import { Button } from './Button';
import { Field } from './Field';
import { Notice } from './Notice';
import { Options } from './Options';
import { Select } from './Select';
import { TextInput } from './TextInput';

interface EmailRole<R extends string> {
  email: string;
  role: R;
}

interface EmailRoleFormProps<R extends string> {
  /** The request's schema: an e-mail address and a role (the server's own). */
  schema: z.ZodType<EmailRole<R>, EmailRole<string>>;
  title: ReactNode;
  /** A line under the title. */
  intro?: ReactNode;
  roleLabel: string;
  roles: readonly R[];
  roleLabels: Record<R, string>;
  defaultRole: R;
  submitLabel: string;
  busyLabel: string;
  /** Sends the request; answers the words of the notice that says it was done. */
  onSend: (values: EmailRole<R>) => Promise<string>;
}

/**
 * Add a person by e-mail address with a role (a firm's members, a project's invitations): the notice says who
 * was added, the form keeps the role for the next one, and the server's field errors are marked on the fields.
 */
export function EmailRoleForm<R extends string>({
  schema,
  title,
  intro,
  roleLabel,
  roles,
  roleLabels,
  defaultRole,
  submitLabel,
  busyLabel,
  onSend,
}: EmailRoleFormProps<R>) {
  const headingId = useId();
  const [done, setDone] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<EmailRole<string>, unknown, EmailRole<R>>({
    resolver: zodResolver(schema, {
      error: (iss) => (iss.path?.[0] === 'email' ? 'Enter a valid e-mail address.' : undefined),
    }),
    defaultValues: { email: '', role: defaultRole },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    setDone(null);
    try {
      setDone(await onSend(values));
      reset({ email: '', role: values.role });
    } catch (e) {
      const unmatched = applyServerFieldErrors(e, setError, ['email', 'role']);
      const markedOnFields = isApiRequestError(e) && e.fields && unmatched.length === 0;
      if (!markedOnFields) setFailure([errorMessage(e), ...unmatched].join(' '));
    }
  });

  const heading = (
    <h2 id={headingId} className="text-xl">
      {title}
    </h2>
  );
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-labelledby={headingId}>
      {intro ? (
        <div>
          {heading}
          <p className="text-sm text-ink-muted">{intro}</p>
        </div>
      ) : (
        heading
      )}
      {done ? <Notice tone="info" title={done} live /> : null}
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr_auto] sm:items-start">
        <Field label="E-mail" error={errors.email?.message} required>
          {(c) => <TextInput {...c} {...register('email')} type="email" autoComplete="off" />}
        </Field>
        <Field label={roleLabel} error={errors.role?.message} required>
          {(c) => (
            <Select {...c} {...register('role')}>
              <Options values={roles} labels={roleLabels} />
            </Select>
          )}
        </Field>
        <div className="sm:pt-7">
          <Button type="submit" variant="primary" busy={isSubmitting} busyLabel={busyLabel}>
            {submitLabel}
          </Button>
        </div>
      </div>
    </form>
  );
}
