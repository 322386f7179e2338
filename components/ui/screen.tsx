import { type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { contentMaxWidth, palette, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

type ScreenProps = {
  testID: string;
  children: ReactNode;
  /** Narrow column for forms such as sign-in. */
  narrow?: boolean;
};

/** A screen's scrolling body: paper background, a centred column, room to breathe. */
export function Screen({ testID, children, narrow = false }: ScreenProps) {
  const { wide } = useBreakpoint();
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={[styles.content, wide && styles.contentWide]}
      keyboardShouldPersistTaps="handled"
      // A keyboard user must be able to scroll a page that holds nothing focusable (WCAG 2.1.1).
      focusable
    >
      <View testID={testID} role="main" style={[styles.column, narrow && styles.narrow]}>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: palette.paper },
  content: { flexGrow: 1, padding: spacing.lg, paddingBottom: spacing.xxl },
  contentWide: { padding: spacing.xxl },
  column: { width: '100%', maxWidth: contentMaxWidth, alignSelf: 'center', gap: spacing.xl },
  narrow: { maxWidth: 440 },
});
