import { createColumnHelper } from '@tanstack/react-table';

import { type DataTableFeatures } from '@/components/ui/data-table';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { Thumbnail } from '@/components/ui/thumbnail';
import { workStatusLooks } from '@/constants/states';
import { formatMoney } from '@/shared/money/format';
import { type Work, type WorkSort } from '@/shared/schemas/work';

const column = createColumnHelper<DataTableFeatures, Work>();

/** Column ids the server can sort by, mapped to its sort names. */
export const sortableColumns = {
  stockNumber: 'stockNumber',
  title: 'title',
  year: 'year',
  price: 'price',
  status: 'status',
} as const satisfies Record<string, WorkSort>;

export const workColumns = column.columns([
  column.display({
    id: 'photo',
    header: 'Photo',
    enableSorting: false,
    meta: { width: 64 },
    cell: ({ row }) => (
      <Thumbnail
        photos={row.original.photos}
        size={48}
        label={`${row.original.title}, cover photo`}
      />
    ),
  }),
  column.accessor('stockNumber', {
    header: 'Stock no.',
    meta: { width: 110 },
    cell: ({ getValue }) => <Text variant="number">{getValue()}</Text>,
  }),
  column.accessor('title', {
    header: 'Title',
    meta: { flex: 2.4 },
    cell: ({ row }) => (
      <TextLink
        href={{ pathname: '/works/[id]', params: { id: String(row.original.id) } }}
        label={row.original.title}
        testID={`work-link-${row.original.id}`}
      />
    ),
  }),
  column.accessor('year', {
    header: 'Year',
    meta: { width: 80, align: 'end' },
    cell: ({ getValue }) => <Text variant="number">{getValue() ?? '—'}</Text>,
  }),
  column.accessor('series', {
    header: 'Series',
    enableSorting: false,
    meta: { flex: 1.2 },
    cell: ({ getValue }) => <Text variant="small">{getValue() ?? '—'}</Text>,
  }),
  column.accessor((work) => work.retailPrice, {
    id: 'price',
    header: 'Price',
    meta: { width: 110, align: 'end' },
    cell: ({ getValue }) => <Text variant="number">{formatMoney(getValue())}</Text>,
  }),
  column.accessor('status', {
    header: 'Status',
    meta: { width: 168 },
    cell: ({ row }) => (
      <>
        <StateMark look={workStatusLooks[row.original.status]} />
        {row.original.venue ? <Text variant="small">{row.original.venue.name}</Text> : null}
        {row.original.archivedAt ? <Text variant="small">Archived</Text> : null}
      </>
    ),
  }),
]);
