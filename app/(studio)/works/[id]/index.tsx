import { Stack, useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { WorkScreen } from '@/components/screens/work/work-screen';

export default function WorkRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const workId = Number(id);
  if (!Number.isInteger(workId) || workId <= 0) return <NotFoundScreen />;
  return (
    <>
      <Stack.Screen options={{ title: 'Work · Saggar' }} />
      <WorkScreen id={workId} />
    </>
  );
}
