import { ChooseStudioScreen } from '@/components/screens/choose-studio/choose-studio-screen';
import { GateFallback } from '@/components/ui/gate-fallback';
import { PageTitle } from '@/components/ui/page-title';
import { useSessionGate } from '@/hooks/session';

export default function ChooseStudioRoute() {
  const gate = useSessionGate('choose-studio');
  if (gate.status !== 'ready') return <GateFallback gate={gate} />;
  return (
    <>
      <PageTitle title="Choose a studio · Saggar" />
      <ChooseStudioScreen />
    </>
  );
}
