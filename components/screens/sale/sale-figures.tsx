import { StyleSheet, View } from 'react-native';

import { MoneyLine } from '@/components/ui/money-line';
import { spacing } from '@/constants/theme';
import { type SaleSplit, type Terms } from '@/shared/schemas/terms';
import { percent } from '@/shared/terms/terms-in-words';

/** Which side is reading: the maker's share is "yours" to the studio. */
export type Side = 'venue' | 'studio';

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
      <MoneyLine
        label={`Commission (${percent(terms.commissionRateBp)})`}
        money={split.commission}
        testID={`${testID}-commission`}
      />
      {terms.commissionVat !== 'none' ? (
        <MoneyLine label={vatLabel(terms)} money={split.vatOnCommission} testID={`${testID}-vat`} />
      ) : null}
      <MoneyLine
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
});
