import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { authClient, authErrorMessage } from '../../../lib/auth-client';
import { startSessionCache } from '../../../lib/session-cache';
import { signInFormSchema, type SignInForm as Values } from '../schemas';

export function SignInForm({ next, defaultEmail = '' }: { next: string; defaultEmail?: string }) {
  const navigate = useNavigate();
  const qc = useQueryClient();
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<Values>({
    resolver: zodResolver(signInFormSchema),
    defaultValues: { email: defaultEmail, password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const { error } = await authClient.signIn.email({ email: values.email, password: values.password });
    if (error) {
      setFailure(
        error.status === 401
          ? 'That e-mail and password do not match an account we can sign in. A new account needs the link we e-mailed first; after repeated wrong passwords, sign-in pauses for a while (choosing a new password ends the pause).'
          : authErrorMessage(error),
      );
      return;
    }
    await startSessionCache(qc);
    navigate(next, { replace: true });
  });

  const nextParam = `?next=${encodeURIComponent(next)}`;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <Field label="E-mail" error={errors.email?.message} required>
        {(c) => <TextInput {...c} {...register('email')} type="email" autoComplete="email" />}
      </Field>
      <Field label="Password" error={errors.password?.message} required>
        {(c) => (
          <TextInput {...c} {...register('password')} type="password" autoComplete="current-password" />
        )}
      </Field>
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" variant="primary" busy={isSubmitting} busyLabel="Signing in…">
          Sign in
        </Button>
        <Link to="/forgot-password">Forgotten your password?</Link>
      </div>
      <p className="border-t border-rule pt-4 text-sm">
        New to Skinwright? <Link to={`/sign-up${nextParam}`}>Create an account</Link>
      </p>
    </form>
  );
}
