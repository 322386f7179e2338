import { type Ref } from 'react';
import { StyleSheet, TextInput, type TextInputProps, View } from 'react-native';

import { fonts, palette, radii, spacing, touchTarget } from '@/constants/theme';

import { Text } from './text';
import { focusRing, useFocusRing } from './use-focus-ring';

export type TextFieldProps = Omit<TextInputProps, 'style'> & {
  label: string;
  /** What is wrong with the value, in plain words, shown under the field. */
  error?: string;
  hint?: string;
  testID: string;
  ref?: Ref<TextInput>;
  /** Shown inside the box before the value, e.g. "£". */
  prefix?: string;
  /** Shown inside the box after the value, e.g. "mm". */
  suffix?: string;
  /** Figures in tabular digits, for money and measurements. */
  tabular?: boolean;
};

export function TextField({
  label,
  error,
  hint,
  testID,
  ref,
  onFocus,
  onBlur,
  prefix,
  suffix,
  tabular = false,
  ...props
}: TextFieldProps) {
  const { focused, focusProps } = useFocusRing();
  const invalid = error !== undefined && error !== '';
  const framed = prefix !== undefined || suffix !== undefined;
  const input = (
    <TextInput
      ref={ref}
      testID={testID}
      accessibilityLabel={label}
      aria-invalid={invalid}
      placeholderTextColor={palette.inkMuted}
      onFocus={(event) => {
        focusProps.onFocus();
        onFocus?.(event);
      }}
      onBlur={(event) => {
        focusProps.onBlur();
        onBlur?.(event);
      }}
      {...props}
      style={[
        styles.input,
        tabular && styles.tabular,
        framed
          ? styles.bare
          : [
              styles.box,
              invalid && styles.boxInvalid,
              focused && focusRing,
              props.multiline && styles.multiline,
            ],
      ]}
    />
  );
  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={`${testID}-label`}>
        {label}
      </Text>
      {hint ? <Text variant="small">{hint}</Text> : null}
      {framed ? (
        <View
          style={[styles.box, styles.frame, invalid && styles.boxInvalid, focused && focusRing]}
        >
          {prefix ? (
            <Text aria-hidden style={styles.affix}>
              {prefix}
            </Text>
          ) : null}
          {input}
          {suffix ? (
            <Text aria-hidden style={styles.affix}>
              {suffix}
            </Text>
          ) : null}
        </View>
      ) : (
        input
      )}
      {invalid ? (
        <Text testID={`${testID}-error`} role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  box: {
    minHeight: touchTarget + 4,
    borderWidth: 1,
    borderColor: palette.outline,
    borderRadius: radii.md,
    backgroundColor: palette.surface,
    paddingHorizontal: spacing.md,
  },
  frame: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  input: {
    paddingVertical: spacing.sm,
    color: palette.ink,
    fontFamily: fonts.body,
    fontSize: 17,
  },
  bare: { flex: 1, minWidth: 0, minHeight: touchTarget, outlineStyle: 'none' } as object,
  multiline: { minHeight: 96, textAlignVertical: 'top' },
  tabular: { fontVariant: ['tabular-nums'] },
  affix: { color: palette.inkMuted, fontFamily: fonts.body, fontSize: 17 },
  boxInvalid: { borderColor: palette.danger, borderWidth: 2 },
  error: { color: palette.danger, fontFamily: fonts.bodyStrong, fontSize: 15, lineHeight: 21 },
});
