import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function NotFound() {
  return (
    <>
      <PageTitle title="Page not found" />
      <NotFoundScreen />
    </>
  );
}
