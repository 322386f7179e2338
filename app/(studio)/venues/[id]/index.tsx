import { Stack, useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { VenueScreen } from '@/components/screens/venue/venue-screen';

export default function VenueRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const venueId = Number(id);
  if (!Number.isInteger(venueId) || venueId <= 0) return <NotFoundScreen />;
  return (
    <>
      <Stack.Screen options={{ title: 'Venue · Saggar' }} />
      <VenueScreen id={venueId} />
    </>
  );
}
