import { Stack } from 'expo-router';

import { GateFallback } from '@/components/ui/gate-fallback';
import { Shell } from '@/components/ui/shell';
import { navFor, studioNav } from '@/constants/navigation';
import { useMembershipGate } from '@/hooks/session';

/**
 * Owners and assistants only: signed out goes to sign-in (and back to the page asked for), gallery
 * staff to their venue.
 */
export default function StudioLayout() {
  const gate = useMembershipGate('studio');
  if (gate.status !== 'ready') return <GateFallback gate={gate} />;
  return (
    <Shell nav={navFor(studioNav, gate.membership.role)} me={gate.me} membership={gate.membership}>
      <Stack screenOptions={{ headerShown: false }} />
    </Shell>
  );
}
