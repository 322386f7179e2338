import { VenueCreateScreen } from '@/components/screens/venue-form/venue-create-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function NewVenueRoute() {
  return (
    <>
      <PageTitle title="New venue · Saggar" />
      <VenueCreateScreen />
    </>
  );
}
