import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { VenueConsignmentScreen } from '@/components/screens/venue-consignment/venue-consignment-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function VenueConsignmentRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const consignmentId = Number(id);
  if (!Number.isInteger(consignmentId) || consignmentId <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Consignment · Saggar" />
      <VenueConsignmentScreen id={consignmentId} />
    </>
  );
}
