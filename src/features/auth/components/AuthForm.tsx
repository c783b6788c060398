import { zodResolver } from '@hookform/resolvers/zod';
import { type ReactNode, useState } from 'react';
import { type FieldValues, type Path, type UseFormSetError, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { MIN_PASSWORD_LENGTH } from '../../../lib/auth-client';

/** One text box of an account form, as the browser's password manager should understand it. */
export interface AuthField {
  name: string;
  label: string;
  hint?: string;
  type?: 'email' | 'password';
  autoComplete: string;
}

export const emailField: AuthField = { name: 'email', label: 'E-mail', type: 'email', autoComplete: 'email' };

/** A new password and the same again (sign-up, a password reset); `label` names the first box. */
export const newPasswordFields = (label: string): AuthField[] => [
  {
    name: 'password',
    label,
    hint: `At least ${MIN_PASSWORD_LENGTH} characters.`,
    type: 'password',
    autoComplete: 'new-password',
  },
  { name: 'confirm', label: `${label} again`, type: 'password', autoComplete: 'new-password' },
];

interface AuthFormProps<V extends FieldValues> {
  /** The form's schema (`../schemas`): its keys are the `fields`' names. */
  schema: z.ZodType<V, V>;
  defaultValues: V;
  fields: readonly AuthField[];
  /**
   * Sends the form to the account service; answers the words of a failure, or nothing when it went through.
   * A failure that belongs to one box is marked there with `setError` instead.
   */
  send: (values: V, setError: UseFormSetError<V>) => Promise<string | undefined>;
  submitLabel: string;
  busyLabel: string;
  /** Beside the button: a link to the neighbouring page. */
  beside?: ReactNode;
  /** Under a failure's words: the way out of it. */
  failureHelp?: ReactNode;
  /** Under a rule at the foot of the form. */
  footer?: ReactNode;
}

/**
 * The frame of the sign-in, sign-up and password pages: the boxes with their checks, the failure as a caution
 * notice above them, the button (busy while sending) and the links around it.
 */
export function AuthForm<V extends FieldValues>({
  schema,
  defaultValues,
  fields,
  send,
  submitLabel,
  busyLabel,
  beside,
  failureHelp,
  footer,
}: AuthFormProps<V>) {
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, getFieldState, formState } = useForm<V>({
    resolver: zodResolver(schema),
    defaultValues: defaultValues as never,
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    setFailure((await send(values, setError)) ?? null);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {failure ? (
        <Notice tone="caution" title={failure} live>
          {failureHelp}
        </Notice>
      ) : null}
      {fields.map((f) => (
        <Field
          key={f.name}
          label={f.label}
          hint={f.hint}
          error={getFieldState(f.name as Path<V>, formState).error?.message}
          required
        >
          {(c) => (
            <TextInput {...c} {...register(f.name as Path<V>)} type={f.type} autoComplete={f.autoComplete} />
          )}
        </Field>
      ))}
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" variant="primary" busy={formState.isSubmitting} busyLabel={busyLabel}>
          {submitLabel}
        </Button>
        {beside}
      </div>
      {footer ? <p className="border-t border-rule pt-4 text-sm">{footer}</p> : null}
    </form>
  );
}
