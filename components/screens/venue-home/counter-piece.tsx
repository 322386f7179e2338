import { Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { formatDate } from '@/components/ui/format';
import { SquareImage } from '@/components/ui/square-image';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { lineStateLooks } from '@/constants/states';
import { palette, radii, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { formatMoney } from '@/shared/money/format';
import { type VenueCounterPiece } from '@/shared/schemas/venue-side';

const photoSize = 96;

function PiecePressable({
  item,
  showMaker,
  ...props
}: Omit<PressableProps, 'style' | 'children'> & { item: VenueCounterPiece; showMaker: boolean }) {
  const { focused, focusProps } = useFocusRing();
  const { line, studio } = item;
  const look = lineStateLooks[line.state];
  return (
    <Pressable
      role="link"
      accessibilityLabel={`${line.title}, ${line.stockNumber}${showMaker ? `, by ${studio.name}` : ''}, ${formatMoney(line.listPrice)}, ${look.word}`}
      {...focusProps}
      {...props}
      style={({ pressed }) => [styles.open, pressed && styles.pressed, focused && focusRing]}
    >
      <SquareImage uri={line.thumbnailUrl} size={photoSize} label={`${line.title}, cover photo`} />
      <View style={styles.what}>
        <Text variant="small" style={styles.tabular} numberOfLines={1}>
          {showMaker ? `${line.stockNumber} · ${studio.name}` : line.stockNumber}
        </Text>
        <Text variant="bodyStrong">{line.title}</Text>
        <Text variant="number">{formatMoney(line.listPrice)}</Text>
        <StateMark look={look} />
        {line.state === 'sold' && line.soldOn && line.salePrice ? (
          <Text variant="small">{`${formatDate(line.soldOn)}, ${formatMoney(line.salePrice)}`}</Text>
        ) : null}
      </View>
    </Pressable>
  );
}

/**
 * One piece in the counter list: its photo, title, stock number, price and state, opening the
 * piece; a piece still out has "Mark sold" (under it on a phone, beside it when wide), which
 * opens the piece with the sale begun.
 */
export function CounterPiece({
  item,
  showMaker,
}: {
  item: VenueCounterPiece;
  /** The person works for several studios: each piece says whose it is. */
  showMaker: boolean;
}) {
  const lineId = String(item.line.id);
  const out = item.line.state === 'consigned';
  const { wide } = useBreakpoint();
  return (
    <View style={[styles.card, wide && styles.cardWide]} testID={`counter-piece-${item.line.id}`}>
      <Link href={{ pathname: '/venue/piece/[lineId]', params: { lineId } }} asChild>
        <PiecePressable item={item} showMaker={showMaker} testID={`counter-open-${lineId}`} />
      </Link>
      {out ? (
        <View style={wide ? styles.sellBeside : styles.sellBelow}>
          <Link href={{ pathname: '/venue/piece/[lineId]', params: { lineId, sell: '1' } }} asChild>
            <Button
              testID={`counter-sell-${lineId}`}
              label="Mark sold"
              accessibilityLabel={`Mark sold: ${item.line.title}`}
            />
          </Link>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: palette.surface,
    borderColor: palette.hairline,
    borderWidth: 1,
    borderRadius: radii.lg,
  },
  open: {
    flex: 1,
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.lg,
  },
  pressed: { backgroundColor: palette.sunken },
  what: { flex: 1, gap: 2 },
  tabular: { fontVariant: ['tabular-nums'] },
  cardWide: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingRight: spacing.md,
  },
  sellBeside: { alignSelf: 'center' },
  // Under the words, as wide as they are: a big target on the thumb's side.
  sellBelow: {
    marginTop: -spacing.xs,
    paddingLeft: spacing.md + photoSize + spacing.md,
    paddingRight: spacing.md,
    paddingBottom: spacing.md,
  },
});
