import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { authClient, authErrorMessage, MIN_PASSWORD_LENGTH } from '../../../lib/auth-client';
import { signUpFormSchema, type SignUpForm as Values } from '../schemas';

/**
 * Sign-up answers alike whether or not the address already has an account (it must not tell), so the page
 * always says the same: look in your e-mail. A new account's message holds the link that confirms the address
 * and signs in (landing on `next`); an existing account's owner is told someone tried.
 */
export function SignUpForm({ next, defaultEmail = '' }: { next: string; defaultEmail?: string }) {
  const [failure, setFailure] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
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
      callbackURL: next,
    });
    if (error) {
      if (error.code === 'INVALID_EMAIL') {
        setError('email', { type: 'server', message: authErrorMessage(error) });
      } else if (error.code === 'PASSWORD_TOO_SHORT' || error.code === 'PASSWORD_TOO_LONG') {
        setError('password', { type: 'server', message: authErrorMessage(error) });
      } else {
        setFailure(authErrorMessage(error));
      }
      return;
    }
    setSentTo(values.email);
  });

  if (sentTo)
    return (
      <div className="flex flex-col gap-5">
        <Notice title="Check your e-mail" live>
          <p>
            We have sent a message to <strong className="break-all">{sentTo}</strong>. If this is a new
            account, open the link in it within an hour to confirm the address — that signs you in. If the
            address already has an account, the message says so; sign in or choose a new password instead.
          </p>
        </Notice>
        <p className="border-t border-rule pt-4 text-sm">
          <Link to={`/sign-in?next=${encodeURIComponent(next)}`}>Sign in</Link> ·{' '}
          <Link to="/forgot-password">Forgotten your password?</Link>
        </p>
      </div>
    );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <Field
        label="Name"
        hint="As it should appear on compliance sheets."
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
