import { Stack } from 'expo-router';

import { VenuesScreen } from '@/components/screens/venues/venues-screen';

export default function VenuesRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'Venues · Saggar' }} />
      <VenuesScreen />
    </>
  );
}
