import { createColumnHelper } from '@tanstack/react-table';

import { type DataTableFeatures } from '@/components/ui/data-table';
import { percentText } from '@/components/ui/decimal-text';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { type Venue } from '@/shared/schemas/venue';

import { commissionVatText, venueKindWords, venueRoleWords } from '../venue-form/venue-words';

const column = createColumnHelper<DataTableFeatures, Venue>();

export const venueColumns = column.columns([
  column.accessor('name', {
    header: 'Name',
    meta: { flex: 2 },
    cell: ({ row }) => (
      <TextLink
        href={{ pathname: '/venues/[id]', params: { id: String(row.original.id) } }}
        label={row.original.name}
        testID={`venue-link-${row.original.id}`}
      />
    ),
  }),
  column.accessor('kind', {
    header: 'Kind',
    meta: { width: 120 },
    cell: ({ getValue }) => <Text>{venueKindWords[getValue()]}</Text>,
  }),
  column.accessor('town', {
    header: 'Town',
    meta: { flex: 1 },
    cell: ({ getValue }) => <Text>{getValue() ?? '—'}</Text>,
  }),
  column.accessor('contactName', {
    header: 'Contact',
    meta: { flex: 1.2 },
    cell: ({ row }) => (
      <>
        <Text>{row.original.contactName ?? '—'}</Text>
        {row.original.email ? <Text variant="small">{row.original.email}</Text> : null}
      </>
    ),
  }),
  column.accessor((venue) => venue.defaultTerms.commissionRateBp, {
    id: 'commission',
    header: 'Commission',
    meta: { width: 120, align: 'end' },
    cell: ({ getValue }) => <Text variant="number">{`${percentText(getValue())}%`}</Text>,
  }),
  column.accessor((venue) => venue.defaultTerms.venueRole, {
    id: 'role',
    header: 'Terms',
    meta: { width: 220 },
    cell: ({ row, getValue }) => (
      <>
        <Text variant="small">{venueRoleWords[getValue()]}</Text>
        <Text variant="small" testID={`venue-row-${row.original.id}-vat`}>
          {commissionVatText(row.original.defaultTerms)}
        </Text>
      </>
    ),
  }),
]);
