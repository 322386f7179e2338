import { WorkImportScreen } from '@/components/screens/work-import/work-import-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function ImportWorksRoute() {
  return (
    <>
      <PageTitle title="Import works · Saggar" />
      <WorkImportScreen />
    </>
  );
}
