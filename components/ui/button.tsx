import { type ReactNode } from 'react';
import { Pressable, type PressableProps, StyleSheet } from 'react-native';

import { palette, radii, spacing, touchTarget } from '@/constants/theme';

import { Text } from './text';
import { focusRing, useFocusRing } from './use-focus-ring';

/** `danger` is for what removes or calls off something: it looks unlike saving. */
type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

export type ButtonProps = Omit<PressableProps, 'children' | 'style'> & {
  label: string;
  /** Shown instead of the label while the action runs, e.g. "Signing in…". */
  busyLabel?: string;
  busy?: boolean;
  variant?: Variant;
  /** `large`: the one action a screen is for, pressed with a thumb (a sale at the counter). */
  size?: 'regular' | 'large';
  icon?: ReactNode;
};

export function Button({
  label,
  busyLabel,
  busy = false,
  variant = 'primary',
  size = 'regular',
  disabled,
  icon,
  ...props
}: ButtonProps) {
  const { focused, focusProps } = useFocusRing();
  const inactive = busy || disabled === true;
  return (
    <Pressable
      role="button"
      accessibilityState={{ disabled: inactive, busy }}
      aria-disabled={inactive}
      disabled={inactive}
      {...focusProps}
      {...props}
      style={({ pressed }) => [
        styles.base,
        styles[variant],
        size === 'large' && styles.large,
        pressed && pressedStyles[variant],
        inactive && styles.inactive,
        focused && focusRing,
      ]}
    >
      {icon}
      <Text variant={size === 'large' ? 'bodyStrong' : 'label'} style={labelStyles[variant]}>
        {busy && busyLabel ? busyLabel : label}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: touchTarget,
    minWidth: touchTarget,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    borderRadius: radii.md,
    borderWidth: 1,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.sm,
  },
  primary: { backgroundColor: palette.accent, borderColor: palette.accent },
  secondary: { backgroundColor: palette.surface, borderColor: palette.outline },
  quiet: { backgroundColor: 'transparent', borderColor: 'transparent' },
  danger: { backgroundColor: palette.surface, borderColor: palette.danger, borderWidth: 2 },
  inactive: { opacity: 0.7 },
  large: { minHeight: 56, paddingHorizontal: spacing.xl },
});

const pressedStyles = StyleSheet.create({
  primary: { backgroundColor: palette.accentPressed, borderColor: palette.accentPressed },
  secondary: { backgroundColor: palette.sunken },
  quiet: { backgroundColor: palette.sunken },
  danger: { backgroundColor: palette.dangerSoft },
});

const labelStyles = StyleSheet.create({
  primary: { color: palette.onAccent },
  secondary: { color: palette.ink },
  quiet: { color: palette.accent, textDecorationLine: 'underline' },
  danger: { color: palette.danger },
});
