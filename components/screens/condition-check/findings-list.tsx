import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { SquareImage } from '@/components/ui/square-image';
import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { conditionGradeLooks } from '@/constants/states';
import { spacing, stateTones } from '@/constants/theme';
import { findingInWords } from '@/shared/condition/words';

import { type DraftFinding } from './finding-form';

/** Findings in words, each with its grade's shape and its photo; removable while being written. */
export function FindingsList({
  findings,
  onRemove,
  testID,
}: {
  findings: readonly DraftFinding[];
  onRemove?: (index: number) => void;
  testID: string;
}) {
  if (findings.length === 0) {
    return <Text testID={`${testID}-none`}>No faults found.</Text>;
  }
  return (
    <View role="list" style={styles.list} testID={testID}>
      {findings.map((finding, index) => {
        const look = conditionGradeLooks[finding.grade];
        return (
          <View key={index} role="listitem" style={styles.item}>
            <StateGlyph shape={look.shape} color={stateTones[look.tone]} />
            {finding.photoUrl ? (
              <SquareImage
                uri={`${finding.photoUrl}/thumbnail`}
                size={48}
                label="Photo of the finding"
              />
            ) : null}
            <View style={styles.words}>
              <Text>{findingInWords(finding)}</Text>
              {finding.notes ? <Text variant="small">{finding.notes}</Text> : null}
            </View>
            {onRemove ? (
              <Button
                label="Remove"
                variant="quiet"
                accessibilityLabel={`Remove ${findingInWords(finding)}`}
                onPress={() => onRemove(index)}
              />
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  words: { flex: 1, minWidth: 160 },
});
