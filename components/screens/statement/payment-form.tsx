import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { bindForm } from '@/components/ui/form/binding';
import { choiceCodec, dateCodec, moneyCodec, textCodec } from '@/components/ui/form/codecs';
import { FormChoice, FormDate, FormMoney, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Heading } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { usePaymentMutation } from '@/hooks/queries/statements';
import { toDecimalString } from '@/shared/money/format';
import {
  type PaymentCreate,
  paymentCreateSchema,
  type PaymentMethod,
  type Statement,
} from '@/shared/schemas/statement';

import { today } from '../condition-check/today';

type PaymentValues = {
  amount: string;
  receivedOn: string;
  method: Exclude<PaymentMethod, 'online'>;
  reference: string;
};

const methodOptions = [
  { value: 'bank-transfer', label: 'Bank transfer' },
  { value: 'cheque', label: 'Cheque' },
  { value: 'cash', label: 'Cash' },
] as const;

function bindingFor(currency: string) {
  return bindForm<PaymentValues, PaymentCreate>(paymentCreateSchema, {
    amount: { read: moneyCodec(currency), blank: { required: 'Enter the amount received.' } },
    receivedOn: { read: dateCodec, blank: { required: 'Enter the day it arrived.' } },
    method: { read: choiceCodec },
    reference: { read: textCodec, blank: 'omit' },
  });
}

/** A remittance that arrived, recorded by hand: how much, when, how, and its reference. */
export function PaymentForm({ statement, onDone }: { statement: Statement; onDone: () => void }) {
  const pay = usePaymentMutation(statement.id);
  const owing = statement.balance.amount > 0 ? toDecimalString(statement.balance) : '';
  const defaults: PaymentValues = {
    amount: owing,
    receivedOn: today(),
    method: 'bank-transfer',
    reference: '',
  };
  const { control, formState, submit } = useSchemaForm(bindingFor(statement.currency), defaults);
  const field = { control } as const;
  return (
    <View style={styles.form} role="form" aria-label="Record a payment">
      <Heading level={3}>Record a payment received</Heading>
      <FieldRow>
        <FieldCell basis={180}>
          <FormMoney
            {...field}
            name="amount"
            currency={statement.currency}
            testID="payment-amount"
            label="Amount received"
          />
        </FieldCell>
        <FieldCell basis={180}>
          <FormDate {...field} name="receivedOn" testID="payment-date" label="Arrived on" />
        </FieldCell>
      </FieldRow>
      <FormChoice
        {...field}
        name="method"
        testID="payment-method"
        label="How"
        options={methodOptions}
      />
      <FormText
        {...field}
        name="reference"
        testID="payment-reference"
        label="Reference (optional)"
        hint="As it appears on the bank statement or the cheque."
      />
      <FormFooter
        name="payment"
        errors={formState.errors}
        submitLabel="Record the payment"
        busyLabel="Recording…"
        busy={formState.isSubmitting}
        onSubmit={submit(async (body) => {
          await pay.mutateAsync(body);
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
