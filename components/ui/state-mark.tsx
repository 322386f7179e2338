import { StyleSheet, View, type ViewStyle } from 'react-native';

import { type StateLook, type StateShape } from '@/constants/states';
import { palette, radii, spacing, stateTones } from '@/constants/theme';

import { Text } from './text';

const size = 12;

function glyphParts(shape: StateShape, color: string): ViewStyle[] {
  const box: ViewStyle = { width: size, height: size };
  switch (shape) {
    case 'ring':
      return [{ ...box, borderRadius: radii.round, borderWidth: 2, borderColor: color }];
    case 'dot':
      return [{ ...box, borderRadius: radii.round, backgroundColor: color }];
    case 'half':
      return [
        {
          ...box,
          borderRadius: radii.round,
          borderWidth: 2,
          borderColor: color,
          overflow: 'hidden',
        },
      ];
    case 'square':
      return [{ ...box, borderRadius: 1, backgroundColor: color }];
    case 'open-square':
      return [{ ...box, borderRadius: 1, borderWidth: 2, borderColor: color }];
    case 'diamond':
      return [{ width: 9, height: 9, backgroundColor: color, transform: [{ rotate: '45deg' }] }];
    case 'triangle-right':
    case 'triangle-left':
      return [
        {
          width: 0,
          height: 0,
          borderTopWidth: size / 2,
          borderBottomWidth: size / 2,
          borderTopColor: 'transparent',
          borderBottomColor: 'transparent',
          [shape === 'triangle-right' ? 'borderLeftWidth' : 'borderRightWidth']: size - 1,
          [shape === 'triangle-right' ? 'borderLeftColor' : 'borderRightColor']: color,
        },
      ];
    case 'bar':
      return [{ width: size, height: 3, borderRadius: 1, backgroundColor: color }];
    case 'cross':
      return [];
  }
}

/** The shape of a state, drawn in its tone; decorative, since the word beside it says the same. */
export function StateGlyph({ shape, color }: { shape: StateShape; color: string }) {
  const [part] = glyphParts(shape, color);
  return (
    <View
      testID={`state-glyph-${shape}`}
      aria-hidden
      importantForAccessibility="no-hide-descendants"
      style={styles.frame}
    >
      {shape === 'cross' ? (
        <>
          <View
            style={[styles.stroke, { backgroundColor: color, transform: [{ rotate: '45deg' }] }]}
          />
          <View
            style={[styles.stroke, { backgroundColor: color, transform: [{ rotate: '-45deg' }] }]}
          />
        </>
      ) : (
        <View style={part}>
          {shape === 'half' ? <View style={[styles.halfFill, { backgroundColor: color }]} /> : null}
        </View>
      )}
    </View>
  );
}

type StateMarkProps = { look: StateLook; testID?: string };

/** A state as a word with its own shape beside it: readable without colour. */
export function StateMark({ look, testID }: StateMarkProps) {
  return (
    <View testID={testID} style={styles.mark}>
      <StateGlyph shape={look.shape} color={stateTones[look.tone]} />
      <Text variant="label" style={styles.word}>
        {look.word}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  mark: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingVertical: spacing.xxs,
  },
  frame: { width: size + 2, height: size + 2, alignItems: 'center', justifyContent: 'center' },
  stroke: { position: 'absolute', width: size + 2, height: 2.5, borderRadius: 1 },
  halfFill: { width: '50%', height: '100%' },
  word: { color: palette.ink },
});
