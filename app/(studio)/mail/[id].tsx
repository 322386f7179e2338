import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { MailMessageScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function MailMessageRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const messageId = Number(id);
  if (!Number.isInteger(messageId) || messageId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Message · Saggar" />
      <MailMessageScreen id={messageId} />
    </>
  );
}
