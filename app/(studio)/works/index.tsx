import { Stack } from 'expo-router';

import { WorksScreen } from '@/components/screens/works/works-screen';

export default function WorksRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'Works · Saggar' }} />
      <WorksScreen />
    </>
  );
}
