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

/** One slot of a filter bar, growing to share the row; `basis` is the width it starts from. */
export function FilterSlot({
  children,
  grow = 1,
  basis,
}: {
  children: ReactNode;
  grow?: number;
  basis?: number;
}) {
  return (
    <View
      style={[
        styles.slot,
        { flexGrow: grow, maxWidth: grow > 1 ? undefined : 320 },
        basis !== undefined && { flexBasis: basis },
      ]}
    >
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, alignItems: 'flex-end' },
  slot: { flexBasis: 170, minWidth: 150 },
});
