import { Pressable, StyleSheet } from 'react-native';

import { palette, radii, spacing, touchTarget } from '@/constants/theme';

import { StateGlyph } from './state-mark';
import { Text } from './text';
import { focusRing, useFocusRing } from './use-focus-ring';

type TickBoxProps = { label: string; ticked: boolean; onToggle: () => void; testID: string };

/** A yes-or-no choice that reads as a sentence beside its box. */
export function TickBox({ label, ticked, onToggle, testID }: TickBoxProps) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      role="checkbox"
      aria-checked={ticked}
      accessibilityState={{ checked: ticked }}
      testID={testID}
      onPress={onToggle}
      {...focusProps}
      style={({ pressed }) => [styles.box, pressed && styles.pressed, focused && focusRing]}
    >
      {/* A filled square when ticked, an open one when not: not colour alone. */}
      <StateGlyph
        shape={ticked ? 'square' : 'open-square'}
        color={ticked ? palette.accent : palette.outline}
      />
      <Text style={styles.label}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  box: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingVertical: spacing.sm,
    paddingHorizontal: spacing.sm,
    borderRadius: radii.md,
  },
  pressed: { backgroundColor: palette.sunken },
  label: { flex: 1 },
});
