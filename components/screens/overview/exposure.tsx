import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { palette, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Overview } from '@/shared/schemas/overview';

/**
 * What is at risk: the insured value of every piece out, in all and per venue, one currency at a
 * time (the money engine's exposure; amounts in different currencies are never added).
 */
export function Exposure({ exposure }: { exposure: Overview['exposure'] }) {
  if (exposure.length === 0) {
    return <Text variant="small">Nothing is out, so nothing is at risk.</Text>;
  }
  return (
    <>
      {exposure.map((e) => (
        <Card key={e.currency} style={styles.card} testID={`exposure-${e.currency}`}>
          <Text variant="label">Insured value out</Text>
          <Text variant="figure" testID={`exposure-${e.currency}-total`}>
            {formatMoney(e.total)}
          </Text>
          <Text variant="small">{`${e.lineCount} ${e.lineCount === 1 ? 'piece' : 'pieces'} at venues or on the way`}</Text>
          <View role="list" style={styles.venues}>
            {e.byVenue.map((v) => (
              <View key={v.venueId} role="listitem" style={styles.venue}>
                <View style={styles.name}>
                  <TextLink
                    href={{ pathname: '/venues/[id]', params: { id: String(v.venueId) } }}
                    label={v.venueName}
                  />
                  <Text variant="small">{`${v.lineCount} ${v.lineCount === 1 ? 'piece' : 'pieces'}`}</Text>
                </View>
                <Text variant="number" testID={`exposure-venue-${v.venueId}`}>
                  {formatMoney(v.value)}
                </Text>
              </View>
            ))}
          </View>
        </Card>
      ))}
    </>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.xs },
  venues: { marginTop: spacing.sm },
  venue: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  name: { flex: 1 },
});
