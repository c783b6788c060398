import { SignInForm } from '../../features/auth/components/SignInForm';
import { SignedOutPage } from './AuthPageFrame';

export function SignInPage() {
  return <SignedOutPage title="Sign in" intro="Prove the wall before it is built." Form={SignInForm} />;
}
