import { StyleSheet, View, type ViewProps } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';

/** A quiet raised surface, like a plinth: a hairline edge and no shadow. */
export function Card({ style, ...props }: ViewProps) {
  return <View {...props} style={[styles.card, style]} />;
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: palette.surface,
    borderColor: palette.hairline,
    borderWidth: 1,
    borderRadius: radii.lg,
    padding: spacing.lg,
    gap: spacing.sm,
  },
});
