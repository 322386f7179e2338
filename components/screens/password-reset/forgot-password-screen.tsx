import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { bindForm } from '@/components/ui/form/binding';
import { textCodec } from '@/components/ui/form/codecs';
import { emailInput, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { usePasswordResetRequestMutation } from '@/hooks/queries/password-reset';
import {
  type PasswordResetRequest,
  passwordResetRequestSchema,
} from '@/shared/schemas/password-reset';

const requestBinding = bindForm<PasswordResetRequest, PasswordResetRequest>(
  passwordResetRequestSchema,
  {
    email: {
      read: textCodec,
      blank: { required: 'Enter an e-mail address such as name@example.com.' },
    },
  },
);

/**
 * "Forgot password?": an address, then the same words whatever the server found, since it never
 * says whether the address has an account.
 */
export function ForgotPasswordScreen() {
  const request = usePasswordResetRequestMutation();
  const { control, formState, submit, getValues } = useSchemaForm(requestBinding, { email: '' });
  const send = submit(async (values) => {
    await request.mutateAsync(values);
  });
  const formError = formState.errors.root?.server?.message;

  return (
    <Screen testID="forgot-password-screen" narrow>
      <View style={styles.intro}>
        <Text variant="display">Saggar</Text>
      </View>
      <Card style={styles.form}>
        <Heading level={1}>Forgot your password?</Heading>
        {request.data ? (
          <>
            <Notice
              testID="forgot-sent"
              tone="info"
              message={`If ${getValues('email')} has a Saggar account, a link to choose a new password is on its way to it. The link works once, for ${request.data.linkLifetimeMinutes} minutes.`}
            />
            <Text variant="small">
              Nothing after a few minutes? Look in the spam or junk folder, check the address, and
              ask again.
            </Text>
            <View style={styles.actions}>
              <Button
                testID="forgot-again"
                label="Ask again"
                variant="secondary"
                onPress={() => request.reset()}
              />
              <TextLink testID="forgot-sign-in" href="/sign-in" label="Back to sign in" />
            </View>
          </>
        ) : (
          <>
            <Text>
              Type the e-mail address you sign in with. We will send it a link to choose a new
              password.
            </Text>
            {formError ? <Notice testID="forgot-error" message={formError} /> : null}
            <FormText
              control={control}
              name="email"
              testID="forgot-email"
              label="E-mail address"
              {...emailInput}
              returnKeyType="send"
              onSubmitEditing={send}
            />
            <Button
              testID="forgot-submit"
              label="Send the link"
              busyLabel="Sending…"
              busy={formState.isSubmitting}
              onPress={send}
            />
            <TextLink testID="forgot-sign-in" href="/sign-in" label="Back to sign in" />
          </>
        )}
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: spacing.sm, marginTop: spacing.xl },
  form: { gap: spacing.lg, padding: spacing.xl },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.lg },
});
