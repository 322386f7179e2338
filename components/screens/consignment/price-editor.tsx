import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { moneyText } from '@/components/ui/decimal-text';
import { bindForm } from '@/components/ui/form/binding';
import { moneyCodec } from '@/components/ui/form/codecs';
import { FormMoney } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { Notice } from '@/components/ui/notice';
import { spacing } from '@/constants/theme';
import { useLinePriceMutation } from '@/hooks/queries/consignments';
import { type LineUpdate, lineUpdateSchema } from '@/shared/schemas/consignment';
import { type Money } from '@/shared/schemas/money';

const bindingFor = (currency: string) =>
  bindForm<{ listPrice: string }, LineUpdate>(lineUpdateSchema, {
    listPrice: { read: moneyCodec(currency), blank: { required: 'Enter the list price.' } },
  });

/** A piece's list price on this consignment, changed while it is being put together. */
export function PriceEditor({
  consignmentId,
  lineId,
  price,
  testID,
}: {
  consignmentId: number;
  lineId: number;
  price: Money;
  testID: string;
}) {
  const change = useLinePriceMutation(consignmentId);
  const { control, formState, submit } = useSchemaForm(bindingFor(price.currency), {
    listPrice: moneyText(price),
  });
  return (
    <View style={styles.row}>
      <View style={styles.field}>
        <FormMoney
          control={control}
          name="listPrice"
          testID={testID}
          label="List price here"
          currency={price.currency}
        />
      </View>
      {formState.isDirty ? (
        <Button
          testID={`${testID}-save`}
          label="Save price"
          busyLabel="Saving…"
          busy={formState.isSubmitting}
          variant="secondary"
          onPress={submit(async (body) => {
            await change.mutateAsync({ lineId, ...body });
          })}
        />
      ) : null}
      {formState.errors.root?.server?.message ? (
        <Notice message={formState.errors.root.server.message} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.sm },
  field: { flexBasis: 160, flexGrow: 1, maxWidth: 220 },
});
