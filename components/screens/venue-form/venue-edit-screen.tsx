import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { useVenueQuery, useVenueUpdateMutation } from '@/hooks/queries/venues';
import { useActiveRole } from '@/hooks/session';

import { VenueForm } from './venue-form';
import { venueUpdateBindings, venueValues } from './venue-form-values';

export function VenueEditScreen({ id }: { id: number }) {
  const owner = useActiveRole() === 'owner';
  const router = useRouter();
  const venue = useVenueQuery(id);
  const update = useVenueUpdateMutation(id);
  const back = { pathname: '/venues/[id]', params: { id: String(id) } } as const;
  return (
    <Screen testID="venue-edit-screen">
      {venue.isPending ? (
        <LoadingView message="Fetching the venue…" />
      ) : venue.isError ? (
        <ErrorView error={venue.error} onRetry={() => venue.refetch()} />
      ) : (
        <>
          <View style={styles.heading}>
            <TextLink href={back} label={`Back to ${venue.data.venue.name}`} />
            <Text variant="small" testID="venue-edit-what">
              {owner ? 'Edit venue and terms' : 'Venue details'}
            </Text>
            <Heading level={1}>{venue.data.venue.name}</Heading>
          </View>
          <VenueForm
            label={`${owner ? 'Edit venue and terms' : 'Venue details'}: ${venue.data.venue.name}`}
            defaultValues={venueValues(venue.data.venue)}
            binding={owner ? venueUpdateBindings.withTerms : venueUpdateBindings.detailsOnly}
            termsEditable={owner}
            submitLabel="Save changes"
            onSubmit={async (values) => {
              await update.mutateAsync(values);
              router.replace(back);
            }}
          />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
});
