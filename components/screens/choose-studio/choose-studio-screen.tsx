import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import {
  areaHref,
  homeArea,
  useActiveMembershipMutation,
  useMeQuery,
  useSignOutMutation,
} from '@/hooks/session';

import { MembershipOption } from './membership-option';

export function ChooseStudioScreen() {
  const router = useRouter();
  const me = useMeQuery();
  const choose = useActiveMembershipMutation();
  const signOut = useSignOutMutation();

  const data = me.data;
  const open = (membershipId: number) =>
    choose.mutate(membershipId, { onSuccess: (next) => router.replace(areaHref(homeArea(next))) });

  return (
    <Screen testID="choose-studio-screen" narrow>
      <View style={styles.intro}>
        <Heading level={1}>Choose a studio</Heading>
        <Text variant="small">
          You work with more than one. You can change later from the menu.
        </Text>
      </View>
      {me.isPending ? (
        <LoadingView message="Finding your studios…" />
      ) : me.isError ? (
        <ErrorView error={me.error} onRetry={() => me.refetch()} />
      ) : !data || data.memberships.length === 0 ? (
        <EmptyView
          title="No studio yet"
          message="This account is not part of any studio. Ask the studio that invited you to send the invitation again."
        />
      ) : (
        <View style={styles.list}>
          {choose.isError ? <Notice message={errorMessage(choose.error)} /> : null}
          {data.memberships.map((membership) => (
            <MembershipOption
              key={membership.id}
              membership={membership}
              inUse={membership.id === data.activeMembershipId}
              opening={choose.isPending && choose.variables === membership.id}
              disabled={choose.isPending}
              onChoose={() => open(membership.id)}
            />
          ))}
        </View>
      )}
      {signOut.isError ? <Notice message={errorMessage(signOut.error)} /> : null}
      <View style={styles.signOut}>
        <Button
          testID="sign-out"
          label="Sign out"
          busyLabel="Signing out…"
          busy={signOut.isPending}
          variant="quiet"
          onPress={() => signOut.mutate()}
        />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: spacing.xs, marginTop: spacing.xl },
  list: { gap: spacing.md },
  signOut: { alignSelf: 'flex-start' },
});
