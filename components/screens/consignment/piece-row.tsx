import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { SquareImage } from '@/components/ui/square-image';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { lineStateLooks } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';
import { useLineRemoveMutation } from '@/hooks/queries/consignments';
import { formatMoney } from '@/shared/money/format';
import { venueKeeps } from '@/shared/money/split';
import { type Consignment, type ConsignmentLine } from '@/shared/schemas/consignment';

import { PieceOutcome, showRunning } from '../sale/piece-outcome';
import { PriceEditor } from './price-editor';

/**
 * One piece on the consignment: what it is, its price and split, its insurance, what became of it
 * (sold, returned…) with what can still be done while the show runs, and its check.
 */
export function PieceRow({
  consignment,
  line,
  children,
}: {
  consignment: Consignment;
  line: ConsignmentLine;
  /** The piece's condition check, below its money. */
  children?: ReactNode;
}) {
  const remove = useLineRemoveMutation(consignment.id);
  const draft = consignment.state === 'draft';
  const split = line.split;
  const out = line.state === 'consigned';
  const outcome = showRunning(consignment.state) || !out;
  return (
    <View style={styles.row} testID={`piece-${line.id}`} role="listitem">
      <View style={styles.top}>
        <SquareImage uri={line.thumbnailUrl} size={72} label={`${line.title}, cover photo`} />
        <View style={styles.what}>
          <Text variant="small" style={styles.tabular}>
            {line.stockNumber}
          </Text>
          <TextLink
            href={{ pathname: '/works/[id]', params: { id: String(line.workId) } }}
            label={line.title}
          />
          <StateMark look={lineStateLooks[line.state]} />
        </View>
      </View>
      {draft ? (
        <PriceEditor
          consignmentId={consignment.id}
          lineId={line.id}
          price={line.listPrice}
          testID={`piece-${line.id}-price`}
        />
      ) : (
        <Text variant="number">{`${formatMoney(line.listPrice)} list price`}</Text>
      )}
      {!out ? null : split ? (
        <Text variant="small" testID={`piece-${line.id}-split`}>
          {`A sale at list price: the venue keeps ${formatMoney(venueKeeps(consignment.terms, split))} (commission ${formatMoney(split.commission)}${split.vatOnCommission.amount > 0 ? `, VAT ${formatMoney(split.vatOnCommission)}` : ''}); you get ${formatMoney(split.makerShare)}. Insured at ${formatMoney(line.insuranceValue)}.`}
        </Text>
      ) : (
        <Text variant="small" style={styles.problem}>
          Under these terms the commission would be more than the price: check the terms.
        </Text>
      )}
      {line.weightG !== null && line.weightG > 16_000 ? (
        <Text variant="small" testID={`piece-${line.id}-heavy`}>
          {`Heavy: ${(line.weightG / 1000).toLocaleString('en-GB')} kg. The sheet and label carry a handling note.`}
        </Text>
      ) : null}
      {outcome ? (
        <PieceOutcome
          line={line}
          consignment={consignment}
          side="studio"
          testID={`piece-${line.id}-outcome`}
        />
      ) : null}
      {children}
      {draft ? (
        <View style={styles.start}>
          <Button
            testID={`piece-${line.id}-remove`}
            label={`Take ${line.stockNumber} off this consignment`}
            busyLabel="Taking it off…"
            busy={remove.isPending}
            variant="danger"
            onPress={() => remove.mutate(line.id)}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    gap: spacing.sm,
    paddingVertical: spacing.md,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  top: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  what: { flex: 1, gap: spacing.xxs },
  tabular: { fontVariant: ['tabular-nums'] },
  problem: { color: palette.danger },
  start: { alignSelf: 'flex-start' },
});
