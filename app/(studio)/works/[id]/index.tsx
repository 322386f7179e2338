import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { WorkScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function WorkRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const workId = Number(id);
  if (!Number.isInteger(workId) || workId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Work · Saggar" />
      <WorkScreen id={workId} />
    </>
  );
}
