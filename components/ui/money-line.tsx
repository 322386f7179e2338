import { StyleSheet, View } from 'react-native';

import { fonts, palette, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Money } from '@/shared/schemas/money';

import { Text } from './text';

/** One labelled amount of a split, the amount right-aligned in tabular figures; `strong` for the total. */
export function MoneyLine({
  label,
  money,
  testID,
  strong = false,
}: {
  label: string;
  money: Money;
  testID: string;
  strong?: boolean;
}) {
  return (
    <View style={styles.line}>
      <Text variant={strong ? 'bodyStrong' : 'body'} style={styles.label}>
        {label}
      </Text>
      <Text variant="number" testID={testID} style={[styles.amount, strong && styles.strong]}>
        {formatMoney(money)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  line: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.md },
  label: { flex: 1 },
  amount: { textAlign: 'right', minWidth: 96 },
  strong: { fontFamily: fonts.bodyStrong, color: palette.ink },
});
