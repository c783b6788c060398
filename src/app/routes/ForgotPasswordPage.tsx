import { ForgotPasswordForm } from '../../features/auth/components/ForgotPasswordForm';
import { AuthPageFrame } from './AuthPageFrame';

export function ForgotPasswordPage() {
  return (
    <AuthPageFrame title="Reset your password" intro="We will e-mail you a link to choose a new one.">
      <ForgotPasswordForm />
    </AuthPageFrame>
  );
}
