import { StyleSheet, View } from 'react-native';

import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useStatementsQuery } from '@/hooks/queries/statements';

import { StatementCard } from '../statement/statement-card';

/** The statements makers have issued to the venue: what it owes, and a way to pay. */
export function VenueStatementsScreen() {
  const query = useStatementsQuery();
  return (
    <Screen testID="venue-statements-screen">
      <View style={styles.title}>
        <Heading level={1}>Statements</Heading>
        <Text variant="small">
          What you owe the maker for the work you sold, and what is left to pay.
        </Text>
      </View>
      {query.isPending ? (
        <LoadingView message="Fetching your statements…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : query.data.items.length === 0 ? (
        <EmptyView
          title="No statements yet"
          message="When the maker issues a statement for your sales, it is listed here with a way to pay."
        />
      ) : (
        <View role="list" aria-label="Statements" style={styles.list}>
          {query.data.items.map((s) => (
            <View role="listitem" key={s.id}>
              <StatementCard statement={s} side="venue" />
            </View>
          ))}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { gap: spacing.xxs },
  list: { gap: spacing.md },
});
