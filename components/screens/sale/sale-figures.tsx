import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { fonts, palette, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Money } from '@/shared/schemas/money';
import { type SaleSplit, type Terms } from '@/shared/schemas/terms';
import { percent } from '@/shared/terms/terms-in-words';

/** Which side is reading: the maker's share is "yours" to the studio. */
export type Side = 'venue' | 'studio';

function Figure({
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

/** With VAT included the commission already holds it: the VAT is shown as the part it is. */
const vatLabel = (terms: Terms) =>
  terms.commissionVat === 'added' ? 'VAT on commission' : 'of which VAT';

/**
 * A sale's split under the consignment's terms: the commission, its VAT and the maker's share,
 * amounts right-aligned in tabular figures. They add up to the price paid.
 */
export function SaleFigures({
  terms,
  split,
  side,
  testID,
}: {
  terms: Terms;
  split: SaleSplit;
  side: Side;
  testID: string;
}) {
  return (
    <View style={styles.lines} testID={testID}>
      <Figure
        label={`Commission (${percent(terms.commissionRateBp)})`}
        money={split.commission}
        testID={`${testID}-commission`}
      />
      {terms.commissionVat !== 'none' ? (
        <Figure label={vatLabel(terms)} money={split.vatOnCommission} testID={`${testID}-vat`} />
      ) : null}
      <Figure
        label={side === 'studio' ? 'Your share' : 'The maker’s share'}
        money={split.makerShare}
        testID={`${testID}-share`}
        strong
      />
    </View>
  );
}

const styles = StyleSheet.create({
  lines: { gap: spacing.xxs },
  line: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.md },
  label: { flex: 1 },
  amount: { textAlign: 'right', minWidth: 96 },
  strong: { fontFamily: fonts.bodyStrong, color: palette.ink },
});
