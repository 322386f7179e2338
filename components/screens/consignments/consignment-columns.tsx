import { createColumnHelper } from '@tanstack/react-table';

import { type DataTableFeatures } from '@/components/ui/data-table';
import { formatDate } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { consignmentStateLooks } from '@/constants/states';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentListItem, consignmentStates } from '@/shared/schemas/consignment';

const column = createColumnHelper<DataTableFeatures, ConsignmentListItem>();

const dates = (c: ConsignmentListItem) =>
  [c.openingDate, c.closingDate].map((d) => (d ? formatDate(d) : '…')).join(' – ');

/** What each column sorts by: the table sorts in memory, as a studio has dozens of these. */
export const sortValues: Record<string, (c: ConsignmentListItem) => string | number> = {
  reference: (c) => c.reference,
  title: (c) => c.title.toLowerCase(),
  venueName: (c) => c.venueName.toLowerCase(),
  dates: (c) => c.openingDate ?? c.dispatchDate ?? '',
  state: (c) => consignmentStates.indexOf(c.state),
  lineCount: (c) => c.lineCount,
  linesSold: (c) => c.linesSold,
  insuredOut: (c) => c.insuredOut?.amount ?? 0,
};

export const consignmentColumns = column.columns([
  column.accessor('reference', {
    header: 'Reference',
    meta: { width: 130 },
    cell: ({ row }) => (
      <TextLink
        href={{ pathname: '/consignments/[id]', params: { id: String(row.original.id) } }}
        label={row.original.reference}
        testID={`consignment-link-${row.original.id}`}
      />
    ),
  }),
  column.accessor('title', {
    header: 'Title',
    meta: { flex: 2 },
    cell: ({ getValue }) => <Text>{getValue()}</Text>,
  }),
  column.accessor('venueName', {
    header: 'Venue',
    meta: { flex: 1.4 },
    cell: ({ getValue }) => <Text>{getValue()}</Text>,
  }),
  column.accessor(sortValues.dates!, {
    id: 'dates',
    header: 'Open – close',
    meta: { width: 190 },
    cell: ({ row }) => <Text variant="small">{dates(row.original)}</Text>,
  }),
  column.accessor(sortValues.state!, {
    id: 'state',
    header: 'State',
    meta: { width: 170 },
    cell: ({ row }) => <StateMark look={consignmentStateLooks[row.original.state]} />,
  }),
  column.accessor('lineCount', {
    header: 'Pieces',
    meta: { width: 80, align: 'end' },
    cell: ({ getValue }) => <Text variant="number">{getValue()}</Text>,
  }),
  column.accessor('linesSold', {
    header: 'Sold',
    meta: { width: 70, align: 'end' },
    cell: ({ getValue }) => <Text variant="number">{getValue()}</Text>,
  }),
  column.accessor(sortValues.insuredOut!, {
    id: 'insuredOut',
    header: 'Insured out',
    meta: { width: 130, align: 'end' },
    cell: ({ row }) => (
      <Text variant="number">
        {row.original.insuredOut ? formatMoney(row.original.insuredOut) : '—'}
      </Text>
    ),
  }),
]);
