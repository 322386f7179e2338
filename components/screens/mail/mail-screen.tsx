import { useTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Choice } from '@/components/ui/choice';
import { DataTable, dataTableFeatures } from '@/components/ui/data-table';
import { Pager } from '@/components/ui/pager';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { outboxStateLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { useOutboxQuery } from '@/hooks/queries/outbox';
import { useStudioQuery } from '@/hooks/queries/studio';
import { type OutboxState } from '@/shared/schemas/outbox';

import { MailCard } from './mail-card';
import { mailColumns, type MailRow } from './mail-columns';
import { defaultTimeZone } from './mail-words';

const pageSize = 25;
const noMessages: MailRow[] = [];

type Shown = OutboxState | 'all';
const shownOptions: { value: Shown; label: string }[] = [
  { value: 'all', label: 'All' },
  { value: 'queued', label: outboxStateLooks.queued.word },
  { value: 'sent', label: outboxStateLooks.sent.word },
  { value: 'failed', label: outboxStateLooks.failed.word },
];

export function MailScreen() {
  const [shown, setShown] = useState<Shown>('all');
  const [paging, setPaging] = useState({ shown, page: 1 });
  // A page belongs to one filter: choose another and it is page 1 again.
  const page = paging.shown === shown ? paging.page : 1;
  const outbox = useOutboxQuery({
    state: shown === 'all' ? undefined : shown,
    page,
    pageSize,
  });
  const timeZone = useStudioQuery().data?.timeZone ?? defaultTimeZone;
  const rows = useMemo(
    () => outbox.data?.items.map((m) => ({ ...m, timeZone })) ?? noMessages,
    [outbox.data, timeZone],
  );
  const total = outbox.data?.total ?? 0;
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const table = useTable({
    features: dataTableFeatures,
    columns: mailColumns,
    data: rows,
    getRowId: (message) => String(message.id),
    enableSorting: false,
    manualPagination: true,
    rowCount: total,
    state: { pagination: { pageIndex: page - 1, pageSize } },
  });

  return (
    <Screen testID="mail-screen">
      <View style={styles.title}>
        <Heading level={1}>Sent mail</Heading>
        <Text variant="small">
          Every e-mail Saggar sends for the studio, and whether it went. One that could not be sent
          is tried again for a few hours, then waits for you.
        </Text>
      </View>
      <Choice
        label="Show"
        options={shownOptions}
        value={shown}
        onChange={setShown}
        testID="mail-shown"
      />
      {outbox.isPending ? (
        <LoadingView message="Fetching the studio’s mail…" />
      ) : outbox.isError ? (
        <ErrorView error={outbox.error} onRetry={() => outbox.refetch()} />
      ) : outbox.data.items.length === 0 ? (
        shown === 'all' ? (
          <EmptyView
            title="No e-mail yet"
            message="When work is sent to a venue, its staff are invited or a piece sells, the e-mail Saggar sends is listed here, with whether it went."
          />
        ) : (
          <EmptyView
            title="None here"
            message="No message is in that state. Choose All to see every message."
          />
        )
      ) : (
        <>
          <DataTable
            table={table}
            label="Sent mail"
            testID="mail"
            rowTestID={(row) => `mail-row-${row.original.id}`}
            renderCard={(row) => <MailCard message={row.original} />}
          />
          <Pager
            page={page}
            pageCount={pageCount}
            total={total}
            noun={['message', 'messages']}
            onPage={(next) => setPaging({ shown, page: next })}
            testID="mail-pager"
          />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { gap: spacing.xxs },
});
