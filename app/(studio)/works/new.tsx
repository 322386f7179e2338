import { WorkCreateScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function NewWorkRoute() {
  return (
    <>
      <PageTitle title="New work · Saggar" />
      <WorkCreateScreen />
    </>
  );
}
