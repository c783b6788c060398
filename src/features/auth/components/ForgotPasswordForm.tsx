import { useState } from 'react';
import { Link } from 'react-router';
import { Notice } from '../../../components/ui/Notice';
import { authClient, authErrorMessage } from '../../../lib/auth-client';
import { forgotFormSchema } from '../schemas';
import { AuthForm, emailField } from './AuthForm';

const backToSignIn = <Link to="/sign-in">Back to sign in</Link>;

export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="info" title="Check your e-mail" live>
          <p>
            If an account exists for <strong>{sentTo}</strong>, a link to choose a new password is on its way.
            The link works once and expires after a while.
          </p>
        </Notice>
        <p>{backToSignIn}</p>
      </div>
    );
  }

  return (
    <AuthForm
      schema={forgotFormSchema}
      defaultValues={{ email: '' }}
      fields={[emailField]}
      send={async ({ email }) => {
        const { error } = await authClient.requestPasswordReset({ email, redirectTo: '/reset-password' });
        if (error) return authErrorMessage(error);
        setSentTo(email);
      }}
      submitLabel="Send reset link"
      busyLabel="Sending…"
      beside={backToSignIn}
    />
  );
}
