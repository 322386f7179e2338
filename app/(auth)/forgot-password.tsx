import { ForgotPasswordScreen } from '@/components/screens/password-reset/forgot-password-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function ForgotPasswordRoute() {
  return (
    <>
      <PageTitle title="Forgot password · Saggar" />
      <ForgotPasswordScreen />
    </>
  );
}
