import { Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet, View } from 'react-native';

import { StateMark } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { Thumbnail } from '@/components/ui/thumbnail';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { workStatusLooks } from '@/constants/states';
import { palette, radii, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Work } from '@/shared/schemas/work';

function CardPressable({
  work,
  ...props
}: Omit<PressableProps, 'style' | 'children'> & { work: Work }) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      role="link"
      testID={`work-card-${work.id}`}
      accessibilityLabel={`${work.title}, ${work.stockNumber}, ${formatMoney(work.retailPrice)}, ${workStatusLooks[work.status].word}`}
      {...focusProps}
      {...props}
      style={({ pressed }) => [styles.card, pressed && styles.pressed, focused && focusRing]}
    >
      <Thumbnail photos={work.photos} size={96} label={`${work.title}, cover photo`} />
      <View style={styles.body}>
        <Text variant="small" style={styles.tabular}>
          {work.stockNumber}
        </Text>
        <Heading level={3} numberOfLines={2}>
          {work.title}
        </Heading>
        <Text variant="number">{formatMoney(work.retailPrice)}</Text>
        <StateMark look={workStatusLooks[work.status]} />
        {work.venue ? <Text variant="small">{work.venue.name}</Text> : null}
        {work.archivedAt ? <Text variant="small">Archived</Text> : null}
      </View>
    </Pressable>
  );
}

/** A work on a phone: its cover photo, square, beside what it is, what it costs and where it is. */
export function WorkCard({ work }: { work: Work }) {
  return (
    <Link href={{ pathname: '/works/[id]', params: { id: String(work.id) } }} asChild>
      <CardPressable work={work} />
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    flexDirection: 'row',
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: palette.hairline,
    backgroundColor: palette.surface,
  },
  pressed: { backgroundColor: palette.sunken },
  body: { flex: 1, gap: spacing.xxs },
  tabular: { fontVariant: ['tabular-nums'] },
});
