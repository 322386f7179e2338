import { Stack } from 'expo-router';

import { VenueCreateScreen } from '@/components/screens/venue-form/venue-create-screen';

export default function NewVenueRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'New venue · Saggar' }} />
      <VenueCreateScreen />
    </>
  );
}
