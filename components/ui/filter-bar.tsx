import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { spacing } from '@/constants/theme';

// A search landmark on the web; React Native's types do not list the role.
const searchRole = { role: 'search' } as object;

/** A search box and filters: side by side when there is room, stacked on a phone. */
export function FilterBar({ children, testID }: { children: ReactNode; testID?: string }) {
  return (
    <View testID={testID} {...searchRole} style={styles.bar}>
      {children}
    </View>
  );
}

/** One slot of a filter bar, growing to share the row. */
export function FilterSlot({ children, grow = 1 }: { children: ReactNode; grow?: number }) {
  return (
    <View style={[styles.slot, { flexGrow: grow, maxWidth: grow > 1 ? undefined : 320 }]}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, alignItems: 'flex-end' },
  slot: { flexBasis: 170, minWidth: 150 },
});
