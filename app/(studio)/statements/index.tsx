import { StatementsScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function StatementsRoute() {
  return (
    <>
      <PageTitle title="Statements · Saggar" />
      <StatementsScreen />
    </>
  );
}
