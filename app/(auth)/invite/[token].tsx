import { useLocalSearchParams } from 'expo-router';

import { InvitationScreen } from '@/components/screens/invitation/invitation-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function InvitationRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return (
    <>
      <PageTitle title="Invitation · Saggar" />
      <InvitationScreen token={token ?? ''} />
    </>
  );
}
