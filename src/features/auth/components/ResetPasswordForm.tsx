import { useState } from 'react';
import { Link } from 'react-router';
import { Notice } from '../../../components/ui/Notice';
import { authClient, authErrorMessage } from '../../../lib/auth-client';
import { resetFormSchema } from '../schemas';
import { AuthForm, newPasswordFields } from './AuthForm';

const fields = newPasswordFields('New password');

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState(false);

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
    <AuthForm
      schema={resetFormSchema}
      defaultValues={{ password: '', confirm: '' }}
      fields={fields}
      send={async ({ password }) => {
        const { error } = await authClient.resetPassword({ newPassword: password, token });
        if (error)
          return error.code === 'INVALID_TOKEN'
            ? 'This reset link has expired or was already used. Ask for a new one.'
            : authErrorMessage(error);
        setDone(true);
      }}
      submitLabel="Set new password"
      busyLabel="Saving…"
      failureHelp={
        <p>
          <Link to="/forgot-password">Ask for a new reset link</Link>
        </p>
      }
    />
  );
}
