import { Navigate, useSearchParams } from 'react-router';
import { SignInForm } from '../../features/auth/components/SignInForm';
import { useMe } from '../../features/me/api/get-me';
import { safeNext } from '../../lib/safe-next';
import { AuthPageFrame } from './AuthPageFrame';

export function SignInPage() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <AuthPageFrame title="Sign in" intro="Prove the wall before it is built.">
      <SignInForm next={next} defaultEmail={params.get('email') ?? ''} />
    </AuthPageFrame>
  );
}
