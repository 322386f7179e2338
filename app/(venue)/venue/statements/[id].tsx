import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import {
  type PaymentReturn,
  VenueStatementScreen,
} from '@/components/screens/venue-statements/venue-statement-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function VenueStatementRoute() {
  // `payment` is where the payment page sends the person back: done or cancelled.
  const { id, payment } = useLocalSearchParams<{ id: string; payment?: string }>();
  const statementId = Number(id);
  if (!Number.isInteger(statementId) || statementId <= 0) return <NotFoundScreen />;
  const returned: PaymentReturn = payment === 'done' || payment === 'cancelled' ? payment : null;
  return (
    <>
      <PageTitle title="Statement · Saggar" />
      <VenueStatementScreen id={statementId} payment={returned} />
    </>
  );
}
