import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { spacing } from '@/constants/theme';
import { ApiError, errorMessage } from '@/hooks/api-errors';
import { useSignInMutation } from '@/hooks/session';
import { type SignIn, signInSchema } from '@/shared/schemas/session';

const fields = ['email', 'password'] as const satisfies readonly (keyof SignIn)[];

export function SignInScreen() {
  const signIn = useSignInMutation();
  const { control, handleSubmit, setError, formState } = useForm<SignIn>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const submit = handleSubmit(async (values) => {
    try {
      await signIn.mutateAsync(values);
    } catch (error) {
      const fieldErrors = error instanceof ApiError ? error.fieldErrors : {};
      const onFields = fields.filter((field) => fieldErrors[field] !== undefined);
      for (const field of onFields) setError(field, { message: fieldErrors[field] });
      if (onFields.length === 0) setError('root.server', { message: errorMessage(error) });
    }
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
        {formError ? <Notice testID="sign-in-error" message={formError} /> : null}
        <Controller
          control={control}
          name="email"
          render={({ field, fieldState }) => (
            <TextField
              ref={field.ref}
              testID="sign-in-email"
              label="E-mail address"
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={fieldState.error?.message}
              autoCapitalize="none"
              autoComplete="email"
              autoCorrect={false}
              inputMode="email"
              keyboardType="email-address"
              textContentType="emailAddress"
              returnKeyType="next"
            />
          )}
        />
        <Controller
          control={control}
          name="password"
          render={({ field, fieldState }) => (
            <TextField
              ref={field.ref}
              testID="sign-in-password"
              label="Password"
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={fieldState.error?.message}
              secureTextEntry
              autoComplete="current-password"
              textContentType="password"
              returnKeyType="go"
              onSubmitEditing={submit}
            />
          )}
        />
        <Button
          testID="sign-in-submit"
          label="Sign in"
          busyLabel="Signing in…"
          busy={formState.isSubmitting}
          onPress={submit}
        />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: spacing.sm, marginTop: spacing.xl },
  form: { gap: spacing.lg, padding: spacing.xl },
});
