import { createColumnHelper } from '@tanstack/react-table';

import { type DataTableFeatures } from '@/components/ui/data-table';
import { formatDateTime } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { type OutboxSummary } from '@/shared/schemas/outbox';

import { mailKindWords, outboxLook, whenWords } from './mail-words';

/** A row of the table, with the studio's time zone for its times. */
export type MailRow = OutboxSummary & { timeZone: string };

const column = createColumnHelper<DataTableFeatures, MailRow>();

export const mailColumns = column.columns([
  column.accessor('state', {
    header: 'State',
    meta: { width: 150 },
    cell: ({ row }) => (
      <StateMark look={outboxLook(row.original)} testID={`mail-state-${row.original.id}`} />
    ),
  }),
  column.accessor('subject', {
    header: 'Subject',
    meta: { flex: 2.2 },
    cell: ({ row }) => (
      <>
        <TextLink
          href={{ pathname: '/mail/[id]', params: { id: String(row.original.id) } }}
          label={row.original.subject}
          testID={`mail-link-${row.original.id}`}
        />
        <Text variant="small">{mailKindWords[row.original.kind]}</Text>
      </>
    ),
  }),
  column.accessor('to', {
    header: 'To',
    meta: { flex: 1.4 },
    cell: ({ getValue }) => <Text>{getValue()}</Text>,
  }),
  column.accessor('createdAt', {
    header: 'When',
    meta: { width: 210 },
    cell: ({ row }) => (
      <>
        <Text variant="number">
          {formatDateTime(row.original.createdAt, row.original.timeZone)}
        </Text>
        {row.original.state === 'queued' && row.original.attempts === 0 ? null : (
          <Text variant="small">{whenWords(row.original, row.original.timeZone)}</Text>
        )}
      </>
    ),
  }),
  column.accessor((message) => message.attachments.length, {
    id: 'attachments',
    header: 'Files',
    meta: { width: 80, align: 'end' },
    cell: ({ getValue }) => <Text variant="number">{getValue() === 0 ? '—' : getValue()}</Text>,
  }),
]);
