import { Stack } from 'expo-router';

import { OverviewScreen } from '@/components/screens/overview/overview-screen';

export default function OverviewRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'Overview · Saggar' }} />
      <OverviewScreen />
    </>
  );
}
