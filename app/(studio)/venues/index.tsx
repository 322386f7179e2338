import { VenuesScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function VenuesRoute() {
  return (
    <>
      <PageTitle title="Venues · Saggar" />
      <VenuesScreen />
    </>
  );
}
