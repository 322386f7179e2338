import { Stack } from 'expo-router';

import { VenueHomeScreen } from '@/components/screens/venue-home/venue-home-screen';

export default function VenueHomeRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'Consignments · Saggar' }} />
      <VenueHomeScreen />
    </>
  );
}
