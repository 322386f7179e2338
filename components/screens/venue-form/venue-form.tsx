import { type Control, Controller, type Resolver, useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { Choice, type ChoiceOption } from '@/components/ui/choice';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { serverErrors } from '@/components/ui/form-errors';
import { FormFooter } from '@/components/ui/form-footer';
import { MoneyField } from '@/components/ui/money-field';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { Heading, Text } from '@/components/ui/text';
import { TextField, type TextFieldProps } from '@/components/ui/text-field';
import { spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

import { NetPreview } from './net-preview';
import { type VenueField, venueFieldFor, type VenueFormValues } from './venue-form-values';
import {
  commissionVatWords,
  discountRuleWords,
  insuranceBasisWords,
  insurerWords,
  options,
  paymentFromWords,
  venueKindWords,
  venueRoleWords,
} from './venue-words';

type AnyControl = Control<VenueFormValues, unknown, object>;
type TextName = {
  [K in VenueField]: VenueFormValues[K] extends string
    ? string extends VenueFormValues[K]
      ? K
      : never
    : never;
}[VenueField];
type ChoiceName = Exclude<VenueField, TextName>;

type InputProps = Omit<TextFieldProps, 'testID' | 'value' | 'onChangeText'> & {
  control: AnyControl;
  name: TextName;
  kind?: 'text' | 'percent' | 'number' | 'money';
  unit?: string;
  currency?: string;
};

function Input({ control, name, kind = 'text', unit, currency = 'GBP', ...props }: InputProps) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const common = {
          ...props,
          ref: field.ref,
          testID: `venue-${name}`,
          value: field.value as string,
          onChangeText: field.onChange,
          onBlur: field.onBlur,
          error: fieldState.error?.message,
        };
        if (kind === 'money') return <MoneyField {...common} currency={currency} />;
        if (kind === 'percent') return <NumberField {...common} unit="%" decimal />;
        if (kind === 'number') return <NumberField {...common} unit={unit} />;
        return <TextField {...common} />;
      }}
    />
  );
}

function Pick<N extends ChoiceName>({
  control,
  name,
  label,
  choices,
  hint,
}: {
  control: AnyControl;
  name: N;
  label: string;
  choices: ChoiceOption<VenueFormValues[N] & string>[];
  hint?: string;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <Choice
          testID={`venue-${name}`}
          label={label}
          hint={hint}
          options={choices}
          value={field.value as VenueFormValues[N] & string}
          onChange={field.onChange}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}

type VenueFormProps<Parsed extends object> = {
  defaultValues: VenueFormValues;
  resolver: Resolver<VenueFormValues, unknown, Parsed>;
  onSubmit: (values: Parsed) => Promise<void>;
  submitLabel: string;
  label: string;
  /** Only the owner sets terms; others see them, with the preview, but cannot change them. */
  termsEditable: boolean;
};

/** A venue and its default terms, with what the maker would net shown beside the terms. */
export function VenueForm<Parsed extends object>({
  defaultValues,
  resolver,
  onSubmit,
  submitLabel,
  label,
  termsEditable,
}: VenueFormProps<Parsed>) {
  const { wide } = useBreakpoint();
  const { control, handleSubmit, setError, formState } = useForm<VenueFormValues, unknown, Parsed>({
    resolver,
    defaultValues,
  });
  const any = control as unknown as AnyControl;
  const values = useWatch({ control });
  const terms = { ...defaultValues, ...values } as VenueFormValues;
  const currency = /^[A-Z]{3}$/.test(terms.currency.trim().toUpperCase())
    ? terms.currency.trim().toUpperCase()
    : 'GBP';

  const submit = handleSubmit(async (parsed) => {
    try {
      await onSubmit(parsed);
    } catch (error) {
      const message = serverErrors(error, venueFieldFor, (field, e) => setError(field, e));
      if (message !== null) setError('root.server', { message });
    }
  });

  const termsFields = !termsEditable ? (
    <Card style={styles.section} testID="venue-terms-locked">
      <Heading level={2}>Default terms</Heading>
      <Notice
        tone="info"
        message="Only the studio’s owner sets a venue’s terms. A new venue starts from the studio’s usual terms; the preview shows what they net."
      />
    </Card>
  ) : (
    <Card style={styles.section}>
      <Heading level={2}>Default terms</Heading>
      <Text variant="small">
        Copied onto each consignment when it is agreed; change them there if a show differs.
      </Text>
      <FieldRow>
        <FieldCell basis={140}>
          <Input control={any} name="commissionRate" label="Commission" kind="percent" />
        </FieldCell>
        <FieldCell basis={140}>
          <Input control={any} name="vatRate" label="VAT rate" kind="percent" />
        </FieldCell>
        <FieldCell basis={120}>
          <Input
            control={any}
            name="currency"
            label="Currency"
            autoCapitalize="characters"
            maxLength={3}
          />
        </FieldCell>
      </FieldRow>
      <Pick control={any} name="venueRole" label="The venue" choices={options(venueRoleWords)} />
      <Pick
        control={any}
        name="commissionVat"
        label="VAT on the commission"
        choices={options(commissionVatWords)}
      />
      <Pick
        control={any}
        name="makerVatRegistered"
        label="Are you VAT-registered?"
        choices={[
          { value: 'no', label: 'No' },
          { value: 'yes', label: 'Yes' },
        ]}
      />
      <Pick
        control={any}
        name="discountRule"
        label="Who bears a discount"
        choices={options(discountRuleWords)}
      />
      <Pick
        control={any}
        name="insuranceBasis"
        label="Insured at"
        choices={options(insuranceBasisWords)}
      />
      {terms.insuranceBasis === 'agreed' ? (
        <Input
          control={any}
          name="agreedInsuranceValue"
          label="Agreed insurance value"
          kind="money"
          currency={currency}
        />
      ) : null}
      <Pick control={any} name="insuredBy" label="Who insures" choices={options(insurerWords)} />
      <FieldRow>
        <FieldCell basis={140}>
          <Input
            control={any}
            name="paymentDays"
            label="Payment within"
            kind="number"
            unit="days"
          />
        </FieldCell>
      </FieldRow>
      <Pick
        control={any}
        name="paymentFrom"
        label="Counted from"
        choices={options(paymentFromWords)}
      />
    </Card>
  );

  return (
    <View role="form" aria-label={label} style={styles.form}>
      <Card style={styles.section}>
        <Heading level={2}>The venue</Heading>
        <Input control={any} name="name" label="Name" />
        <Pick control={any} name="kind" label="Kind" choices={options(venueKindWords)} />
        <FieldRow>
          <FieldCell>
            <Input control={any} name="contactName" label="Contact name (optional)" />
          </FieldCell>
          <FieldCell>
            <Input
              control={any}
              name="email"
              label="E-mail (optional)"
              inputMode="email"
              autoCapitalize="none"
              autoCorrect={false}
            />
          </FieldCell>
          <FieldCell>
            <Input control={any} name="phone" label="Phone (optional)" inputMode="tel" />
          </FieldCell>
        </FieldRow>
        <Input control={any} name="addressLine1" label="Address (optional)" />
        <Input control={any} name="addressLine2" label="Address, second line (optional)" />
        <FieldRow>
          <FieldCell>
            <Input control={any} name="town" label="Town (optional)" />
          </FieldCell>
          <FieldCell basis={140}>
            <Input
              control={any}
              name="postcode"
              label="Postcode (optional)"
              autoCapitalize="characters"
            />
          </FieldCell>
          <FieldCell basis={120}>
            <Input
              control={any}
              name="country"
              label="Country"
              hint="Two letters, e.g. GB"
              autoCapitalize="characters"
              maxLength={2}
            />
          </FieldCell>
        </FieldRow>
        <Input
          control={any}
          name="vatNumber"
          label="Venue’s VAT number (optional)"
          autoCapitalize="characters"
        />
      </Card>

      <View style={[styles.terms, wide && styles.termsWide]}>
        <View style={styles.termsFields}>{termsFields}</View>
        <View style={[styles.preview, wide && styles.previewWide]}>
          <NetPreview values={terms} />
        </View>
      </View>

      <Card style={styles.section}>
        <Heading level={2}>Notes</Heading>
        <Input control={any} name="notes" label="Notes (optional)" multiline />
      </Card>

      <FormFooter
        name="venue"
        errors={formState.errors}
        submitLabel={submitLabel}
        busyLabel="Saving…"
        busy={formState.isSubmitting}
        onSubmit={submit}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  section: { gap: spacing.md },
  terms: { gap: spacing.lg },
  termsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  termsFields: { flex: 1 },
  preview: {},
  previewWide: { width: 320 },
});
