import { OverviewScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function OverviewRoute() {
  return (
    <>
      <PageTitle title="Overview · Saggar" />
      <OverviewScreen />
    </>
  );
}
