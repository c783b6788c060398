import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router';
import { authClient, authErrorMessage } from '../../../lib/auth-client';
import { startSessionCache } from '../../../lib/session-cache';
import { signInFormSchema } from '../schemas';
import { AuthForm, emailField } from './AuthForm';

const fields = [
  emailField,
  { name: 'password', label: 'Password', type: 'password', autoComplete: 'current-password' } as const,
];

export function SignInForm({ next, defaultEmail = '' }: { next: string; defaultEmail?: string }) {
  const navigate = useNavigate();
  const qc = useQueryClient();
  return (
    <AuthForm
      schema={signInFormSchema}
      defaultValues={{ email: defaultEmail, password: '' }}
      fields={fields}
      send={async ({ email, password }) => {
        const { error } = await authClient.signIn.email({ email, password });
        if (error)
          return error.status === 401
            ? 'That e-mail and password do not match an account we can sign in. A new account needs the link we e-mailed first; after repeated wrong passwords, sign-in pauses for a while (choosing a new password ends the pause).'
            : authErrorMessage(error);
        await startSessionCache(qc);
        navigate(next, { replace: true });
      }}
      submitLabel="Sign in"
      busyLabel="Signing in…"
      beside={<Link to="/forgot-password">Forgotten your password?</Link>}
      footer={
        <>
          New to Skinwright? <Link to={`/sign-up?next=${encodeURIComponent(next)}`}>Create an account</Link>
        </>
      }
    />
  );
}
