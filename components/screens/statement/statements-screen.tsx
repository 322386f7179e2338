import { useTable } from '@tanstack/react-table';
import { StyleSheet, View } from 'react-native';

import { DataTable, dataTableFeatures } from '@/components/ui/data-table';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { useStatementsQuery } from '@/hooks/queries/statements';
import { useActiveRole } from '@/hooks/session';

import { StatementCard, type StatementRow } from './statement-card';
import { statementColumns } from './statement-columns';

const none: StatementRow[] = [];

/** The studio's statements, newest first, with their state and balance. */
export function StatementsScreen() {
  const query = useStatementsQuery();
  const table = useTable({
    features: dataTableFeatures,
    columns: statementColumns,
    data: query.data?.items ?? none,
    getRowId: (s) => String(s.id),
    enableSorting: false,
  });
  return (
    <Screen testID="statements-screen">
      <View style={styles.title}>
        <Heading level={1}>Statements</Heading>
        <Text variant="small">
          What each venue owes for its sales, what it has paid, and what is left. A statement is
          made from a consignment’s page, once the show is closed or while it runs.
        </Text>
        {useActiveRole() === 'owner' ? (
          <View style={styles.bank}>
            <TextLink
              href="/bank-statement"
              label="Record payments from a bank statement"
              testID="statements-bank"
            />
          </View>
        ) : null}
      </View>
      {query.isPending ? (
        <LoadingView message="Fetching the statements…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : query.data.items.length === 0 ? (
        <EmptyView
          title="No statements yet"
          message="Close a show on its consignment’s page and make its statement there: it is listed here from then on."
        />
      ) : (
        <DataTable
          table={table}
          label="Statements"
          testID="statements"
          rowTestID={(row) => `statement-row-${row.original.id}`}
          renderCard={(row) => <StatementCard statement={row.original} side="studio" />}
          minWidth={760}
        />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { gap: spacing.xxs },
  bank: { alignSelf: 'flex-start', paddingTop: spacing.xs },
});
