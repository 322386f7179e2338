import { VenueCreateScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function NewVenueRoute() {
  return (
    <>
      <PageTitle title="New venue · Saggar" />
      <VenueCreateScreen />
    </>
  );
}
