import { useState } from 'react';
import { Link } from 'react-router';
import { Notice } from '../../../components/ui/Notice';
import { authClient, authErrorMessage } from '../../../lib/auth-client';
import { signUpFormSchema } from '../schemas';
import { AuthForm, emailField, newPasswordFields } from './AuthForm';

const fields = [
  { name: 'name', label: 'Name', hint: 'As it should appear on compliance sheets.', autoComplete: 'name' },
  emailField,
  ...newPasswordFields('Password'),
];

/**
 * Sign-up answers alike whether or not the address already has an account (it must not tell), so the page
 * always says the same: look in your e-mail. A new account's message holds the link that confirms the address
 * and signs in (landing on `next`); an existing account's owner is told someone tried.
 */
export function SignUpForm({ next, defaultEmail = '' }: { next: string; defaultEmail?: string }) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const signIn = <Link to={`/sign-in?next=${encodeURIComponent(next)}`}>Sign in</Link>;

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
          {signIn} · <Link to="/forgot-password">Forgotten your password?</Link>
        </p>
      </div>
    );

  return (
    <AuthForm
      schema={signUpFormSchema}
      defaultValues={{ name: '', email: defaultEmail, password: '', confirm: '' }}
      fields={fields}
      send={async ({ name, email, password }, setError) => {
        const { error } = await authClient.signUp.email({ name, email, password, callbackURL: next });
        if (!error) return void setSentTo(email);
        const field =
          error.code === 'INVALID_EMAIL'
            ? 'email'
            : error.code === 'PASSWORD_TOO_SHORT' || error.code === 'PASSWORD_TOO_LONG'
              ? 'password'
              : null;
        if (!field) return authErrorMessage(error);
        setError(field, { type: 'server', message: authErrorMessage(error) });
      }}
      submitLabel="Create account"
      busyLabel="Creating account…"
      footer={<>Already have an account? {signIn}</>}
    />
  );
}
