import { VenuesScreen } from '@/components/screens/venues/venues-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function VenuesRoute() {
  return (
    <>
      <PageTitle title="Venues · Saggar" />
      <VenuesScreen />
    </>
  );
}
