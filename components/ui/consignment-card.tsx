import { StyleSheet, View } from 'react-native';

import { consignmentStateLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { type ConsignmentSummary } from '@/shared/schemas/consignment';

import { Card } from './card';
import { formatDate } from './format';
import { StateMark } from './state-mark';
import { Heading, Text } from './text';

type ConsignmentCardProps = {
  consignment: ConsignmentSummary;
  /** The venue's own screens leave out its name: they are all theirs. */
  showVenue?: boolean;
};

/** One consignment as a card: what, where, in what state, until when, and how it is going. */
export function ConsignmentCard({ consignment, showVenue = true }: ConsignmentCardProps) {
  const { id, reference, title, venueName, state, closingDate, linesOut, linesSold } = consignment;
  return (
    <Card testID={`consignment-card-${id}`}>
      <View style={styles.top}>
        <Text variant="small" style={styles.reference}>
          {reference}
        </Text>
        <StateMark look={consignmentStateLooks[state]} />
      </View>
      <Heading level={3}>{title}</Heading>
      {showVenue ? <Text>{venueName}</Text> : null}
      <Text variant="small">
        {closingDate ? `Closes ${formatDate(closingDate)}` : 'No closing date set'}
      </Text>
      <View style={styles.counts}>
        <Text variant="number">{linesOut}</Text>
        <Text variant="small">out</Text>
        <Text variant="small" aria-hidden>
          ·
        </Text>
        <Text variant="number">{linesSold}</Text>
        <Text variant="small">sold</Text>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  top: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: spacing.sm,
  },
  reference: { fontVariant: ['tabular-nums'] },
  counts: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.xs },
});
