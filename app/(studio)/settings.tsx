import { SettingsScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function SettingsRoute() {
  return (
    <>
      <PageTitle title="Settings · Saggar" />
      <SettingsScreen />
    </>
  );
}
