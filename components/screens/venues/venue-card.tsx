import { Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet } from 'react-native';

import { percentText } from '@/components/ui/decimal-text';
import { Heading, Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { palette, radii, spacing } from '@/constants/theme';
import { type Venue } from '@/shared/schemas/venue';

import { commissionVatText, venueKindWords } from '../venue-form/venue-words';

function CardPressable({
  venue,
  ...props
}: Omit<PressableProps, 'style' | 'children'> & { venue: Venue }) {
  const { focused, focusProps } = useFocusRing();
  const commission = `${percentText(venue.defaultTerms.commissionRateBp)}% commission`;
  const vat = commissionVatText(venue.defaultTerms);
  return (
    <Pressable
      role="link"
      testID={`venue-card-${venue.id}`}
      accessibilityLabel={`${venue.name}, ${venueKindWords[venue.kind]}, ${commission}, ${vat}`}
      {...focusProps}
      {...props}
      style={({ pressed }) => [styles.card, pressed && styles.pressed, focused && focusRing]}
    >
      <Text variant="small">
        {[venueKindWords[venue.kind], venue.town].filter(Boolean).join(' · ')}
      </Text>
      <Heading level={3}>{venue.name}</Heading>
      {venue.contactName ? <Text>{venue.contactName}</Text> : null}
      <Text variant="number">{commission}</Text>
      <Text variant="small" testID={`venue-card-${venue.id}-vat`}>
        {vat}
      </Text>
    </Pressable>
  );
}

export function VenueCard({ venue }: { venue: Venue }) {
  return (
    <Link href={{ pathname: '/venues/[id]', params: { id: String(venue.id) } }} asChild>
      <CardPressable venue={venue} />
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: spacing.xxs,
    padding: spacing.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: palette.hairline,
    backgroundColor: palette.surface,
  },
  pressed: { backgroundColor: palette.sunken },
});
