import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { StatementScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function StatementRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const statementId = Number(id);
  if (!Number.isInteger(statementId) || statementId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Statement · Saggar" />
      <StatementScreen id={statementId} />
    </>
  );
}
