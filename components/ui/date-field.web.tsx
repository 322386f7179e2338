import { useId } from 'react';
import { StyleSheet, View } from 'react-native';

import { fonts, palette, spacing } from '@/constants/theme';

import { type DateFieldProps } from './date-field.types';
import { Text } from './text';
import { webControlStyle } from './web-control-style';

export type { DateFieldProps } from './date-field.types';

/** The browser's own date input: a calendar on a phone, typing and arrow keys on a desk. */
export function DateField({ label, value, onChange, onBlur, testID, hint, error }: DateFieldProps) {
  const id = useId();
  const invalid = error !== undefined && error !== '';
  return (
    <View style={styles.field}>
      <Text variant="label">
        <label htmlFor={id} style={{ font: 'inherit', color: 'inherit' }}>
          {label}
        </label>
      </Text>
      {hint ? <Text variant="small">{hint}</Text> : null}
      <input
        id={id}
        type="date"
        data-testid={testID}
        aria-invalid={invalid}
        aria-describedby={invalid ? `${id}-error` : undefined}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        onBlur={onBlur}
        style={{
          ...webControlStyle,
          fontVariantNumeric: 'tabular-nums',
          ...(invalid ? invalidStyle : null),
        }}
      />
      {invalid ? (
        <Text nativeID={`${id}-error`} testID={`${testID}-error`} role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const invalidStyle = { borderColor: palette.danger, borderWidth: 2 } as const;

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  error: { color: palette.danger, fontFamily: fonts.bodyStrong, fontSize: 15, lineHeight: 21 },
});
