import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { bindForm } from '@/components/ui/form/binding';
import { dateCodec, textCodec } from '@/components/ui/form/codecs';
import { FormDate, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { spacing } from '@/constants/theme';
import { useConsignmentUpdateMutation } from '@/hooks/queries/consignments';
import {
  type Consignment,
  type ConsignmentUpdateParsed,
  consignmentUpdateSchema,
} from '@/shared/schemas/consignment';

type DetailsValues = {
  title: string;
  dispatchDate: string;
  openingDate: string;
  closingDate: string;
  returnDueDate: string;
};

const detailsBinding = bindForm<DetailsValues, ConsignmentUpdateParsed>(consignmentUpdateSchema, {
  title: { read: textCodec, blank: { required: 'Give the show or batch a title.' } },
  dispatchDate: { read: dateCodec },
  openingDate: { read: dateCodec },
  closingDate: { read: dateCodec },
  returnDueDate: { read: dateCodec },
});

/** The title and dates of a consignment still being put together. */
export function DetailsEditor({
  consignment,
  onDone,
}: {
  consignment: Consignment;
  onDone: () => void;
}) {
  const update = useConsignmentUpdateMutation(consignment.id);
  const { control, formState, submit } = useSchemaForm(detailsBinding, {
    title: consignment.title,
    dispatchDate: consignment.dispatchDate ?? '',
    openingDate: consignment.openingDate ?? '',
    closingDate: consignment.closingDate ?? '',
    returnDueDate: consignment.returnDueDate ?? '',
  });
  const field = { control } as const;
  return (
    <View style={styles.form} role="form" aria-label="Title and dates">
      <FormText {...field} name="title" testID="details-title" label="Title" />
      <FieldRow>
        <FieldCell basis={180}>
          <FormDate {...field} name="dispatchDate" testID="details-dispatchDate" label="Sending" />
        </FieldCell>
        <FieldCell basis={180}>
          <FormDate {...field} name="openingDate" testID="details-openingDate" label="Opening" />
        </FieldCell>
        <FieldCell basis={180}>
          <FormDate {...field} name="closingDate" testID="details-closingDate" label="Closing" />
        </FieldCell>
        <FieldCell basis={180}>
          <FormDate
            {...field}
            name="returnDueDate"
            testID="details-returnDueDate"
            label="Back by"
          />
        </FieldCell>
      </FieldRow>
      <FormFooter
        name="details"
        errors={formState.errors}
        submitLabel="Save title and dates"
        busyLabel="Saving…"
        busy={formState.isSubmitting}
        onSubmit={submit(async (body) => {
          await update.mutateAsync(body);
          onDone();
        })}
      >
        <Button label="Keep them as they were" variant="quiet" onPress={onDone} />
      </FormFooter>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.md } });
