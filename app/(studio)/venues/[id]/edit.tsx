import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { VenueEditScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function EditVenueRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const venueId = Number(id);
  if (!Number.isInteger(venueId) || venueId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Edit venue · Saggar" />
      <VenueEditScreen id={venueId} />
    </>
  );
}
