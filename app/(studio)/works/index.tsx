import { WorksScreen } from '@/components/screens/works/works-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function WorksRoute() {
  return (
    <>
      <PageTitle title="Works · Saggar" />
      <WorksScreen />
    </>
  );
}
