import { MailScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function MailRoute() {
  return (
    <>
      <PageTitle title="Sent mail · Saggar" />
      <MailScreen />
    </>
  );
}
