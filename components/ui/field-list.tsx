import { StyleSheet, View } from 'react-native';

import { palette, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

import { Text } from './text';

export type FieldItem = { label: string; value: string; numeric?: boolean; testID?: string };

/** Label and value pairs, read as a list: side by side when wide, stacked on a phone. */
export function FieldList({ items }: { items: readonly FieldItem[] }) {
  const { wide } = useBreakpoint();
  return (
    <View role="list" style={styles.list}>
      {items.map((item, index) => (
        <View
          key={item.label}
          role="listitem"
          style={[styles.item, wide && styles.itemWide, index > 0 && styles.divided]}
        >
          <Text variant="small" style={wide && styles.labelWide}>
            {item.label}
          </Text>
          <Text
            testID={item.testID}
            variant={item.numeric ? 'number' : 'body'}
            style={styles.value}
          >
            {item.value}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  item: { paddingVertical: spacing.sm, gap: spacing.xxs },
  itemWide: { flexDirection: 'row', gap: spacing.lg },
  labelWide: { width: 180 },
  value: { flex: 1 },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
});
