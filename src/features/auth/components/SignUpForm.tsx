import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { authClient, authErrorMessage, MIN_PASSWORD_LENGTH } from '../../../lib/auth-client';
import { startSessionCache } from '../../../lib/session-cache';
import { signUpFormSchema, type SignUpForm as Values } from '../schemas';

export function SignUpForm({ next, defaultEmail = '' }: { next: string; defaultEmail?: string }) {
  const navigate = useNavigate();
  const qc = useQueryClient();
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Values>({
    resolver: zodResolver(signUpFormSchema),
    defaultValues: { name: '', email: defaultEmail, password: '', confirm: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const { error } = await authClient.signUp.email({
      name: values.name,
      email: values.email,
      password: values.password,
    });
    if (error) {
      if (error.status === 422 || error.code === 'USER_ALREADY_EXISTS') {
        setError('email', { type: 'server', message: authErrorMessage(error) });
      } else if (error.code === 'PASSWORD_TOO_SHORT' || error.code === 'PASSWORD_TOO_LONG') {
        setError('password', { type: 'server', message: authErrorMessage(error) });
      } else {
        setFailure(authErrorMessage(error));
      }
      return;
    }
    await startSessionCache(qc);
    navigate(next, { replace: true });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <Field
        label="Name"
        hint="As it should appear on calculation sheets."
        error={errors.name?.message}
        required
      >
        {(c) => <TextInput {...c} {...register('name')} autoComplete="name" />}
      </Field>
      <Field label="E-mail" error={errors.email?.message} required>
        {(c) => <TextInput {...c} {...register('email')} type="email" autoComplete="email" />}
      </Field>
      <Field
        label="Password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={errors.password?.message}
        required
      >
        {(c) => <TextInput {...c} {...register('password')} type="password" autoComplete="new-password" />}
      </Field>
      <Field label="Password again" error={errors.confirm?.message} required>
        {(c) => <TextInput {...c} {...register('confirm')} type="password" autoComplete="new-password" />}
      </Field>
      <div>
        <Button type="submit" variant="primary" busy={isSubmitting} busyLabel="Creating account…">
          Create account
        </Button>
      </div>
      <p className="border-t border-rule pt-4 text-sm">
        Already have an account? <Link to={`/sign-in?next=${encodeURIComponent(next)}`}>Sign in</Link>
      </p>
    </form>
  );
}
