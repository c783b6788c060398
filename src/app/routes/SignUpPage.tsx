import { SignUpForm } from '../../features/auth/components/SignUpForm';
import { SignedOutPage } from './AuthPageFrame';

export function SignUpPage() {
  return (
    <SignedOutPage
      title="Create an account"
      intro="For architects, envelope consultants, engineers and cladding subcontractors."
      Form={SignUpForm}
    />
  );
}
