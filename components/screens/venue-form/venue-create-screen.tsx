import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { useStudioQuery } from '@/hooks/queries/studio';
import { useVenueCreateMutation } from '@/hooks/queries/venues';
import { useActiveRole } from '@/hooks/session';

import { VenueForm } from './venue-form';
import { newVenueValues, venueCreateBindings } from './venue-form-values';

export function VenueCreateScreen() {
  const owner = useActiveRole() === 'owner';
  const router = useRouter();
  const studio = useStudioQuery();
  const create = useVenueCreateMutation();
  return (
    <Screen testID="venue-create-screen">
      <View style={styles.heading}>
        <TextLink href="/venues" label="All venues" />
        <Heading level={1}>New venue</Heading>
        <Text variant="small">
          {owner
            ? 'The terms start from the usual ones for UK craft retail; set them as agreed.'
            : 'Enter the venue’s details; the studio’s owner sets its terms.'}
        </Text>
      </View>
      {studio.isPending ? (
        <LoadingView message="Fetching the studio’s currency…" />
      ) : studio.isError ? (
        <ErrorView error={studio.error} onRetry={() => studio.refetch()} />
      ) : (
        <VenueForm
          label="New venue"
          defaultValues={newVenueValues(studio.data.currency)}
          binding={owner ? venueCreateBindings.withTerms : venueCreateBindings.detailsOnly}
          termsEditable={owner}
          submitLabel="Save venue"
          onSubmit={async (values) => {
            const venue = await create.mutateAsync(values);
            router.replace({ pathname: '/venues/[id]', params: { id: String(venue.id) } });
          }}
        />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
});
