import { useRouter } from 'expo-router';
import { useEffect } from 'react';
import { FormProvider } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { FormChoice, FormDate, FormSelect, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { useConsignmentCreateMutation } from '@/hooks/queries/consignments';
import { useStudioQuery } from '@/hooks/queries/studio';
import { useVenuesQuery } from '@/hooks/queries/venues';
import { useActiveRole } from '@/hooks/session';
import { defaultTerms } from '@/shared/schemas/terms';
import { type Venue } from '@/shared/schemas/venue';
import { termsInWords } from '@/shared/terms/terms-in-words';

import { TermsFields } from '../terms-form/terms-fields';
import { termsValues } from '../terms-form/terms-form-values';
import { consignmentCreateBinding, newConsignmentValues } from './consignment-form-values';
import { TermsInWords } from './terms-in-words';

function ConsignmentForm({ venues, venueId }: { venues: Venue[]; venueId: number | null }) {
  const owner = useActiveRole() === 'owner';
  const router = useRouter();
  const create = useConsignmentCreateMutation();
  const first = venues.find((v) => v.id === venueId) ?? null;
  const form = useSchemaForm(
    consignmentCreateBinding,
    newConsignmentValues(first?.id ?? null, first?.defaultTerms ?? defaultTerms),
  );
  const { control, formState, submit, watch, reset, getValues } = form;
  const chosenId = watch('venueId');
  const ownTerms = watch('ownTerms');
  const venue = venues.find((v) => String(v.id) === chosenId) ?? null;

  // A venue chosen brings its terms: shown in words, and the start of any change to them.
  useEffect(() => {
    if (venue) reset({ ...getValues(), ...termsValues(venue.defaultTerms) });
  }, [venue, reset, getValues]);

  const field = { control } as const;
  return (
    <FormProvider {...form}>
      <View role="form" aria-label="New consignment" style={styles.form}>
        <Card style={styles.section}>
          <Heading level={2}>Where and what</Heading>
          <FormSelect
            {...field}
            name="venueId"
            testID="consignment-venueId"
            label="Venue"
            emptyLabel="Choose a venue"
            options={venues.map((v) => ({ value: String(v.id), label: v.name }))}
          />
          <FormText
            {...field}
            name="title"
            testID="consignment-title"
            label="Title"
            hint="The show or batch, as you and the venue will call it: “Winter exhibition”."
          />
        </Card>
        <Card style={styles.section}>
          <Heading level={2}>Dates</Heading>
          <Text variant="small">All optional now; set them when you know them.</Text>
          <FieldRow>
            <FieldCell basis={180}>
              <FormDate
                {...field}
                name="dispatchDate"
                testID="consignment-dispatchDate"
                label="Sending"
              />
            </FieldCell>
            <FieldCell basis={180}>
              <FormDate
                {...field}
                name="openingDate"
                testID="consignment-openingDate"
                label="Opening"
              />
            </FieldCell>
            <FieldCell basis={180}>
              <FormDate
                {...field}
                name="closingDate"
                testID="consignment-closingDate"
                label="Closing"
              />
            </FieldCell>
            <FieldCell basis={180}>
              <FormDate
                {...field}
                name="returnDueDate"
                testID="consignment-returnDueDate"
                label="Back by"
              />
            </FieldCell>
          </FieldRow>
        </Card>
        {venue ? (
          <Card style={styles.section}>
            <Heading level={2}>Terms</Heading>
            <Text variant="small">
              {`Copied from ${venue.name} and fixed once agreed. Later changes to the venue leave this consignment as it is.`}
            </Text>
            {owner ? (
              <FormChoice
                {...field}
                name="ownTerms"
                testID="consignment-ownTerms"
                label="Terms for this consignment"
                options={[
                  { value: 'no', label: `As ${venue.name}’s` },
                  { value: 'yes', label: 'Different for this one' },
                ]}
              />
            ) : null}
            {ownTerms === 'no' ? <TermsInWords lines={termsInWords(venue.defaultTerms)} /> : null}
          </Card>
        ) : null}
        {venue && ownTerms === 'yes' ? (
          <TermsFields heading="This consignment’s terms" testIDPrefix="consignment" />
        ) : null}
        <FormFooter
          name="consignment"
          errors={formState.errors}
          submitLabel="Start the consignment"
          busyLabel="Starting…"
          busy={formState.isSubmitting}
          onSubmit={submit(async (values) => {
            const consignment = await create.mutateAsync(values);
            router.replace({
              pathname: '/consignments/[id]',
              params: { id: String(consignment.id) },
            });
          })}
        />
      </View>
    </FormProvider>
  );
}

export function ConsignmentCreateScreen({ venueId }: { venueId: number | null }) {
  const venues = useVenuesQuery();
  const studio = useStudioQuery();
  return (
    <Screen testID="consignment-create-screen">
      <View style={styles.heading}>
        <TextLink href="/consignments" label="All consignments" />
        <Heading level={1}>New consignment</Heading>
        <Text variant="small">
          Choose the venue and give the batch a name; you add the pieces, check them and send them
          next.
        </Text>
      </View>
      {venues.isPending || studio.isPending ? (
        <LoadingView message="Fetching the venues…" />
      ) : venues.isError ? (
        <ErrorView error={venues.error} onRetry={() => venues.refetch()} />
      ) : venues.data.items.length === 0 ? (
        <EmptyView
          title="No venues yet"
          message="Add the gallery, shop or fair first, with the terms you agreed; then send it work."
        />
      ) : (
        <ConsignmentForm venues={venues.data.items} venueId={venueId} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  form: { gap: spacing.lg },
  section: { gap: spacing.md },
});
