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
};

export function TextField({
  label,
  error,
  hint,
  testID,
  ref,
  onFocus,
  onBlur,
  ...props
}: TextFieldProps) {
  const { focused, focusProps } = useFocusRing();
  const invalid = error !== undefined && error !== '';
  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={`${testID}-label`}>
        {label}
      </Text>
      {hint ? <Text variant="small">{hint}</Text> : null}
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
        style={[styles.input, invalid && styles.inputInvalid, focused && focusRing]}
      />
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
  input: {
    minHeight: touchTarget + 4,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 1,
    borderColor: palette.outline,
    borderRadius: radii.md,
    backgroundColor: palette.surface,
    color: palette.ink,
    fontFamily: fonts.body,
    fontSize: 17,
  },
  inputInvalid: { borderColor: palette.danger, borderWidth: 2 },
  error: { color: palette.danger, fontFamily: fonts.bodyStrong, fontSize: 15, lineHeight: 21 },
});
