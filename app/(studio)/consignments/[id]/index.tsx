import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { ConsignmentScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function ConsignmentRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const consignmentId = Number(id);
  if (!Number.isInteger(consignmentId) || consignmentId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Consignment · Saggar" />
      <ConsignmentScreen id={consignmentId} />
    </>
  );
}
