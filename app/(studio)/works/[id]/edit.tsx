import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { WorkEditScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function EditWorkRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const workId = Number(id);
  if (!Number.isInteger(workId) || workId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Edit work · Saggar" />
      <WorkEditScreen id={workId} />
    </>
  );
}
