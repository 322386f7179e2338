import { type ReactNode } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { StyleSheet } from 'react-native';

import { Card } from '@/components/ui/card';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { FormChoice, FormMoney, FormNumber, FormText } from '@/components/ui/form/fields';
import { Heading } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { type CommissionVat } from '@/shared/schemas/terms';

import {
  commissionVatWords,
  discountRuleWords,
  insuranceBasisWords,
  insurerWords,
  options,
  paymentFromWords,
  venueRoleWords,
} from '../venue-form/venue-words';
import { type TermsFormValues, vatRateApplies } from './terms-form-values';

/** What the VAT rate is used for, so the field says why it is asked. */
function vatRateHint(commissionVat: CommissionVat, makerVatRegistered: 'yes' | 'no'): string {
  const onCommission = commissionVat !== 'none';
  if (onCommission && makerVatRegistered === 'yes') return 'On the commission and in your prices.';
  return onCommission ? 'Charged on the commission.' : 'Included in your prices.';
}

type TermsFieldsProps = {
  heading: string;
  /** A sentence under the heading saying where these terms apply. */
  intro?: ReactNode;
  /** `venue` gives `venue-commissionRate` and so on. */
  testIDPrefix: string;
};

/**
 * The terms' fields, in any form that holds them at its top level (a venue's, a consignment's,
 * the terms alone): they reach the form through react-hook-form's FormProvider.
 */
export function TermsFields({ heading, intro, testIDPrefix }: TermsFieldsProps) {
  const { control } = useFormContext<TermsFormValues>();
  const basis = useWatch({ control, name: 'insuranceBasis' });
  const commissionVat = useWatch({ control, name: 'commissionVat' });
  const makerVatRegistered = useWatch({ control, name: 'makerVatRegistered' });
  const typed = useWatch({ control, name: 'currency' }).trim().toUpperCase();
  const currency = /^[A-Z]{3}$/.test(typed) ? typed : 'GBP';
  const field = { control } as const;
  return (
    <Card style={styles.section}>
      <Heading level={2}>{heading}</Heading>
      {intro}
      <FieldRow>
        <FieldCell basis={140}>
          <FormNumber
            {...field}
            name="commissionRate"
            testID={`${testIDPrefix}-commissionRate`}
            unit="%"
            decimal
            label="Commission"
          />
        </FieldCell>
        <FieldCell basis={120}>
          <FormText
            {...field}
            name="currency"
            testID={`${testIDPrefix}-currency`}
            label="Currency"
            autoCapitalize="characters"
            maxLength={3}
          />
        </FieldCell>
      </FieldRow>
      <FormChoice
        {...field}
        name="venueRole"
        testID={`${testIDPrefix}-venueRole`}
        label="The venue"
        options={options(venueRoleWords)}
      />
      <FormChoice
        {...field}
        name="commissionVat"
        testID={`${testIDPrefix}-commissionVat`}
        label="VAT on the commission"
        options={options(commissionVatWords)}
      />
      <FormChoice
        {...field}
        name="makerVatRegistered"
        testID={`${testIDPrefix}-makerVatRegistered`}
        label="Are you VAT-registered?"
        options={[
          { value: 'no', label: 'No' },
          { value: 'yes', label: 'Yes' },
        ]}
      />
      {vatRateApplies({ commissionVat, makerVatRegistered }) ? (
        <FieldRow>
          <FieldCell basis={140}>
            <FormNumber
              {...field}
              name="vatRate"
              testID={`${testIDPrefix}-vatRate`}
              unit="%"
              decimal
              label="VAT rate"
              hint={vatRateHint(commissionVat, makerVatRegistered)}
            />
          </FieldCell>
        </FieldRow>
      ) : null}
      <FormChoice
        {...field}
        name="discountRule"
        testID={`${testIDPrefix}-discountRule`}
        label="Who bears a discount"
        options={options(discountRuleWords)}
      />
      <FormChoice
        {...field}
        name="insuranceBasis"
        testID={`${testIDPrefix}-insuranceBasis`}
        label="Insured at"
        options={options(insuranceBasisWords)}
      />
      {basis === 'agreed' ? (
        <FormMoney
          {...field}
          name="agreedInsuranceValue"
          testID={`${testIDPrefix}-agreedInsuranceValue`}
          label="Agreed insurance value"
          currency={currency}
        />
      ) : null}
      <FormChoice
        {...field}
        name="insuredBy"
        testID={`${testIDPrefix}-insuredBy`}
        label="Who insures on the premises"
        options={options(insurerWords)}
      />
      <FormChoice
        {...field}
        name="insuredInTransitBy"
        testID={`${testIDPrefix}-insuredInTransitBy`}
        label="Who insures in transit"
        options={options(insurerWords)}
      />
      <FieldRow>
        <FieldCell basis={140}>
          <FormNumber
            {...field}
            name="paymentDays"
            testID={`${testIDPrefix}-paymentDays`}
            label="Payment within"
            unit="days"
          />
        </FieldCell>
      </FieldRow>
      <FormChoice
        {...field}
        name="paymentFrom"
        testID={`${testIDPrefix}-paymentFrom`}
        label="Counted from"
        options={options(paymentFromWords)}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
});
