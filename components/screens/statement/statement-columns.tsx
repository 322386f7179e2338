import { createColumnHelper } from '@tanstack/react-table';

import { type DataTableFeatures } from '@/components/ui/data-table';
import { formatDate } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { statementStateLooks } from '@/constants/states';
import { formatMoney } from '@/shared/money/format';

import { coversWords, statementHref, type StatementRow } from './statement-card';

const column = createColumnHelper<DataTableFeatures, StatementRow>();

/** The studio's table of statements, on a wide screen. */
export const statementColumns = column.columns([
  column.accessor('reference', {
    header: 'Statement',
    meta: { flex: 1.1 },
    cell: ({ row }) => (
      <TextLink
        href={statementHref('studio', row.original.id)}
        label={row.original.reference}
        testID={`statement-link-${row.original.id}`}
      />
    ),
  }),
  column.accessor((s) => s.venue.name, {
    id: 'covers',
    header: 'Venue and show',
    meta: { flex: 2 },
    cell: ({ row }) => (
      <>
        <Text>{row.original.venue.name}</Text>
        <Text variant="small">{coversWords(row.original)}</Text>
      </>
    ),
  }),
  column.accessor('state', {
    header: 'State',
    meta: { flex: 1.4 },
    cell: ({ row }) => (
      <StateMark
        look={statementStateLooks[row.original.state]}
        testID={`statement-state-${row.original.id}`}
      />
    ),
  }),
  column.accessor('dueDate', {
    header: 'Due',
    meta: { width: 120 },
    cell: ({ getValue }) => {
      const due = getValue();
      return <Text variant="number">{due ? formatDate(due) : '—'}</Text>;
    },
  }),
  column.accessor((s) => s.owed.amount, {
    id: 'owed',
    header: 'To the maker',
    meta: { width: 130, align: 'end' },
    cell: ({ row }) => <Text variant="number">{formatMoney(row.original.owed)}</Text>,
  }),
  column.accessor((s) => s.balance.amount, {
    id: 'balance',
    header: 'Balance',
    meta: { width: 130, align: 'end' },
    cell: ({ row }) => (
      <Text variant="number" testID={`statement-balance-${row.original.id}`}>
        {formatMoney(row.original.balance)}
      </Text>
    ),
  }),
]);
