import { Redirect, useLocalSearchParams } from 'expo-router';

import { SignInScreen } from '@/components/screens/sign-in/sign-in-screen';
import { PageTitle } from '@/components/ui/page-title';
import { useSessionGate } from '@/hooks/session';

export default function SignInRoute() {
  // Where to go once signed in (a scanned label's piece, say); the gate keeps only safe paths.
  const { next, password } = useLocalSearchParams<{ next?: string; password?: string }>();
  const gate = useSessionGate('sign-in', next);
  // The form shows while the session loads or fails: signing in is the way out of both.
  if (gate.status === 'redirect') return <Redirect href={gate.href} />;
  return (
    <>
      <PageTitle title="Sign in · Saggar" />
      <SignInScreen
        notice={
          password === 'changed'
            ? 'Your password has been changed. Sign in with the new one.'
            : null
        }
      />
    </>
  );
}
