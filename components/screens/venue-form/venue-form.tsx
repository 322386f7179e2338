import { useState } from 'react';
import { FormProvider } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { type FormBinding } from '@/components/ui/form/binding';
import { FormChoice, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { stickyOnWeb } from '@/components/ui/sticky';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

import { NetPreview } from '../terms-form/net-preview';
import { NetSummary } from '../terms-form/net-summary';
import { firstSample } from '../terms-form/preview-split';
import { TermsFields } from '../terms-form/terms-fields';
import { type VenueFormValues } from './venue-form-values';
import { options, venueKindWords } from './venue-words';

type VenueFormProps<Parsed> = {
  defaultValues: VenueFormValues;
  binding: FormBinding<VenueFormValues, Parsed>;
  onSubmit: (values: Parsed) => Promise<void>;
  submitLabel: string;
  label: string;
  /** Only the owner sets terms; others see them, with the preview, but cannot change them. */
  termsEditable: boolean;
};

/**
 * A venue and its default terms, with what the maker would net beside the terms; on a phone, where
 * the preview comes after them, a one-line summary stays at the foot of the screen meanwhile.
 */
export function VenueForm<Parsed>({
  defaultValues,
  binding,
  onSubmit,
  submitLabel,
  label,
  termsEditable,
}: VenueFormProps<Parsed>) {
  const { wide } = useBreakpoint();
  // A rate out of range is said as it is typed, beside its field, while the preview follows it.
  const form = useSchemaForm(binding, defaultValues, 'onChange');
  const { control, formState, submit, watch } = form;
  const terms = watch();
  const sample = useState(firstSample);
  const field = { control } as const;

  const termsFields = !termsEditable ? (
    <Card style={styles.section} testID="venue-terms-locked">
      <Heading level={2}>Default terms</Heading>
      <Notice
        tone="info"
        message="Only the studio’s owner sets a venue’s terms. A new venue starts from the studio’s usual terms; the preview shows what they net."
      />
    </Card>
  ) : (
    <TermsFields
      heading="Default terms"
      testIDPrefix="venue"
      intro={
        <Text variant="small">
          Copied onto each consignment when it is agreed; change them there if a show differs.
        </Text>
      }
    />
  );

  return (
    <FormProvider {...form}>
      <View role="form" aria-label={label} style={styles.form}>
        <Card style={styles.section}>
          <Heading level={2}>The venue</Heading>
          <FormText {...field} name="name" testID="venue-name" label="Name" />
          <FormChoice
            {...field}
            name="kind"
            testID="venue-kind"
            label="Kind"
            options={options(venueKindWords)}
          />
          <FieldRow>
            <FieldCell>
              <FormText
                {...field}
                name="contactName"
                testID="venue-contactName"
                label="Contact name (optional)"
              />
            </FieldCell>
            <FieldCell>
              <FormText
                {...field}
                name="email"
                testID="venue-email"
                label="E-mail (optional)"
                inputMode="email"
                autoCapitalize="none"
                autoCorrect={false}
              />
            </FieldCell>
            <FieldCell>
              <FormText
                {...field}
                name="phone"
                testID="venue-phone"
                label="Phone (optional)"
                inputMode="tel"
              />
            </FieldCell>
          </FieldRow>
          <FormText
            {...field}
            name="addressLine1"
            testID="venue-addressLine1"
            label="Address (optional)"
          />
          <FormText
            {...field}
            name="addressLine2"
            testID="venue-addressLine2"
            label="Address, second line (optional)"
          />
          <FieldRow>
            <FieldCell>
              <FormText {...field} name="town" testID="venue-town" label="Town (optional)" />
            </FieldCell>
            <FieldCell basis={140}>
              <FormText
                {...field}
                name="postcode"
                testID="venue-postcode"
                label="Postcode (optional)"
                autoCapitalize="characters"
              />
            </FieldCell>
            <FieldCell basis={120}>
              <FormText
                {...field}
                name="country"
                testID="venue-country"
                label="Country"
                hint="Two letters, e.g. GB"
                autoCapitalize="characters"
                maxLength={2}
              />
            </FieldCell>
          </FieldRow>
          <FormText
            {...field}
            name="vatNumber"
            testID="venue-vatNumber"
            label="Venue’s VAT number (optional)"
            autoCapitalize="characters"
          />
        </Card>

        <View style={[styles.terms, wide && styles.termsWide]}>
          <View style={styles.termsFields}>
            {termsFields}
            {termsEditable && !wide ? <NetSummary values={terms} sampleText={sample[0]} /> : null}
          </View>
          <View style={[styles.preview, wide && styles.previewWide]}>
            <NetPreview values={terms} sample={sample} />
          </View>
        </View>

        <Card style={styles.section}>
          <Heading level={2}>Notes</Heading>
          <FormText
            {...field}
            name="notes"
            testID="venue-notes"
            label="Notes (optional)"
            multiline
          />
        </Card>

        <FormFooter
          name="venue"
          errors={formState.errors}
          submitLabel={submitLabel}
          busyLabel="Saving…"
          busy={formState.isSubmitting}
          onSubmit={submit(onSubmit)}
        />
      </View>
    </FormProvider>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  section: { gap: spacing.md },
  terms: { gap: spacing.lg },
  termsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  termsFields: { flex: 1 },
  preview: {},
  // Beside the terms, and still in view as the terms below the first few are changed.
  previewWide: { width: 320, ...stickyOnWeb('top', spacing.lg) },
});
