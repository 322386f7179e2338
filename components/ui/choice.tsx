import { Pressable, StyleSheet, View } from 'react-native';

import { palette, radii, spacing, touchTarget } from '@/constants/theme';

import { StateGlyph } from './state-mark';
import { Text } from './text';
import { focusRing, useFocusRing } from './use-focus-ring';

export type ChoiceOption<T extends string> = { value: T; label: string };

type ChoiceProps<T extends string> = {
  label: string;
  options: readonly ChoiceOption<T>[];
  value: T | undefined;
  onChange: (value: T) => void;
  testID: string;
  hint?: string;
  error?: string;
};

function ChoiceButton<T extends string>({
  option,
  selected,
  onPress,
  testID,
}: {
  option: ChoiceOption<T>;
  selected: boolean;
  onPress: () => void;
  testID: string;
}) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      testID={testID}
      role="radio"
      aria-checked={selected}
      accessibilityState={{ checked: selected }}
      onPress={onPress}
      {...focusProps}
      style={({ pressed }) => [
        styles.option,
        selected && styles.selected,
        pressed && styles.pressed,
        focused && focusRing,
      ]}
    >
      {/* A filled mark beside the chosen one: not colour alone. */}
      <StateGlyph
        shape={selected ? 'dot' : 'ring'}
        color={selected ? palette.accent : palette.outline}
      />
      <Text variant={selected ? 'label' : 'body'}>{option.label}</Text>
    </Pressable>
  );
}

/** One of a few choices, all visible at once: a radio group drawn as a row of buttons. */
export function Choice<T extends string>({
  label,
  options,
  value,
  onChange,
  testID,
  hint,
  error,
}: ChoiceProps<T>) {
  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={`${testID}-label`}>
        {label}
      </Text>
      {hint ? <Text variant="small">{hint}</Text> : null}
      <View
        testID={testID}
        role="radiogroup"
        aria-labelledby={`${testID}-label`}
        style={styles.options}
      >
        {options.map((option) => (
          <ChoiceButton
            key={option.value}
            option={option}
            selected={option.value === value}
            onPress={() => onChange(option.value)}
            testID={`${testID}-${option.value}`}
          />
        ))}
      </View>
      {error ? (
        <Text testID={`${testID}-error`} role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  option: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingHorizontal: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: palette.outline,
    backgroundColor: palette.surface,
  },
  selected: { borderColor: palette.accent, borderWidth: 2, backgroundColor: palette.accentSoft },
  pressed: { backgroundColor: palette.sunken },
  error: { color: palette.danger, fontWeight: '600', fontSize: 15, lineHeight: 21 },
});
