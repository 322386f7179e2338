import { StyleSheet, View } from 'react-native';

import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { isNewDamage } from '@/shared/condition/differences';
import { changeWords, findingInWords } from '@/shared/condition/words';
import { type ConditionDifference } from '@/shared/schemas/condition';

/** What a later check shows that the dispatch check did not, flagged so it is seen. */
export function Differences({
  differences,
  testID,
}: {
  differences: readonly ConditionDifference[];
  testID: string;
}) {
  if (differences.length === 0) return null;
  return (
    <View role="list" style={styles.box} testID={testID} aria-label="Differences from dispatch">
      {differences.map((d, index) => {
        const damage = isNewDamage(d);
        return (
          <View key={index} role="listitem" style={styles.item}>
            <StateGlyph
              shape={damage ? 'diamond' : 'ring'}
              color={damage ? palette.ochre : palette.inkMuted}
            />
            <Text style={styles.text}>
              <Text variant="bodyStrong">{`${changeWords[d.change]}: `}</Text>
              {findingInWords(d.finding)}
              {d.before && d.change === 'changed' ? ` (was ${findingInWords(d.before)})` : ''}
            </Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radii.md,
    borderLeftWidth: 4,
    borderLeftColor: palette.ochre,
    backgroundColor: palette.sunken,
  },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  text: { flex: 1 },
});
