import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { authClient, authErrorMessage } from '../../../lib/auth-client';
import { type ForgotForm, forgotFormSchema } from '../schemas';

export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<ForgotForm>({ resolver: zodResolver(forgotFormSchema), defaultValues: { email: '' } });

  const onSubmit = handleSubmit(async ({ email }) => {
    setFailure(null);
    const { error } = await authClient.requestPasswordReset({ email, redirectTo: '/reset-password' });
    if (error) {
      setFailure(authErrorMessage(error));
      return;
    }
    setSentTo(email);
  });

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="info" title="Check your e-mail" live>
          <p>
            If an account exists for <strong>{sentTo}</strong>, a link to choose a new password is on its way.
            The link works once and expires after a while.
          </p>
        </Notice>
        <p>
          <Link to="/sign-in">Back to sign in</Link>
        </p>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <Field label="E-mail" error={errors.email?.message} required>
        {(c) => <TextInput {...c} {...register('email')} type="email" autoComplete="email" />}
      </Field>
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" variant="primary" busy={isSubmitting} busyLabel="Sending…">
          Send reset link
        </Button>
        <Link to="/sign-in">Back to sign in</Link>
      </div>
    </form>
  );
}
