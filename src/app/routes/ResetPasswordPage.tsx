import { Link, useSearchParams } from 'react-router';
import { Notice } from '../../components/ui/Notice';
import { ResetPasswordForm } from '../../features/auth/components/ResetPasswordForm';
import { AuthPageFrame } from './AuthPageFrame';

export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const failed = params.get('error');
  return (
    <AuthPageFrame title="Choose a new password">
      {!token || failed ? (
        <Notice tone="caution" title="This reset link is not valid any more.">
          <p>
            Links work once and expire. <Link to="/forgot-password">Ask for a new one</Link>.
          </p>
        </Notice>
      ) : (
        <ResetPasswordForm token={token} />
      )}
    </AuthPageFrame>
  );
}
