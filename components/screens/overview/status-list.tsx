import { Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { counted } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { workStatusLooks } from '@/constants/states';
import { palette, spacing, touchTarget } from '@/constants/theme';
import { type Overview } from '@/shared/schemas/overview';
import { type WorkStatus, workStatuses } from '@/shared/schemas/work';

type RowProps = Omit<PressableProps, 'style' | 'children'> & {
  status: WorkStatus;
  count: number;
  divided: boolean;
};

/** One status and its count, the whole row a link; a component of its own for Link's slot. */
function StatusRow({ status, count, divided, ...props }: RowProps) {
  const { focused, focusProps } = useFocusRing();
  const look = workStatusLooks[status];
  return (
    <Pressable
      role="link"
      testID={`overview-status-link-${status}`}
      accessibilityLabel={`${look.word}: ${counted(count, 'work')}. Show them in the works list.`}
      {...focusProps}
      {...props}
      style={({ pressed }) => [
        styles.row,
        divided && styles.divided,
        pressed && styles.pressed,
        focused && focusRing,
      ]}
    >
      <StateMark look={look} />
      <View style={styles.end}>
        <Text variant="number" testID={`overview-status-${status}`} style={styles.count}>
          {String(count)}
        </Text>
        <Text variant="bodyStrong" aria-hidden style={styles.arrow}>
          ›
        </Text>
      </View>
    </Pressable>
  );
}

/**
 * Works by where they are, every status listed even at nought so the picture is complete; each
 * opens the works list narrowed to it.
 */
export function StatusList({ byStatus }: { byStatus: Overview['works']['byStatus'] }) {
  return (
    <Card style={styles.list} role="list">
      {workStatuses.map((status, index) => (
        <View key={status} role="listitem">
          <Link href={{ pathname: '/works', params: { status } }} asChild>
            <StatusRow status={status} count={byStatus[status] ?? 0} divided={index > 0} />
          </Link>
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0, paddingVertical: spacing.xs },
  row: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
  pressed: { backgroundColor: palette.sunken },
  end: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  count: { textAlign: 'right', minWidth: 48 },
  arrow: { color: palette.accent },
});
