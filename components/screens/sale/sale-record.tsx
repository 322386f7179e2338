import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useUndoSaleMutation } from '@/hooks/queries/sales';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentLine } from '@/shared/schemas/consignment';
import { type Terms } from '@/shared/schemas/terms';

import { SaleFigures, type Side } from './sale-figures';

type Sale = NonNullable<ConsignmentLine['sale']>;

/** Who put the sale in: a venue's staff member, or the studio for a venue that phoned it in. */
export function enteredWords(entry: { enteredBy: Sale['enteredBy']; recordedBy: string | null }) {
  if (entry.enteredBy === 'studio') {
    return `Entered by the studio${entry.recordedBy ? ` (${entry.recordedBy})` : ''}`;
  }
  return `Recorded by ${entry.recordedBy ?? 'the venue’s staff'} at the venue`;
}

/** Why a sale cannot be undone here, or null when it can. */
function undoBlock(sale: Sale, side: Side): string | null {
  if (sale.lockedBy) {
    return `This sale is on statement ${sale.lockedBy}, already issued, so it can no longer be undone. A correction goes on a new statement.`;
  }
  if (side === 'venue' && sale.enteredBy === 'studio') {
    return 'The studio entered this sale: ask the maker if it needs undoing.';
  }
  return null;
}

/**
 * A recorded sale: when, for how much, any discount and why, its split, who entered it, and
 * "Undo this sale" while it may still be undone, asked once more before it goes.
 */
export function SaleRecord({
  line,
  terms,
  side,
  canChange,
  testID,
}: {
  line: ConsignmentLine;
  terms: Terms;
  side: Side;
  /** The show is still running: sales can be undone only then. */
  canChange: boolean;
  testID: string;
}) {
  const sale = line.sale!;
  const undo = useUndoSaleMutation(line.id);
  const [asking, setAsking] = useState(false);
  const blocked = undoBlock(sale, side);
  return (
    <View style={styles.record} testID={testID}>
      <Text variant="bodyStrong" testID={`${testID}-summary`}>
        {`Sold on ${formatDate(sale.soldOn)} for ${formatMoney(sale.price)}`}
      </Text>
      {sale.discount ? (
        <Text testID={`${testID}-discount`}>
          {`${formatMoney(sale.discount)} off the list price of ${formatMoney(line.listPrice)}${sale.discountReason ? `: ${sale.discountReason}` : '.'}`}
        </Text>
      ) : null}
      <SaleFigures terms={terms} split={sale.split} side={side} testID={`${testID}-split`} />
      <Text
        variant={sale.enteredBy === 'studio' ? 'label' : 'small'}
        testID={`${testID}-entered`}
        style={sale.enteredBy === 'studio' ? styles.studio : undefined}
      >
        {enteredWords(sale)}
      </Text>
      {!canChange ? null : blocked ? (
        <Text variant="small" testID={`${testID}-locked`}>
          {blocked}
        </Text>
      ) : asking ? (
        <View style={styles.ask}>
          <Text>{`Undo the sale of ${line.title}? It shows as out again.`}</Text>
          <View style={styles.buttons}>
            <Button
              testID={`${testID}-undo-confirm`}
              label="Yes, undo the sale"
              busyLabel="Undoing…"
              busy={undo.isPending}
              variant="danger"
              onPress={() => undo.mutate(undefined, { onSuccess: () => setAsking(false) })}
            />
            <Button label="Keep the sale" variant="quiet" onPress={() => setAsking(false)} />
          </View>
        </View>
      ) : (
        <View style={styles.start}>
          <Button
            testID={`${testID}-undo`}
            label="Undo this sale"
            variant="secondary"
            onPress={() => {
              undo.reset();
              setAsking(true);
            }}
          />
        </View>
      )}
      {undo.isError ? (
        <Notice testID={`${testID}-undo-error`} message={errorMessage(undo.error)} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  record: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: palette.sunken,
  },
  studio: { color: palette.ink },
  ask: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
});
