import { useLocalSearchParams } from 'expo-router';

import { ChoosePasswordScreen } from '@/components/screens/password-reset/choose-password-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function ChoosePasswordRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return (
    <>
      <PageTitle title="Choose a new password · Saggar" />
      <ChoosePasswordScreen token={token ?? ''} />
    </>
  );
}
