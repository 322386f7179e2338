import { StyleSheet, View } from 'react-native';

import { ConsignmentCard } from '@/components/ui/consignment-card';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useVenueHomeQuery } from '@/hooks/queries/venue-home';

export function VenueHomeScreen() {
  const query = useVenueHomeQuery();
  return (
    <Screen testID="venue-home-screen">
      {query.isPending ? (
        <LoadingView message="Finding this studio's consignments…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <>
          <View style={styles.heading}>
            <Heading level={1}>{query.data.places[0]?.venue.name ?? 'Your venue'}</Heading>
            <Text variant="small">
              Work on consignment from {query.data.places.map((p) => p.studio.name).join(', ')}
            </Text>
          </View>
          <View style={styles.list}>
            <Heading level={2}>Consignments</Heading>
            {query.data.consignments.length === 0 ? (
              <EmptyView
                title="No consignments yet"
                message="When a maker sends work to your venue, it is listed here."
              />
            ) : (
              query.data.consignments.map((consignment) => (
                <ConsignmentCard
                  key={consignment.id}
                  consignment={consignment}
                  showVenue={false}
                  href={{
                    pathname: '/venue/consignments/[id]',
                    params: { id: String(consignment.id) },
                  }}
                />
              ))
            )}
          </View>
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  list: { gap: spacing.md },
});
