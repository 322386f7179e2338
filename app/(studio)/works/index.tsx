import { useLocalSearchParams } from 'expo-router';

import { WorksScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function WorksRoute() {
  const { status } = useLocalSearchParams<{ status?: string }>();
  return (
    <>
      <PageTitle title="Works · Saggar" />
      <WorksScreen statusParam={status} />
    </>
  );
}
