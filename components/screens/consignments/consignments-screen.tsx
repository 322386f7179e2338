import { type SortingState, type Updater, useTable } from '@tanstack/react-table';
import { Link } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { ConsignmentCard } from '@/components/ui/consignment-card';
import { DataTable, dataTableFeatures } from '@/components/ui/data-table';
import { FilterBar, FilterSlot } from '@/components/ui/filter-bar';
import { Screen } from '@/components/ui/screen';
import { Select } from '@/components/ui/select';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { consignmentStateLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { useConsignmentsQuery } from '@/hooks/queries/consignments';
import { useVenuesQuery } from '@/hooks/queries/venues';
import {
  type ConsignmentListItem,
  type ConsignmentState,
  consignmentStates,
} from '@/shared/schemas/consignment';

import { consignmentColumns, sortValues } from './consignment-columns';

const noItems: ConsignmentListItem[] = [];

/** The rows in the order the table's sort asks for. */
function sortRows(items: readonly ConsignmentListItem[], sorting: SortingState) {
  const [sort] = sorting;
  const value = sort ? sortValues[sort.id] : undefined;
  if (!sort || !value) return [...items];
  const direction = sort.desc ? -1 : 1;
  return [...items].sort((a, b) => {
    const x = value(a);
    const y = value(b);
    if (x === y) return b.id - a.id;
    return (x < y ? -1 : 1) * direction;
  });
}

export function ConsignmentsScreen() {
  const [state, setState] = useState<ConsignmentState | ''>('');
  const [venueId, setVenueId] = useState('');
  const [sorting, setSorting] = useState<SortingState>([]);
  const consignments = useConsignmentsQuery({
    state: state || undefined,
    venueId: venueId ? Number(venueId) : undefined,
  });
  const venues = useVenuesQuery();
  const rows: ConsignmentListItem[] = useMemo(
    () => sortRows(consignments.data?.items ?? noItems, sorting),
    [consignments.data, sorting],
  );
  const table = useTable({
    features: dataTableFeatures,
    columns: consignmentColumns,
    data: rows,
    getRowId: (c) => String(c.id),
    state: { sorting },
    onSortingChange: (updater: Updater<SortingState>) =>
      setSorting((current) => (typeof updater === 'function' ? updater(current) : updater)),
    manualSorting: true,
    manualPagination: true,
  });
  const filtered = state !== '' || venueId !== '';

  return (
    <Screen testID="consignments-screen">
      <View style={styles.header}>
        <View style={styles.title}>
          <Heading level={1}>Consignments</Heading>
          <Text variant="small">
            Every batch sent to a venue, from the first piece chosen to the last penny paid.
          </Text>
        </View>
        <View style={styles.actions}>
          <Link href="/consignments/new" asChild>
            <Button testID="consignments-new" label="New consignment" />
          </Link>
        </View>
      </View>
      <FilterBar>
        <FilterSlot>
          <Select
            testID="consignments-state"
            label="State"
            emptyLabel="Any state"
            options={consignmentStates.map((s) => ({
              value: s,
              label: consignmentStateLooks[s].word,
            }))}
            value={state}
            onChange={(value) => setState(value as ConsignmentState | '')}
          />
        </FilterSlot>
        <FilterSlot>
          <Select
            testID="consignments-venue"
            label="Venue"
            emptyLabel="Any venue"
            options={(venues.data?.items ?? []).map((v) => ({
              value: String(v.id),
              label: v.name,
            }))}
            value={venueId}
            onChange={setVenueId}
          />
        </FilterSlot>
      </FilterBar>
      {consignments.isPending ? (
        <LoadingView message="Fetching the consignments…" />
      ) : consignments.isError ? (
        <ErrorView error={consignments.error} onRetry={() => consignments.refetch()} />
      ) : consignments.data.items.length === 0 ? (
        <EmptyView
          title={filtered ? 'Nothing matches' : 'Nothing sent out yet'}
          message={
            filtered
              ? 'No consignment is in that state at that venue. Change the filters to see more.'
              : 'Start a consignment for a venue, choose the pieces, check them, and send them.'
          }
        />
      ) : (
        <DataTable
          table={table}
          label="Consignments"
          testID="consignments"
          rowTestID={(row) => `consignment-row-${row.original.id}`}
          minWidth={960}
          renderCard={(row) => (
            <ConsignmentCard
              consignment={row.original}
              href={{ pathname: '/consignments/[id]', params: { id: String(row.original.id) } }}
            />
          )}
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
