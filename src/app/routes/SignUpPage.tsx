import { Navigate, useSearchParams } from 'react-router';
import { SignUpForm } from '../../features/auth/components/SignUpForm';
import { useMe } from '../../features/me/api/get-me';
import { safeNext } from '../../lib/safe-next';
import { AuthPageFrame } from './AuthPageFrame';

export function SignUpPage() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <AuthPageFrame
      title="Create an account"
      intro="For architects, envelope consultants, engineers and cladding subcontractors."
    >
      <SignUpForm next={next} defaultEmail={params.get('email') ?? ''} />
    </AuthPageFrame>
  );
}
