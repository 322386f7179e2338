import { Stack } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';

export default function NotFound() {
  return (
    <>
      <Stack.Screen options={{ title: 'Page not found' }} />
      <NotFoundScreen />
    </>
  );
}
