import { Stack } from 'expo-router';

import { WorkImportScreen } from '@/components/screens/work-import/work-import-screen';

export default function ImportWorksRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'Import works · Saggar' }} />
      <WorkImportScreen />
    </>
  );
}
