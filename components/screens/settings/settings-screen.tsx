import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { moneyText } from '@/components/ui/decimal-text';
import { FieldList } from '@/components/ui/field-list';
import { bindForm } from '@/components/ui/form/binding';
import { moneyCodec, textCodec } from '@/components/ui/form/codecs';
import { FormMoney, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useStudioQuery, useStudioUpdateMutation } from '@/hooks/queries/studio';
import { activeMembership, useMeQuery } from '@/hooks/session';
import { formatMoney } from '@/shared/money/format';
import { roundUpToStep } from '@/shared/money/rounding';
import { type Money } from '@/shared/schemas/money';
import {
  type StudioSettings,
  type StudioSettingsUpdate,
  studioSettingsUpdateSchema,
} from '@/shared/schemas/studio';

import { CalendarCard } from './calendar-card';
import { nextStockNumberFor } from './next-stock-number';

type SettingsValues = { stockNumberPattern: string; priceStep: string };

function settingsBinding(currency: string) {
  const money = moneyCodec(currency);
  return bindForm<SettingsValues, StudioSettingsUpdate>(studioSettingsUpdateSchema, {
    stockNumberPattern: {
      read: textCodec,
      blank: { required: 'Enter a stock-number pattern such as {YYYY}-{NNN}.' },
    },
    priceStep: {
      // The step is sent in minor units: 5.00 is 500.
      read: (text: string) => {
        const step = money(text);
        return step.kind === 'ok' ? { kind: 'ok' as const, value: step.value.amount } : step;
      },
      blank: { required: 'Enter the price step, such as 5.00.' },
    },
  });
}

/**
 * What the step is for, with an example worked by the shared rounding: a list price planned
 * from the net the maker wants is rounded up to a multiple of it.
 */
function priceStepHint(step: Money): string {
  const worked = { amount: step.amount * 12 + Math.ceil(step.amount / 4), currency: step.currency };
  const listed = { amount: roundUpToStep(worked.amount, step.amount), currency: step.currency };
  return `A price worked out from the net you want is rounded up to a multiple of this: with ${formatMoney(step)}, ${formatMoney(worked)} becomes ${formatMoney(listed)}.`;
}

const valuesOf = (settings: StudioSettings): SettingsValues => ({
  stockNumberPattern: settings.stockNumberPattern,
  priceStep: moneyText({ amount: settings.priceStep, currency: settings.currency }),
});

function SettingsForm({ settings }: { settings: StudioSettings }) {
  const update = useStudioUpdateMutation();
  // onChange: a pattern the server would refuse is said while it is typed, as the preview follows.
  const { control, formState, reset, submit, watch } = useSchemaForm(
    settingsBinding(settings.currency),
    valuesOf(settings),
    'onChange',
  );
  const next = nextStockNumberFor(settings, watch('stockNumberPattern'), new Date());
  const step = moneyCodec(settings.currency)(watch('priceStep'));
  const save = submit(async (values) => {
    // The saved values become the form's baseline, so "saved" shows until the next edit.
    reset(valuesOf(await update.mutateAsync(values)));
  });
  const formError = formState.errors.root?.server?.message;
  return (
    <Card style={styles.form}>
      <FormText
        control={control}
        name="stockNumberPattern"
        testID="settings-pattern"
        label="Stock-number pattern"
        hint="{YYYY} or {YY} for the year and {NNN} for a counter: {YYYY}-{NNN} gives 2026-007."
        autoCapitalize="characters"
        autoCorrect={false}
      />
      <Text variant="small" testID="settings-next" aria-live="polite">
        {next === null
          ? 'Next stock number: shown when the pattern is complete.'
          : `Next stock number: ${next}`}
      </Text>
      <FormMoney
        control={control}
        name="priceStep"
        testID="settings-price-step"
        label="Price step"
        hint={priceStepHint(
          step.kind === 'ok' && step.value.amount > 0
            ? step.value
            : { amount: settings.priceStep, currency: settings.currency },
        )}
        currency={settings.currency}
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
          onPress={save}
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
      {role === 'owner' ? <CalendarCard /> : null}
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
