import { Stack } from 'expo-router';

import { ChooseStudioScreen } from '@/components/screens/choose-studio/choose-studio-screen';
import { GateFallback } from '@/components/ui/gate-fallback';
import { useSessionGate } from '@/hooks/session';

export default function ChooseStudioRoute() {
  const gate = useSessionGate('choose-studio');
  if (gate.status !== 'ready') return <GateFallback gate={gate} />;
  return (
    <>
      <Stack.Screen options={{ title: 'Choose a studio · Saggar' }} />
      <ChooseStudioScreen />
    </>
  );
}
