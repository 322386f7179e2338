import { Redirect } from 'expo-router';

import { SignInScreen } from '@/components/screens/sign-in/sign-in-screen';
import { PageTitle } from '@/components/ui/page-title';
import { useSessionGate } from '@/hooks/session';

export default function SignInRoute() {
  const gate = useSessionGate('sign-in');
  // The form shows while the session loads or fails: signing in is the way out of both.
  if (gate.status === 'redirect') return <Redirect href={gate.href} />;
  return (
    <>
      <PageTitle title="Sign in · Saggar" />
      <SignInScreen />
    </>
  );
}
