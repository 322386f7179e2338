import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { spacing } from '@/constants/theme';

/** Fields side by side that wrap onto the next line when the screen is too narrow for them. */
export function FieldRow({ children }: { children: ReactNode }) {
  return <View style={styles.row}>{children}</View>;
}

/** One field's share of a FieldRow: it grows from `basis` px and never shrinks below 110 px. */
export function FieldCell({ children, basis = 200 }: { children: ReactNode; basis?: number }) {
  return <View style={[styles.cell, { flexBasis: basis }]}>{children}</View>;
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, minWidth: 110 },
});
