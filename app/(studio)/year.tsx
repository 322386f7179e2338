import { YearScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function YearRoute() {
  return (
    <>
      <PageTitle title="The year · Saggar" />
      <YearScreen />
    </>
  );
}
