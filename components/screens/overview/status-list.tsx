import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { workStatusLooks } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';
import { type Overview } from '@/shared/schemas/overview';
import { workStatuses } from '@/shared/schemas/work';

/** Works by where they are, every status listed even at nought so the picture is complete. */
export function StatusList({ byStatus }: { byStatus: Overview['works']['byStatus'] }) {
  return (
    <Card style={styles.list} role="list">
      {workStatuses.map((status, index) => (
        <View key={status} role="listitem" style={[styles.row, index > 0 && styles.divided]}>
          <StateMark look={workStatusLooks[status]} />
          <Text variant="number" testID={`overview-status-${status}`} style={styles.count}>
            {String(byStatus[status] ?? 0)}
          </Text>
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0, paddingVertical: spacing.xs },
  row: {
    minHeight: 44,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
  count: { textAlign: 'right', minWidth: 48 },
});
