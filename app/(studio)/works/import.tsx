import { WorkImportScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function ImportWorksRoute() {
  return (
    <>
      <PageTitle title="Import works · Saggar" />
      <WorkImportScreen />
    </>
  );
}
