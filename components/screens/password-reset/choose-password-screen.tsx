import { Redirect } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { bindForm } from '@/components/ui/form/binding';
import { textCodec } from '@/components/ui/form/codecs';
import { FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import {
  usePasswordResetLinkQuery,
  usePasswordResetMutation,
} from '@/hooks/queries/password-reset';
import {
  type PasswordReset,
  type PasswordResetLink,
  passwordResetSchema,
} from '@/shared/schemas/password-reset';

const resetBinding = bindForm<PasswordReset, PasswordReset>(passwordResetSchema, {
  token: { read: textCodec },
  password: { read: textCodec, blank: { required: 'Choose a password.' } },
});

function NewPasswordForm({ token, email }: { token: string; email: string }) {
  const reset = usePasswordResetMutation();
  const { control, formState, submit } = useSchemaForm(resetBinding, { token, password: '' });
  if (reset.isSuccess)
    return <Redirect href={{ pathname: '/sign-in', params: { password: 'changed' } }} />;
  const send = submit(async (body) => {
    await reset.mutateAsync(body);
  });
  const formError = formState.errors.root?.server?.message;
  return (
    <>
      <Text>{`For ${email}. Saving it signs this account out on every device; then sign in with the new password.`}</Text>
      {formError ? <Notice testID="reset-error" message={formError} /> : null}
      <FormText
        control={control}
        name="password"
        testID="reset-password"
        label="New password"
        hint="At least 10 characters."
        secureTextEntry
        autoComplete="new-password"
        textContentType="newPassword"
        returnKeyType="go"
        onSubmitEditing={send}
      />
      <Button
        testID="reset-submit"
        label="Save the new password"
        busyLabel="Saving…"
        busy={formState.isSubmitting}
        onPress={send}
      />
    </>
  );
}

const closedWords: Record<Exclude<PasswordResetLink['state'], 'open'>, string> = {
  used: 'This link has been used already: the password was changed with it. Sign in with the new password, or ask for a new link if you need one.',
  expired:
    'This link has expired: a link to choose a new password works only for a short while. Ask for a new one.',
};

/** Somewhere to go from a link that no longer works: a new link, or sign-in. */
function WayOn() {
  return (
    <View style={styles.actions}>
      <TextLink testID="reset-ask-again" href="/forgot-password" label="Ask for a new link" />
      <TextLink testID="reset-sign-in" href="/sign-in" label="Sign in" />
    </View>
  );
}

/** A link from the e-mail: a new password while it works, or plainly why it no longer does. */
export function ChoosePasswordScreen({ token }: { token: string }) {
  const link = usePasswordResetLinkQuery(token);
  return (
    <Screen testID="choose-password-screen" narrow>
      <View style={styles.intro}>
        <Text variant="display">Saggar</Text>
      </View>
      <Card style={styles.form}>
        <Heading level={1}>Choose a new password</Heading>
        {link.isPending ? (
          <LoadingView message="Reading the link…" />
        ) : link.isError ? (
          <>
            <ErrorView error={link.error} />
            <WayOn />
          </>
        ) : link.data.state === 'open' ? (
          <NewPasswordForm token={token} email={link.data.email} />
        ) : (
          <>
            <Notice testID="reset-closed" message={closedWords[link.data.state]} />
            <WayOn />
          </>
        )}
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: spacing.sm, marginTop: spacing.xl },
  form: { gap: spacing.lg, padding: spacing.xl },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
