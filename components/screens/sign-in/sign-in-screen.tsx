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
import { useSignInMutation } from '@/hooks/session';
import { type SignIn, signInSchema } from '@/shared/schemas/session';

const signInBinding = bindForm<SignIn, SignIn>(signInSchema, {
  email: {
    read: textCodec,
    blank: { required: 'Enter an e-mail address such as name@example.com.' },
  },
  password: { read: textCodec, blank: { required: 'Enter your password.' } },
});

/** `notice`: news from the page before, such as a password just changed. */
export function SignInScreen({ notice = null }: { notice?: string | null }) {
  const signIn = useSignInMutation();
  const { control, formState, submit } = useSchemaForm(signInBinding, { email: '', password: '' });
  const send = submit(async (values) => {
    await signIn.mutateAsync(values);
  });
  const formError = formState.errors.root?.server?.message;

  return (
    <Screen testID="sign-in-screen" narrow>
      <View style={styles.intro}>
        <Text variant="display">Saggar</Text>
        <Text variant="small">
          Keeps track of work out on sale or return, for makers and their venues.
        </Text>
      </View>
      <Card style={styles.form}>
        <Heading level={1}>Sign in</Heading>
        {notice ? <Notice testID="sign-in-notice" tone="info" message={notice} /> : null}
        {formError ? <Notice testID="sign-in-error" message={formError} /> : null}
        <FormText
          control={control}
          name="email"
          testID="sign-in-email"
          label="E-mail address"
          {...emailInput}
          returnKeyType="next"
        />
        <FormText
          control={control}
          name="password"
          testID="sign-in-password"
          label="Password"
          secureTextEntry
          autoComplete="current-password"
          textContentType="password"
          returnKeyType="go"
          onSubmitEditing={send}
        />
        <Button
          testID="sign-in-submit"
          label="Sign in"
          busyLabel="Signing in…"
          busy={formState.isSubmitting}
          onPress={send}
        />
        <TextLink testID="sign-in-forgot" href="/forgot-password" label="Forgot password?" />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: spacing.sm, marginTop: spacing.xl },
  form: { gap: spacing.lg, padding: spacing.xl },
});
