import { StyleSheet, View } from 'react-native';

import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { lineStateLooks } from '@/constants/states';
import { palette, radii, spacing, stateTones } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Consignment, type LineState } from '@/shared/schemas/consignment';

/** The tallies, in the order a show's pieces move through them; damaged and lost share one. */
const tallies: { key: string; word: string; states: LineState[] }[] = [
  { key: 'out', word: 'Out', states: ['consigned'] },
  { key: 'sold', word: 'Sold', states: ['sold'] },
  { key: 'returned', word: 'Returned', states: ['returned'] },
  { key: 'damaged-lost', word: 'Damaged or lost', states: ['damaged', 'lost'] },
  { key: 'withdrawn', word: 'Withdrawn', states: ['withdrawn'] },
];

/**
 * Where the pieces of a consignment stand: how many are out, sold, returned, damaged or lost, and
 * withdrawn, each by its word and shape, and the insured value of those still out.
 */
export function LineTallies({ consignment }: { consignment: Consignment }) {
  return (
    <View style={styles.tallies} testID="consignment-tallies">
      <View role="list" style={styles.row}>
        {tallies.map((tally) => {
          const count = consignment.lines.filter((l) => tally.states.includes(l.state)).length;
          return (
            <View key={tally.key} role="listitem" style={styles.tally}>
              <Text variant="number" style={styles.count} testID={`tally-${tally.key}`}>
                {String(count)}
              </Text>
              <View style={styles.mark}>
                {tally.states.map((state) => (
                  <StateGlyph
                    key={state}
                    shape={lineStateLooks[state].shape}
                    color={stateTones[lineStateLooks[state].tone]}
                  />
                ))}
                <Text variant="label" style={styles.word}>
                  {tally.word}
                </Text>
              </View>
            </View>
          );
        })}
      </View>
      <View style={styles.insured}>
        <Text style={styles.insuredLabel}>Insured value still out</Text>
        <Text variant="number" testID="tally-insured-out">
          {formatMoney(consignment.insuredOut)}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  tallies: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  tally: {
    flexGrow: 1,
    flexBasis: 96,
    gap: spacing.xxs,
    padding: spacing.sm,
    borderRadius: radii.md,
    backgroundColor: palette.paper,
    borderWidth: 1,
    borderColor: palette.hairline,
  },
  count: { fontSize: 24, lineHeight: 30 },
  mark: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  word: { flexShrink: 1 },
  insured: {
    flexDirection: 'row',
    alignItems: 'baseline',
    gap: spacing.md,
    paddingTop: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  insuredLabel: { flex: 1 },
});
