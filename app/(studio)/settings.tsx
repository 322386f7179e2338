import { SettingsScreen } from '@/components/screens/settings/settings-screen';
import { PageTitle } from '@/components/ui/page-title';

export default function SettingsRoute() {
  return (
    <>
      <PageTitle title="Settings · Saggar" />
      <SettingsScreen />
    </>
  );
}
