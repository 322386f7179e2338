import { Stack, useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { VenueEditScreen } from '@/components/screens/venue-form/venue-edit-screen';

export default function EditVenueRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const venueId = Number(id);
  if (!Number.isInteger(venueId) || venueId <= 0) return <NotFoundScreen />;
  return (
    <>
      <Stack.Screen options={{ title: 'Edit venue · Saggar' }} />
      <VenueEditScreen id={venueId} />
    </>
  );
}
