import { type Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { consignmentStateLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentSummary } from '@/shared/schemas/consignment';
import { type Money } from '@/shared/schemas/money';

import { formatDate } from './format';
import { LinkCard } from './link-card';
import { StateMark } from './state-mark';
import { Heading, Text } from './text';

type ConsignmentCardProps = {
  consignment: ConsignmentSummary & { insuredOut?: Money | null };
  /** Where the card leads: the studio's consignment page, or the venue's. */
  href: Href;
  /** The venue's own screens leave out its name: they are all theirs. */
  showVenue?: boolean;
  /** A line under the title: whose work it is, or what is waiting to be done. */
  note?: string;
};

/** One consignment as a card: what, where, in what state, until when, and how it is going. */
export function ConsignmentCard({
  consignment,
  href,
  showVenue = true,
  note,
}: ConsignmentCardProps) {
  const { id, reference, title, venueName, state, closingDate, linesOut, linesSold, insuredOut } =
    consignment;
  const look = consignmentStateLooks[state];
  return (
    <LinkCard
      href={href}
      testID={`consignment-card-${id}`}
      label={`${reference}, ${title}${showVenue ? `, at ${venueName}` : ''}, ${look.word}${note ? `, ${note}` : ''}`}
    >
      <View style={styles.top}>
        <Text variant="small" style={styles.reference}>
          {reference}
        </Text>
        <StateMark look={look} />
      </View>
      <Heading level={3}>{title}</Heading>
      {showVenue ? <Text>{venueName}</Text> : null}
      {note ? <Text variant="label">{note}</Text> : null}
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
        {insuredOut && insuredOut.amount > 0 ? (
          <>
            <Text variant="small" aria-hidden>
              ·
            </Text>
            <Text variant="number">{formatMoney(insuredOut)}</Text>
            <Text variant="small">insured out</Text>
          </>
        ) : null}
      </View>
    </LinkCard>
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
  counts: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.xs },
});
