import { MoreScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function MoreRoute() {
  return (
    <>
      <PageTitle title="More · Saggar" />
      <MoreScreen />
    </>
  );
}
