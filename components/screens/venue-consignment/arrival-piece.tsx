import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { SquareImage } from '@/components/ui/square-image';
import { Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentLine } from '@/shared/schemas/consignment';

import { CheckForm, type CheckHeader } from '../condition-check/check-form';
import { CheckSummary } from '../condition-check/check-summary';
import { type DraftFinding, draftFrom } from '../condition-check/finding-form';
import { FindingsList } from '../condition-check/findings-list';

export type ArrivalCheck = CheckHeader & { findings: DraftFinding[] };

/**
 * One piece as it arrived. It starts from its dispatch check, so the examiner says "as sent" or
 * changes only what differs.
 */
export function ArrivalPiece({
  line,
  check,
  examinerName,
  onChange,
}: {
  line: ConsignmentLine;
  /** The check this piece will be acknowledged with; null while it is "as sent". */
  check: ArrivalCheck | null;
  examinerName: string;
  onChange: (check: ArrivalCheck | null) => void;
}) {
  const [editing, setEditing] = useState(false);
  const sent = (line.dispatchCheck?.findings ?? []).map(draftFrom);
  const id = `arrival-${line.id}`;
  return (
    <View style={styles.piece} role="listitem" testID={id}>
      <View style={styles.top}>
        <SquareImage uri={line.thumbnailUrl} size={88} label={`${line.title}, cover photo`} />
        <View style={styles.what}>
          <Text variant="small" style={styles.tabular}>
            {line.stockNumber}
          </Text>
          <Text variant="bodyStrong">{line.title}</Text>
          <Text variant="number">{formatMoney(line.listPrice)}</Text>
        </View>
      </View>
      {line.dispatchCheck ? (
        <CheckSummary check={line.dispatchCheck} testID={`${id}-dispatch`} />
      ) : null}
      {editing ? (
        <CheckForm
          testID={`${id}-form`}
          examinerName={examinerName}
          startFrom={check?.findings ?? sent}
          submitLabel="Keep this check"
          onCancel={() => setEditing(false)}
          onSubmit={async (next) => {
            onChange(next);
            setEditing(false);
          }}
        />
      ) : check ? (
        <View style={styles.changed} testID={`${id}-changed`}>
          <Text variant="label">On arrival, as you recorded it</Text>
          <FindingsList testID={`${id}-findings`} findings={check.findings} />
          <View style={styles.buttons}>
            <Button label="Change this check" variant="quiet" onPress={() => setEditing(true)} />
            <Button label="Back to as sent" variant="quiet" onPress={() => onChange(null)} />
          </View>
        </View>
      ) : (
        <View style={styles.buttons}>
          <Text testID={`${id}-as-sent`}>As sent.</Text>
          <Button
            testID={`${id}-differs`}
            label="Something differs"
            variant="secondary"
            onPress={() => setEditing(true)}
          />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  piece: {
    gap: spacing.sm,
    paddingVertical: spacing.md,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  top: { flexDirection: 'row', gap: spacing.md },
  what: { flex: 1, gap: 2 },
  tabular: { fontVariant: ['tabular-nums'] },
  changed: { gap: spacing.xs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
