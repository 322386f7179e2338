import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';

import { StateGlyph } from './state-mark';
import { Text } from './text';

type CautionProps = { title: string; children: ReactNode; testID?: string };

/** A standing caution about the piece itself (handling, food use): part of the page, not news. */
export function Caution({ title, children, testID }: CautionProps) {
  return (
    <View testID={testID} role="note" style={styles.caution}>
      <StateGlyph shape="diamond" color={palette.ochre} />
      <View style={styles.body}>
        <Text variant="label">{title}</Text>
        <Text variant="small" style={styles.text}>
          {children}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  caution: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.md,
    padding: spacing.md,
    paddingTop: spacing.md + 4,
    borderRadius: radii.md,
    borderWidth: 1,
    borderLeftWidth: 4,
    borderColor: palette.ochre,
    backgroundColor: palette.surface,
  },
  body: { flex: 1, gap: spacing.xxs, marginTop: -4 },
  text: { color: palette.ink },
});
