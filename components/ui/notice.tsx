import { StyleSheet, View } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';

import { StateGlyph } from './state-mark';
import { Text } from './text';

type NoticeProps = { message: string; testID?: string; tone?: 'problem' | 'info' };

/** A message read out as soon as it appears: a problem with the whole form, or news. */
export function Notice({ message, testID, tone = 'problem' }: NoticeProps) {
  const problem = tone === 'problem';
  return (
    <View
      role="alert"
      aria-live="assertive"
      style={[styles.notice, problem ? styles.problem : styles.info]}
    >
      <StateGlyph
        shape={problem ? 'diamond' : 'dot'}
        color={problem ? palette.danger : palette.accent}
      />
      <Text testID={testID} style={styles.text}>
        {message}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  notice: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderLeftWidth: 4,
  },
  problem: { backgroundColor: palette.dangerSoft, borderColor: palette.danger },
  info: { backgroundColor: palette.accentSoft, borderColor: palette.accent },
  text: { flex: 1 },
});
