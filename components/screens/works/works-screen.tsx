import { type SortingState, type Updater, useTable } from '@tanstack/react-table';
import { Link, useRouter } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { DataTable, dataTableFeatures } from '@/components/ui/data-table';
import { DownloadLink } from '@/components/ui/download-link';
import { FilterBar, FilterSlot } from '@/components/ui/filter-bar';
import { Pager } from '@/components/ui/pager';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { spacing } from '@/constants/theme';
import { useWorkFacetsQuery, useWorksQuery, worksExportPath } from '@/hooks/queries/works';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import {
  type Work,
  type WorkListQuery,
  type WorkSort,
  workSortSchema,
  workStatusSchema,
} from '@/shared/schemas/work';

import { WorkCard } from './work-card';
import { workColumns } from './work-columns';
import {
  activeFilterCount,
  noWorkFilters,
  type WorkFilterValues,
  WorksFilters,
} from './works-filters';

const pageSize = 25;
const noWorks: Work[] = [];
/** The server's sort name as react-table's sorting state, and back. */
function toSorting(sort: WorkSort): SortingState {
  const desc = sort.startsWith('-');
  return [{ id: desc ? sort.slice(1) : sort, desc }];
}
function fromSorting(sorting: SortingState): WorkSort {
  const first = sorting[0];
  if (!first) return 'stockNumber';
  const parsed = workSortSchema.safeParse(`${first.desc ? '-' : ''}${first.id}`);
  return parsed.success ? parsed.data : 'stockNumber';
}

/** Waits until typing pauses before asking the server again. */
function useDebounced(value: string, ms = 300): string {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

/**
 * Every work, searched, filtered and paged by the server. The status filter lives in the address
 * (`?status=sold`), so a count elsewhere can open the list narrowed to it.
 */
export function WorksScreen({ statusParam }: { statusParam?: string }) {
  const { wide } = useBreakpoint();
  const router = useRouter();
  const [searchText, setSearchText] = useState('');
  const search = useDebounced(searchText.trim());
  const [chosen, setChosen] = useState<Omit<WorkFilterValues, 'status'>>({
    ...noWorkFilters,
    sort: 'stockNumber',
  });
  const values: WorkFilterValues = {
    ...chosen,
    status: workStatusSchema.safeParse(statusParam).data ?? '',
  };
  const change = ({ status, ...rest }: Partial<WorkFilterValues>) => {
    if (status !== undefined) router.setParams({ status: status || undefined });
    setChosen((before) => ({ ...before, ...rest }));
  };
  const activeCount = activeFilterCount(values);
  const [showFilters, setShowFilters] = useState(false);
  const { status, series, category, venueId, archived, sort } = values;
  // A page belongs to one search, filter and sort: change any of them and it is page 1 again.
  const filterKey = JSON.stringify([search, values]);
  const [paging, setPaging] = useState({ key: filterKey, page: 1 });
  const page = paging.key === filterKey ? paging.page : 1;
  const setPage = (next: number) => setPaging({ key: filterKey, page: next });

  const filters: WorkListQuery = {
    search: search || undefined,
    status: status || undefined,
    series: series || undefined,
    category: category || undefined,
    venueId: venueId ? Number(venueId) : undefined,
    archived,
    sort,
    page,
    pageSize,
  };
  const filtered = Boolean(search) || activeCount > 0;

  const works = useWorksQuery(filters);
  // Archiving the last work of the last page leaves that page empty: step back to the last one.
  const pageCount = Math.max(1, Math.ceil((works.data?.total ?? 0) / pageSize));
  // Adjusting state while rendering, as React advises for state that follows other state.
  if (works.data && page > pageCount) setPaging({ key: filterKey, page: pageCount });
  const facets = useWorkFacetsQuery();

  const sorting = toSorting(sort);
  const table = useTable({
    features: dataTableFeatures,
    columns: workColumns,
    data: works.data?.items ?? noWorks,
    getRowId: (work) => String(work.id),
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    // Every column starts ascending, as its header arrow shows; a second press reverses it.
    sortDescFirst: false,
    rowCount: works.data?.total ?? 0,
    state: { sorting, pagination: { pageIndex: page - 1, pageSize } },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      change({ sort: fromSorting(next) });
    },
  });

  const fileActions = (
    <>
      <Link href="/works/import" asChild>
        <Button testID="works-import" label="Import CSV" variant="secondary" />
      </Link>
      <DownloadLink
        href={worksExportPath(filters)}
        fileName="saggar-works.csv"
        label={filtered ? 'Export these as CSV' : 'Export CSV'}
        testID="works-export"
      />
    </>
  );

  return (
    <Screen testID="works-screen">
      <View style={[styles.header, !wide && styles.headerNarrow]}>
        <View style={[styles.title, !wide && styles.titleNarrow]}>
          <Heading level={1}>Works</Heading>
          <Text variant="small">Every piece on record, with where it is now.</Text>
        </View>
        <View style={styles.actions}>
          <Link href="/works/new" asChild>
            <Button testID="works-new" label="New work" />
          </Link>
          {wide ? fileActions : null}
        </View>
      </View>

      <FilterBar testID="works-filters">
        <FilterSlot grow={2} basis={260}>
          <TextField
            testID="works-search"
            label="Search"
            placeholder="Title, stock number, glaze…"
            value={searchText}
            onChangeText={setSearchText}
            autoCorrect={false}
            inputMode="search"
          />
        </FilterSlot>
        {wide ? null : (
          // On a phone the works come first: the filters fold behind one button that counts them.
          <View style={styles.fold}>
            <Button
              testID="works-filters-toggle"
              label={activeCount > 0 ? `Filters (${activeCount})` : 'Filters'}
              variant="secondary"
              aria-expanded={showFilters}
              onPress={() => setShowFilters((shown) => !shown)}
            />
            {activeCount > 0 ? (
              <Button
                testID="works-filters-clear"
                label="Clear filters"
                variant="quiet"
                onPress={() => change(noWorkFilters)}
              />
            ) : null}
          </View>
        )}
        {wide || showFilters ? (
          <WorksFilters values={values} onChange={change} facets={facets.data} withSort={!wide} />
        ) : null}
      </FilterBar>

      {works.isPending ? (
        <LoadingView message="Fetching the catalogue…" />
      ) : works.isError ? (
        <ErrorView error={works.error} onRetry={() => works.refetch()} />
      ) : works.data.total === 0 ? (
        filtered ? (
          <EmptyView
            title="Nothing matches"
            message="No work matches this search and these filters. Clear a filter or try other words."
          />
        ) : (
          <EmptyView
            title="No works yet"
            message="Add the first piece with New work, or bring in a spreadsheet with Import CSV."
          />
        )
      ) : (
        <View style={styles.list}>
          <DataTable
            table={table}
            label="Works"
            testID="works"
            rowTestID={(row) => `work-row-${row.original.id}`}
            renderCard={(row) => <WorkCard work={row.original} />}
            minWidth={760}
          />
          <Pager
            testID="works-pager"
            page={page}
            pageCount={table.getPageCount()}
            total={works.data.total}
            noun={['work', 'works']}
            onPage={setPage}
          />
        </View>
      )}
      {/* On a phone the rarer file actions wait under the list, so the works come first. */}
      {wide ? null : <View style={styles.actions}>{fileActions}</View>}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.md },
  headerNarrow: { flexDirection: 'row', alignItems: 'flex-start' },
  title: { gap: spacing.xxs },
  titleNarrow: { flex: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  list: { gap: spacing.lg },
  fold: { flexBasis: '100%', flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
