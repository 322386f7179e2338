import { FilterSlot } from '@/components/ui/filter-bar';
import { Select } from '@/components/ui/select';
import { workStatusLooks } from '@/constants/states';
import {
  type WorkFacets,
  type WorkSort,
  workSortSchema,
  type WorkStatus,
  workStatuses,
  workStatusSchema,
} from '@/shared/schemas/work';

/** What the list is narrowed to and ordered by, besides the search. */
export type WorkFilterValues = {
  status: WorkStatus | '';
  series: string;
  category: string;
  venueId: string;
  archived: 'exclude' | 'include' | 'only';
  sort: WorkSort;
};

export const noWorkFilters: Omit<WorkFilterValues, 'sort'> = {
  status: '',
  series: '',
  category: '',
  venueId: '',
  archived: 'exclude',
};

/** How many filters narrow the list (the order is not one). */
export function activeFilterCount(values: WorkFilterValues): number {
  return (Object.keys(noWorkFilters) as (keyof typeof noWorkFilters)[]).filter(
    (key) => values[key] !== noWorkFilters[key],
  ).length;
}

const statusOptions = workStatuses.map((s) => ({ value: s, label: workStatusLooks[s].word }));
const sortOptions: { value: WorkSort; label: string }[] = [
  { value: 'stockNumber', label: 'Stock number' },
  { value: '-stockNumber', label: 'Stock number, newest first' },
  { value: 'title', label: 'Title, A to Z' },
  { value: '-title', label: 'Title, Z to A' },
  { value: '-year', label: 'Year, newest first' },
  { value: 'year', label: 'Year, oldest first' },
  { value: 'price', label: 'Price, lowest first' },
  { value: '-price', label: 'Price, highest first' },
  { value: 'status', label: 'Status' },
];
const archivedOptions = [
  { value: 'include', label: 'Current and archived' },
  { value: 'only', label: 'Archived only' },
];

type WorksFiltersProps = {
  values: WorkFilterValues;
  onChange: (change: Partial<WorkFilterValues>) => void;
  facets: WorkFacets | undefined;
  /** On a phone, where no table heading sorts the cards. */
  withSort: boolean;
};

/** The works list's filters, each in a slot of the filter bar. */
export function WorksFilters({ values, onChange, facets, withSort }: WorksFiltersProps) {
  return (
    <>
      <FilterSlot>
        <Select
          testID="works-filter-status"
          label="Status"
          emptyLabel="Any status"
          options={statusOptions}
          value={values.status}
          onChange={(v) => onChange({ status: workStatusSchema.safeParse(v).data ?? '' })}
        />
      </FilterSlot>
      <FilterSlot>
        <Select
          testID="works-filter-series"
          label="Series"
          emptyLabel="Any series"
          options={(facets?.series ?? []).map((s) => ({ value: s, label: s }))}
          value={values.series}
          onChange={(series) => onChange({ series })}
        />
      </FilterSlot>
      <FilterSlot>
        <Select
          testID="works-filter-category"
          label="Category"
          emptyLabel="Any category"
          options={(facets?.categories ?? []).map((c) => ({ value: c, label: c }))}
          value={values.category}
          onChange={(category) => onChange({ category })}
        />
      </FilterSlot>
      <FilterSlot>
        <Select
          testID="works-filter-venue"
          label="At venue"
          emptyLabel="Anywhere"
          options={(facets?.venues ?? []).map((v) => ({ value: String(v.id), label: v.name }))}
          value={values.venueId}
          onChange={(venueId) => onChange({ venueId })}
        />
      </FilterSlot>
      <FilterSlot>
        <Select
          testID="works-filter-archived"
          label="Archived"
          emptyLabel="Current only"
          options={archivedOptions}
          value={values.archived === 'exclude' ? '' : values.archived}
          onChange={(v) => onChange({ archived: v === 'include' || v === 'only' ? v : 'exclude' })}
        />
      </FilterSlot>
      {withSort ? (
        <FilterSlot>
          <Select
            testID="works-sort"
            label="Sort by"
            options={sortOptions}
            value={values.sort}
            onChange={(v) => onChange({ sort: workSortSchema.safeParse(v).data ?? 'stockNumber' })}
          />
        </FilterSlot>
      ) : null}
    </>
  );
}
