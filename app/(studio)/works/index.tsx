import { WorksScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function WorksRoute() {
  return (
    <>
      <PageTitle title="Works · Saggar" />
      <WorksScreen />
    </>
  );
}
