import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { moneyText, parseMoneyText } from '@/components/ui/decimal-text';
import { FieldList } from '@/components/ui/field-list';
import { serverErrors } from '@/components/ui/form-errors';
import { MoneyField } from '@/components/ui/money-field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { spacing } from '@/constants/theme';
import { useStudioQuery, useStudioUpdateMutation } from '@/hooks/queries/studio';
import { activeMembership, useMeQuery } from '@/hooks/session';
import { formatMoney } from '@/shared/money/format';
import {
  type StudioSettings,
  type StudioSettingsUpdate,
  studioSettingsUpdateSchema,
} from '@/shared/schemas/studio';

type SettingsValues = { stockNumberPattern: string; priceStep: string };
const fields = ['stockNumberPattern', 'priceStep'] as const;
const fieldFor = (path: string) => fields.find((field) => field === path.split('.')[0]);

function SettingsForm({ settings }: { settings: StudioSettings }) {
  const update = useStudioUpdateMutation();
  const check = zodResolver(studioSettingsUpdateSchema);
  const { control, handleSubmit, setError, formState, reset } = useForm<
    SettingsValues,
    unknown,
    StudioSettingsUpdate
  >({
    defaultValues: {
      stockNumberPattern: settings.stockNumberPattern,
      priceStep: moneyText({ amount: settings.priceStep, currency: settings.currency }),
    },
    resolver: async (values, context, options) => {
      const step = parseMoneyText(values.priceStep, settings.currency);
      if (step.kind !== 'ok') {
        const message =
          step.kind === 'empty' ? 'Enter the price step, such as 5.00.' : step.message;
        return { values: {}, errors: { priceStep: { type: 'parse', message } } };
      }
      return check(
        { stockNumberPattern: values.stockNumberPattern, priceStep: step.value.amount },
        context,
        options as never,
      ) as never;
    },
  });
  const submit = handleSubmit(async (values) => {
    try {
      const saved = await update.mutateAsync(values);
      // The saved values become the form's baseline, so "saved" shows until the next edit.
      reset({
        stockNumberPattern: saved.stockNumberPattern,
        priceStep: moneyText({ amount: saved.priceStep, currency: saved.currency }),
      });
    } catch (error) {
      const message = serverErrors(error, fieldFor, (field, e) => setError(field, e));
      if (message !== null) setError('root.server', { message });
    }
  });
  const formError = formState.errors.root?.server?.message;
  return (
    <Card style={styles.form}>
      <Controller
        control={control}
        name="stockNumberPattern"
        render={({ field, fieldState }) => (
          <TextField
            ref={field.ref}
            testID="settings-pattern"
            label="Stock-number pattern"
            hint="{YYYY} or {YY} for the year and {NNN} for a counter: {YYYY}-{NNN} gives 2026-007."
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
            autoCapitalize="characters"
            autoCorrect={false}
          />
        )}
      />
      <Text
        variant="small"
        testID="settings-next"
      >{`Next stock number: ${settings.nextStockNumber}`}</Text>
      <Controller
        control={control}
        name="priceStep"
        render={({ field, fieldState }) => (
          <MoneyField
            ref={field.ref}
            testID="settings-price-step"
            label="Price step"
            hint="Planned list prices are rounded up to a multiple of this."
            currency={settings.currency}
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        )}
      />
      {formError ? <Notice message={formError} /> : null}
      {update.isSuccess && !formState.isDirty ? (
        <Notice tone="info" testID="settings-saved" message="Settings saved." />
      ) : null}
      <View style={styles.submit}>
        <Button
          testID="settings-submit"
          label="Save settings"
          busyLabel="Saving…"
          busy={formState.isSubmitting}
          onPress={submit}
        />
      </View>
    </Card>
  );
}

export function SettingsScreen() {
  const me = useMeQuery();
  const studio = useStudioQuery();
  const role = me.data ? activeMembership(me.data)?.role : undefined;
  return (
    <Screen testID="settings-screen" narrow>
      <View style={styles.heading}>
        <Heading level={1}>Settings</Heading>
        {studio.data ? <Text variant="small">{studio.data.name}</Text> : null}
      </View>
      {studio.isPending ? (
        <LoadingView message="Fetching the studio’s settings…" />
      ) : studio.isError ? (
        <ErrorView error={studio.error} onRetry={() => studio.refetch()} />
      ) : role === 'owner' ? (
        <SettingsForm settings={studio.data} />
      ) : (
        <Card>
          <Text variant="small">Only the studio’s owner can change these.</Text>
          <FieldList
            items={[
              {
                label: 'Stock-number pattern',
                value: studio.data.stockNumberPattern,
                numeric: true,
              },
              { label: 'Next stock number', value: studio.data.nextStockNumber, numeric: true },
              {
                label: 'Price step',
                value: formatMoney({
                  amount: studio.data.priceStep,
                  currency: studio.data.currency,
                }),
                numeric: true,
              },
            ]}
          />
        </Card>
      )}
      {studio.data ? (
        <Card>
          <Heading level={2}>The studio</Heading>
          <FieldList
            items={[
              { label: 'Currency', value: studio.data.currency },
              { label: 'VAT number', value: studio.data.vatNumber ?? 'Not VAT-registered' },
              { label: 'Time zone', value: studio.data.timeZone },
            ]}
          />
        </Card>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  form: { gap: spacing.lg },
  submit: { alignSelf: 'flex-start' },
});
