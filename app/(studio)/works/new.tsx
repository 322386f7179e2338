import { Stack } from 'expo-router';

import { WorkCreateScreen } from '@/components/screens/work-form/work-create-screen';

export default function NewWorkRoute() {
  return (
    <>
      <Stack.Screen options={{ title: 'New work · Saggar' }} />
      <WorkCreateScreen />
    </>
  );
}
