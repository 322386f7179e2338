import { Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet, View } from 'react-native';

import { formatDate } from '@/components/ui/format';
import { Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { fonts, palette, radii, spacing, touchTarget } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { formatMoney } from '@/shared/money/format';
import { type Overview } from '@/shared/schemas/overview';

type Sale = Overview['recentSales'][number];

function SalePressable({
  sale,
  wide,
  ...props
}: Omit<PressableProps, 'style' | 'children'> & { sale: Sale; wide: boolean }) {
  const { focused, focusProps } = useFocusRing();
  const piece = `${sale.stockNumber} ${sale.title}`;
  const by = sale.enteredBy === 'studio' ? ', entered by the studio' : '';
  return (
    <Pressable
      role="link"
      accessibilityLabel={`${piece}, sold at ${sale.venueName} on ${formatDate(sale.soldOn)} for ${formatMoney(sale.price)}, your share ${formatMoney(sale.makerShare)}${by}`}
      {...focusProps}
      {...props}
      style={({ pressed }) => [
        wide ? styles.row : styles.card,
        pressed && styles.pressed,
        focused && focusRing,
      ]}
    >
      {wide ? (
        <>
          <View style={styles.piece}>
            <Text variant="small" style={styles.tabular}>
              {sale.stockNumber}
            </Text>
            <Text variant="bodyStrong" numberOfLines={2}>
              {sale.title}
            </Text>
          </View>
          <Text style={styles.venue} numberOfLines={2}>
            {sale.venueName}
          </Text>
          <Text variant="number" style={styles.date}>
            {formatDate(sale.soldOn)}
          </Text>
          <Text variant="number" style={styles.money}>
            {formatMoney(sale.price)}
          </Text>
          <Text variant="number" style={[styles.money, styles.share]}>
            {formatMoney(sale.makerShare)}
          </Text>
        </>
      ) : (
        <>
          <Text variant="small" style={styles.tabular}>
            {`${sale.stockNumber} · ${formatDate(sale.soldOn)}`}
          </Text>
          <Text variant="bodyStrong">{sale.title}</Text>
          <Text>{sale.venueName}</Text>
          <View style={styles.figures}>
            <Text variant="number">{formatMoney(sale.price)}</Text>
            <Text variant="small">{`your share ${formatMoney(sale.makerShare)}`}</Text>
          </View>
        </>
      )}
    </Pressable>
  );
}

/**
 * The latest sales, newest first: the piece, where and when it sold, the price paid and what it
 * leaves the maker. Each opens its consignment.
 */
export function RecentSales({ sales }: { sales: Overview['recentSales'] }) {
  const { wide } = useBreakpoint();
  if (sales.length === 0) {
    return <Text variant="small">No sales yet. Each sale a venue records shows here.</Text>;
  }
  return (
    <View style={wide ? styles.table : styles.cards} testID="recent-sales">
      {wide ? (
        <View style={styles.header} aria-hidden>
          <Text variant="label" style={styles.piece}>
            Piece
          </Text>
          <Text variant="label" style={styles.venue}>
            Venue
          </Text>
          <Text variant="label" style={styles.date}>
            Sold
          </Text>
          <Text variant="label" style={styles.money}>
            Price
          </Text>
          <Text variant="label" style={styles.money}>
            Your share
          </Text>
        </View>
      ) : null}
      <View role="list" aria-label="Recent sales" style={wide ? null : styles.cards}>
        {sales.map((sale) => (
          <View role="listitem" key={sale.lineId}>
            <Link
              href={{
                pathname: '/consignments/[id]',
                params: { id: String(sale.consignmentId) },
              }}
              asChild
            >
              <SalePressable sale={sale} wide={wide} testID={`recent-sale-${sale.lineId}`} />
            </Link>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  table: {
    backgroundColor: palette.surface,
    borderColor: palette.hairline,
    borderWidth: 1,
    borderRadius: radii.lg,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
  },
  header: {
    flexDirection: 'row',
    alignItems: 'flex-end',
    gap: spacing.md,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: palette.outline,
  },
  row: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: palette.hairline,
  },
  piece: { flex: 2 },
  venue: { flex: 1.4 },
  date: { width: 120 },
  money: { width: 110, textAlign: 'right' },
  share: { fontFamily: fonts.bodyStrong },
  tabular: { fontVariant: ['tabular-nums'] },
  cards: { gap: spacing.md },
  card: {
    gap: spacing.xxs,
    backgroundColor: palette.surface,
    borderColor: palette.hairline,
    borderWidth: 1,
    borderRadius: radii.lg,
    padding: spacing.lg,
  },
  figures: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.sm },
  pressed: { backgroundColor: palette.sunken },
});
