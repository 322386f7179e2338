import { WorkCreateScreen } from '@/components/screens/work-form/work-create-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function NewWorkRoute() {
  return (
    <>
      <PageTitle title="New work · Saggar" />
      <WorkCreateScreen />
    </>
  );
}
