import { VenueHomeScreen } from '@/components/screens/venue-home/venue-home-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function VenueHomeRoute() {
  return (
    <>
      <PageTitle title="Counter · Saggar" />
      <VenueHomeScreen />
    </>
  );
}
