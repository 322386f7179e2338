import { useLocalSearchParams } from 'expo-router';

import { ConsignmentCreateScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function ConsignmentCreateRoute() {
  const { venueId } = useLocalSearchParams<{ venueId?: string }>();
  const venue = Number(venueId);
  return (
    <>
      <PageTitle title="New consignment · Saggar" />
      <ConsignmentCreateScreen venueId={Number.isInteger(venue) && venue > 0 ? venue : null} />
    </>
  );
}
