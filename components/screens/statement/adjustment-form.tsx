import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { bindForm } from '@/components/ui/form/binding';
import { choiceCodec, moneyCodec, textCodec } from '@/components/ui/form/codecs';
import { FormChoice, FormMoney, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useAdjustmentMutation } from '@/hooks/queries/statements';
import { formatMoney, toDecimalString } from '@/shared/money/format';
import {
  type AdjustmentCreate,
  adjustmentCreateSchema,
  adjustmentKinds,
  type Statement,
} from '@/shared/schemas/statement';

import { adjustmentKindWords } from './statement-words';

type Kind = (typeof adjustmentKinds)[number];
type Direction = 'less' | 'more';
type AdjustmentValues = { kind: Kind; direction: Direction; amount: string; note: string };

const kindOptions = adjustmentKinds.map((kind) => ({
  value: kind,
  label: adjustmentKindWords[kind],
}));

const directionOptions = [
  { value: 'less', label: 'The venue owes less' },
  { value: 'more', label: 'The venue owes more' },
] as const;

/** The amount is typed as a positive figure; which way it goes is a choice of its own. */
function bindingFor(currency: string) {
  const money = moneyCodec(currency);
  return bindForm<AdjustmentValues, AdjustmentCreate>(adjustmentCreateSchema, {
    kind: { read: choiceCodec },
    direction: { read: choiceCodec, when: () => false },
    amount: {
      read: (text: string, values: AdjustmentValues) => {
        const read = money(text);
        return read.kind === 'ok' && values.direction === 'more'
          ? { kind: 'ok', value: { ...read.value, amount: -read.value.amount } }
          : read;
      },
      blank: { required: 'Enter the amount this explains.' },
    },
    note: { read: textCodec, blank: 'omit' },
  });
}

/**
 * One part of the difference between the statement and what was paid, explained: a sale the
 * venue did not report (it owes more), a fee it deducted (it owes less), and so on.
 */
export function AdjustmentForm({
  statement,
  onDone,
}: {
  statement: Statement;
  onDone: () => void;
}) {
  const explain = useAdjustmentMutation(statement.id);
  const b = statement.balance;
  const defaults: AdjustmentValues = {
    kind: b.amount < 0 ? 'unreported-sale' : 'fee-deducted',
    direction: b.amount < 0 ? 'more' : 'less',
    amount: b.amount === 0 ? '' : toDecimalString({ ...b, amount: Math.abs(b.amount) }),
    note: '',
  };
  const { control, formState, submit } = useSchemaForm(bindingFor(statement.currency), defaults);
  const field = { control } as const;
  return (
    <View style={styles.form} role="form" aria-label="Explain the difference">
      <Heading level={3}>Explain the difference</Heading>
      <Text variant="small">
        {`The balance is ${formatMoney(b)}. Explain it a part at a time; once nothing is left, the statement is settled.`}
      </Text>
      <FormChoice
        {...field}
        name="kind"
        testID="adjustment-kind"
        label="What explains it"
        options={kindOptions}
      />
      <FormChoice
        {...field}
        name="direction"
        testID="adjustment-direction"
        label="Which way"
        options={directionOptions}
      />
      <FormMoney
        {...field}
        name="amount"
        currency={statement.currency}
        testID="adjustment-amount"
        label="Amount"
      />
      <FormText {...field} name="note" testID="adjustment-note" label="Note (optional)" multiline />
      <FormFooter
        name="adjustment"
        errors={formState.errors}
        submitLabel="Save this explanation"
        busyLabel="Saving…"
        busy={formState.isSubmitting}
        onSubmit={submit(async (body) => {
          await explain.mutateAsync(body);
          onDone();
        })}
        aside={<Button label="Never mind" variant="quiet" onPress={onDone} />}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
});
