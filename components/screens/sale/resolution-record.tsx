import { StyleSheet, View } from 'react-native';

import { formatDate } from '@/components/ui/format';
import { SquareImage } from '@/components/ui/square-image';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { type ConsignmentLine, type LineState } from '@/shared/schemas/consignment';

import { enteredWords } from './sale-record';

const how: Partial<Record<LineState, string>> = {
  returned: 'Returned to the maker',
  damaged: 'Damaged',
  lost: 'Lost',
  withdrawn: 'Withdrawn by the maker',
};

/** How a piece left the consignment other than by a sale: when, the note, the photo, and who. */
export function ResolutionRecord({ line, testID }: { line: ConsignmentLine; testID: string }) {
  const resolution = line.resolution;
  if (!resolution) return null;
  return (
    <View style={styles.record} testID={testID}>
      <Text variant="bodyStrong" testID={`${testID}-summary`}>
        {`${how[line.state] ?? 'Accounted for'} on ${formatDate(resolution.on)}`}
      </Text>
      {resolution.note ? <Text testID={`${testID}-note`}>{resolution.note}</Text> : null}
      {resolution.photo ? (
        <SquareImage
          uri={`${resolution.photo.url}/thumbnail`}
          size={96}
          label={`Photo of ${line.title} as found`}
        />
      ) : null}
      <Text variant={resolution.enteredBy === 'studio' ? 'label' : 'small'}>
        {enteredWords(resolution)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  record: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: palette.sunken,
  },
});
