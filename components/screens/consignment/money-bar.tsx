import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { sumMoney } from '@/shared/money/amounts';
import { formatMoney } from '@/shared/money/format';
import { type Consignment } from '@/shared/schemas/consignment';

function Figure({
  label,
  value,
  note,
  testID,
}: {
  label: string;
  value: string;
  note: string;
  testID: string;
}) {
  return (
    <View style={styles.figure}>
      <Text variant="label">{label}</Text>
      <Text variant="number" style={styles.value} testID={testID}>
        {value}
      </Text>
      <Text variant="small">{note}</Text>
    </View>
  );
}

/**
 * The money always in view: what is insured out now, what has sold, and the maker's share of
 * those sales (worked out by the server under the consignment's terms).
 */
export function MoneyBar({ consignment }: { consignment: Consignment }) {
  const currency = consignment.terms.currency;
  const counted = consignment.lines.filter((l) => l.state !== 'withdrawn');
  const sales = counted.flatMap((l) => (l.sale ? [l.sale] : []));
  const listTotal = consignment.totals?.listPrice ?? { amount: 0, currency };
  const soldTotal = sumMoney(
    sales.map((s) => s.price),
    currency,
  );
  const makerTotal = sumMoney(
    sales.map((s) => s.split.makerShare),
    currency,
  );
  return (
    <View style={styles.bar} testID="consignment-money">
      <Figure
        label="Pieces"
        value={String(counted.length)}
        note={`${formatMoney(listTotal)} at list price`}
        testID="consignment-money-pieces"
      />
      <Figure
        label="Insured out"
        value={formatMoney(consignment.insuredOut)}
        note="while at the venue or on the way"
        testID="consignment-money-insured"
      />
      <Figure
        label="Sold"
        value={formatMoney(soldTotal)}
        note={`${sales.length} ${sales.length === 1 ? 'piece' : 'pieces'}`}
        testID="consignment-money-sold"
      />
      <Figure
        label="Your share"
        value={formatMoney(makerTotal)}
        note="of the sales, after commission"
        testID="consignment-money-share"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.lg,
    backgroundColor: palette.sunken,
  },
  figure: { flexGrow: 1, flexBasis: 140, gap: spacing.xxs },
  value: { fontSize: 24, lineHeight: 30 },
});
