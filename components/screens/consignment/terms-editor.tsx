import { FormProvider } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useConsignmentUpdateMutation } from '@/hooks/queries/consignments';
import { type Terms } from '@/shared/schemas/terms';

import { NetPreview } from '../terms-form/net-preview';
import { TermsFields } from '../terms-form/terms-fields';
import { termsBinding, termsValues } from '../terms-form/terms-form-values';

/** This consignment's own terms, changed by the owner before they are agreed. */
export function TermsEditor({
  consignmentId,
  terms,
  onDone,
}: {
  consignmentId: number;
  terms: Terms;
  onDone: () => void;
}) {
  const update = useConsignmentUpdateMutation(consignmentId);
  // As in the venue's form, a rate out of range is said while it is typed.
  const form = useSchemaForm(termsBinding, termsValues(terms), 'onChange');
  const values = form.watch();
  return (
    <FormProvider {...form}>
      <View style={styles.editor} role="form" aria-label="This consignment’s terms">
        <TermsFields
          heading="This consignment’s terms"
          testIDPrefix="terms"
          intro={<Text variant="small">The venue’s own terms stay as they are.</Text>}
        />
        <NetPreview values={values} />
        <FormFooter
          name="terms"
          errors={form.formState.errors}
          submitLabel="Save these terms"
          busyLabel="Saving…"
          busy={form.formState.isSubmitting}
          onSubmit={form.submit(async (body) => {
            await update.mutateAsync({ terms: body });
            onDone();
          })}
        >
          <Button label="Keep the terms as they were" variant="quiet" onPress={onDone} />
        </FormFooter>
      </View>
    </FormProvider>
  );
}

const styles = StyleSheet.create({ editor: { gap: spacing.md } });
