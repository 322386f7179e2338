import { useId } from 'react';
import { StyleSheet, View } from 'react-native';

import { spacing } from '@/constants/theme';

import { type SelectProps } from './select.types';
import { Text } from './text';
import { webControlStyle } from './web-control-style';

export type { SelectOption, SelectProps } from './select.types';

/** The browser's own drop-down: keyboard, screen readers and phones all know it. */
export function Select({ label, options, value, onChange, testID, emptyLabel }: SelectProps) {
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
        style={webControlStyle}
      >
        {emptyLabel ? <option value="">{emptyLabel}</option> : null}
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
});
