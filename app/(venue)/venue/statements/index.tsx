import { VenueStatementsScreen } from '@/components/screens/venue-statements/venue-statements-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function VenueStatementsRoute() {
  return (
    <>
      <PageTitle title="Statements · Saggar" />
      <VenueStatementsScreen />
    </>
  );
}
