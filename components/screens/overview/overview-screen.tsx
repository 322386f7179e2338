import { StyleSheet, View } from 'react-native';

import { ConsignmentCard } from '@/components/ui/consignment-card';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useOverviewQuery } from '@/hooks/queries/overview';
import { type Overview } from '@/shared/schemas/overview';

import { Exposure } from './exposure';
import { Figure } from './figure';
import { RecentSales } from './recent-sales';
import { StatusList } from './status-list';

function OverviewBody({ overview }: { overview: Overview }) {
  const { works, venues, consignments, exposure, recentSales } = overview;
  if (works.total === 0 && venues.total === 0 && consignments.outCount === 0) {
    return (
      <EmptyView
        title="Nothing catalogued yet"
        message="Once works and venues are added, this page shows what is out where and how it is selling."
      />
    );
  }
  return (
    <>
      <View style={styles.figures}>
        <Figure label="Works" value={works.total} note="catalogued" testID="overview-works-total" />
        <Figure label="Venues" value={venues.total} note="on file" testID="overview-venues-total" />
        <Figure
          label="Consignments out"
          value={consignments.outCount}
          note="sent and not yet settled"
          testID="overview-consignments-out"
        />
      </View>
      <View style={styles.section}>
        <Heading level={2}>At risk</Heading>
        <Exposure exposure={exposure} />
      </View>
      <View style={styles.section}>
        <Heading level={2}>Recent sales</Heading>
        <RecentSales sales={recentSales} />
      </View>
      <View style={styles.section}>
        <Heading level={2}>Where the work is</Heading>
        <StatusList byStatus={works.byStatus} />
      </View>
      <View style={styles.section}>
        <Heading level={2}>Out at venues</Heading>
        {consignments.out.length === 0 ? (
          <Text variant="small">Nothing is out at the moment.</Text>
        ) : (
          consignments.out.map((consignment) => (
            <ConsignmentCard
              key={consignment.id}
              consignment={consignment}
              href={{ pathname: '/consignments/[id]', params: { id: String(consignment.id) } }}
            />
          ))
        )}
      </View>
    </>
  );
}

export function OverviewScreen() {
  const query = useOverviewQuery();
  return (
    <Screen testID="overview-screen">
      <View style={styles.heading}>
        <Heading level={1}>Overview</Heading>
        {query.data ? <Text variant="small">{query.data.studio.name}</Text> : null}
      </View>
      {query.isPending ? (
        <LoadingView message="Gathering the studio's figures…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <OverviewBody overview={query.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  section: { gap: spacing.md },
});
