import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { authClient, authErrorMessage, MIN_PASSWORD_LENGTH } from '../../../lib/auth-client';
import { type ResetForm, resetFormSchema } from '../schemas';

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<ResetForm>({
    resolver: zodResolver(resetFormSchema),
    defaultValues: { password: '', confirm: '' },
  });

  const onSubmit = handleSubmit(async ({ password }) => {
    setFailure(null);
    const { error } = await authClient.resetPassword({ newPassword: password, token });
    if (error) {
      setFailure(
        error.code === 'INVALID_TOKEN'
          ? 'This reset link has expired or was already used. Ask for a new one.'
          : authErrorMessage(error),
      );
      return;
    }
    setDone(true);
  });

  if (done) {
    return (
      <Notice tone="info" title="Password changed" live>
        <p>
          <Link to="/sign-in">Sign in with your new password</Link>.
        </p>
      </Notice>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {failure ? (
        <Notice tone="caution" title={failure} live>
          <p>
            <Link to="/forgot-password">Ask for a new reset link</Link>
          </p>
        </Notice>
      ) : null}
      <Field
        label="New password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={errors.password?.message}
        required
      >
        {(c) => <TextInput {...c} {...register('password')} type="password" autoComplete="new-password" />}
      </Field>
      <Field label="New password again" error={errors.confirm?.message} required>
        {(c) => <TextInput {...c} {...register('confirm')} type="password" autoComplete="new-password" />}
      </Field>
      <div>
        <Button type="submit" variant="primary" busy={isSubmitting} busyLabel="Saving…">
          Set new password
        </Button>
      </div>
    </form>
  );
}
