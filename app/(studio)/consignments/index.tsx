import { ConsignmentsScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function ConsignmentsRoute() {
  return (
    <>
      <PageTitle title="Consignments · Saggar" />
      <ConsignmentsScreen />
    </>
  );
}
