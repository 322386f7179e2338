import { OverviewScreen } from '@/components/screens/overview/overview-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function OverviewRoute() {
  return (
    <>
      <PageTitle title="Overview · Saggar" />
      <OverviewScreen />
    </>
  );
}
