import { Redirect } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { bindForm } from '@/components/ui/form/binding';
import { textCodec } from '@/components/ui/form/codecs';
import { FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { useInvitationAcceptMutation, useInvitationQuery } from '@/hooks/queries/invitations';
import {
  type InvitationAccept,
  invitationAcceptSchema,
  type InvitationSummary,
} from '@/shared/schemas/invitation';

type AcceptValues = { token: string; name: string; password: string };

function bindingFor(existing: boolean) {
  return bindForm<AcceptValues, InvitationAccept>(invitationAcceptSchema, {
    token: { read: textCodec },
    name: existing
      ? { read: textCodec, when: () => false }
      : { read: textCodec, blank: { required: 'Enter your name.' } },
    password: { read: textCodec, blank: { required: 'Enter a password.' } },
  });
}

function AcceptForm({ token, invitation }: { token: string; invitation: InvitationSummary }) {
  const accept = useInvitationAcceptMutation();
  const existing = invitation.existingAccount;
  const { control, formState, submit } = useSchemaForm(bindingFor(existing), {
    token,
    name: '',
    password: '',
  });
  if (accept.isSuccess) return <Redirect href="/venue" />;
  const send = submit(async (body) => {
    await accept.mutateAsync(body);
  });
  return (
    <Card style={styles.form}>
      <Text>
        {existing
          ? `${invitation.email} already has a Saggar account: enter its password to add ${invitation.venueName ?? 'the venue'} to it.`
          : `Choose your name as the studio will see it, and a password for ${invitation.email}.`}
      </Text>
      {existing ? null : (
        <FormText
          control={control}
          name="name"
          testID="invite-name"
          label="Your name"
          autoComplete="name"
        />
      )}
      <FormText
        control={control}
        name="password"
        testID="invite-password"
        label={existing ? 'Your password' : 'A password'}
        hint={existing ? undefined : 'At least 10 characters.'}
        secureTextEntry
        autoComplete={existing ? 'current-password' : 'new-password'}
        onSubmitEditing={send}
      />
      {formState.errors.root?.server?.message ? (
        <Notice testID="invite-error" message={formState.errors.root.server.message} />
      ) : null}
      <Button
        testID="invite-submit"
        label={existing ? 'Add it and sign in' : 'Join and sign in'}
        busyLabel="Joining…"
        busy={formState.isSubmitting}
        onPress={send}
      />
    </Card>
  );
}

const closedWords: Record<Exclude<InvitationSummary['state'], 'open'>, string> = {
  used: 'This invitation has been used already. Sign in with your e-mail address and password.',
  expired: 'This invitation has expired. Ask the studio to send a new one.',
};

/** An invitation link: who invites whom to what, then a name and password, or a used link said so. */
export function InvitationScreen({ token }: { token: string }) {
  const invitation = useInvitationQuery(token);
  return (
    <Screen testID="invitation-screen" narrow>
      <View style={styles.intro}>
        <Text variant="display">Saggar</Text>
        {invitation.data ? (
          <Heading level={1}>
            {`Join ${invitation.data.venueName ?? 'the venue'} for ${invitation.data.studioName}’s work`}
          </Heading>
        ) : null}
      </View>
      {invitation.isPending ? (
        <LoadingView message="Reading the invitation…" />
      ) : invitation.isError ? (
        <ErrorView error={invitation.error} />
      ) : invitation.data.state === 'open' ? (
        <>
          <Text variant="small">{`The link works once, until ${formatDate(invitation.data.expiresAt.slice(0, 10))}.`}</Text>
          <AcceptForm token={token} invitation={invitation.data} />
        </>
      ) : (
        <Card style={styles.form}>
          <Notice testID="invite-closed" message={closedWords[invitation.data.state]} />
          <TextLink href="/sign-in" label="Sign in" />
        </Card>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: spacing.sm, marginTop: spacing.xl },
  form: { gap: spacing.lg, padding: spacing.xl },
});
