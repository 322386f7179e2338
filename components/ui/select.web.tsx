import { useId } from 'react';
import { StyleSheet, View } from 'react-native';

import { fonts, palette, spacing } from '@/constants/theme';

import { type SelectProps } from './select.types';
import { Text } from './text';
import { webControlStyle } from './web-control-style';

export type { SelectOption, SelectProps } from './select.types';

/** The browser's own drop-down: keyboard, screen readers and phones all know it. */
export function Select({
  label,
  options,
  value,
  onChange,
  testID,
  emptyLabel,
  error,
}: SelectProps) {
  const id = useId();
  return (
    <View style={styles.field}>
      <Text variant="label">
        <label htmlFor={id} style={{ font: 'inherit', color: 'inherit' }}>
          {label}
        </label>
      </Text>
      <select
        id={id}
        data-testid={testID}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        style={error ? { ...webControlStyle, ...invalidStyle } : webControlStyle}
      >
        {emptyLabel ? <option value="">{emptyLabel}</option> : null}
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {error ? (
        <Text testID={`${testID}-error`} role="alert" style={styles.error}>
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
