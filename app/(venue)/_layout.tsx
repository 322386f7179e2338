import { Stack } from 'expo-router';

import { GateFallback } from '@/components/ui/gate-fallback';
import { Shell } from '@/components/ui/shell';
import { venueNav } from '@/constants/navigation';
import { useMembershipGate } from '@/hooks/session';

/**
 * Anyone who works for a venue, whichever studio is active; owners and assistants go to the
 * studio's overview. Signed out, sign-in brings them back to the page asked for.
 */
export default function VenueLayout() {
  const gate = useMembershipGate('venue');
  if (gate.status !== 'ready') return <GateFallback gate={gate} />;
  return (
    <Shell nav={venueNav} me={gate.me} membership={gate.membership}>
      <Stack screenOptions={{ headerShown: false }} />
    </Shell>
  );
}
