import { useTable } from '@tanstack/react-table';
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { DataTable, dataTableFeatures } from '@/components/ui/data-table';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useVenuesQuery } from '@/hooks/queries/venues';
import { type Venue } from '@/shared/schemas/venue';

import { VenueCard } from './venue-card';
import { venueColumns } from './venue-columns';

const noVenues: Venue[] = [];

export function VenuesScreen() {
  const venues = useVenuesQuery();
  const table = useTable({
    features: dataTableFeatures,
    columns: venueColumns,
    data: venues.data?.items ?? noVenues,
    getRowId: (venue) => String(venue.id),
    enableSorting: false,
    manualPagination: true,
  });
  return (
    <Screen testID="venues-screen">
      <View style={styles.header}>
        <View style={styles.title}>
          <Heading level={1}>Venues</Heading>
          <Text variant="small">
            Galleries, shops, fairs and shows, with the terms agreed with each.
          </Text>
        </View>
        <View style={styles.actions}>
          <Link href="/venues/new" asChild>
            <Button testID="venues-new" label="New venue" />
          </Link>
        </View>
      </View>
      {venues.isPending ? (
        <LoadingView message="Fetching the venues…" />
      ) : venues.isError ? (
        <ErrorView error={venues.error} onRetry={() => venues.refetch()} />
      ) : venues.data.items.length === 0 ? (
        <EmptyView
          title="No venues yet"
          message="Add the galleries, shops and fairs you send work to, with the terms you agreed."
        />
      ) : (
        <DataTable
          table={table}
          label="Venues"
          testID="venues"
          rowTestID={(row) => `venue-row-${row.original.id}`}
          renderCard={(row) => <VenueCard venue={row.original} />}
        />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.md },
  title: { gap: spacing.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
