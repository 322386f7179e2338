import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { Thumbnail } from '@/components/ui/thumbnail';
import { workStatusLooks } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useLineAddMutation } from '@/hooks/queries/consignments';
import { useWorksQuery } from '@/hooks/queries/works';
import { formatMoney } from '@/shared/money/format';
import { type Work } from '@/shared/schemas/work';

/** Why a work cannot join this consignment, or null when it can. */
function unavailable(work: Work, consignmentId: number): string | null {
  if (work.consignment?.id === consignmentId) return 'On this consignment already.';
  if (work.consignment) {
    return work.consignment.reserved
      ? `Reserved for ${work.consignment.reference}, not yet sent.`
      : `Out at ${work.venue?.name ?? 'a venue'} on ${work.consignment.reference}.`;
  }
  if (work.status === 'in-studio' || work.status === 'returned') return null;
  return `${workStatusLooks[work.status].word}.`;
}

function Candidate({ work, consignmentId }: { work: Work; consignmentId: number }) {
  const add = useLineAddMutation(consignmentId);
  const why = unavailable(work, consignmentId);
  return (
    <View style={styles.candidate} role="listitem" testID={`pick-${work.id}`}>
      <Thumbnail photos={work.photos} size={56} label={`${work.title}, cover photo`} />
      <View style={styles.what}>
        <Text variant="small" style={styles.tabular}>
          {work.stockNumber}
        </Text>
        <Text variant="bodyStrong">{work.title}</Text>
        <Text variant="number">{formatMoney(work.retailPrice)}</Text>
        {why ? <Text variant="small">{why}</Text> : null}
        {add.isError ? <Text style={styles.problem}>{errorMessage(add.error)}</Text> : null}
      </View>
      {why ? null : (
        <Button
          testID={`pick-${work.id}-add`}
          label="Add"
          accessibilityLabel={`Add ${work.stockNumber} ${work.title}`}
          busyLabel="Adding…"
          busy={add.isPending}
          variant="secondary"
          onPress={() => add.mutate({ workId: work.id })}
        />
      )}
    </View>
  );
}

/** Works to add: searched by stock number or title, those elsewhere saying where they are. */
export function WorkPicker({
  consignmentId,
  onDone,
}: {
  consignmentId: number;
  onDone: () => void;
}) {
  const [search, setSearch] = useState('');
  const works = useWorksQuery({
    search: search.trim() || undefined,
    pageSize: 12,
    sort: 'stockNumber',
  });
  return (
    <View style={styles.picker} role="group" aria-label="Add works">
      <TextField
        testID="pick-search"
        label="Find works"
        hint="Stock number, title, series, clay or glaze."
        value={search}
        onChangeText={setSearch}
        autoCorrect={false}
        inputMode="search"
      />
      {works.isPending ? (
        <LoadingView message="Looking…" />
      ) : works.isError ? (
        <ErrorView error={works.error} onRetry={() => works.refetch()} />
      ) : works.data.items.length === 0 ? (
        <EmptyView title="No works match" message="Try part of a stock number or title." />
      ) : (
        <View role="list" style={styles.list}>
          {works.data.items.map((work) => (
            <Candidate key={work.id} work={work} consignmentId={consignmentId} />
          ))}
          {works.data.total > works.data.items.length ? (
            <Notice
              tone="info"
              message={`Showing ${works.data.items.length} of ${works.data.total}: search to find the rest.`}
            />
          ) : null}
        </View>
      )}
      <View style={styles.start}>
        <Button testID="pick-done" label="Done adding" variant="quiet" onPress={onDone} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  picker: { gap: spacing.md },
  list: { gap: spacing.sm },
  candidate: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingVertical: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  what: { flex: 1, gap: 2 },
  tabular: { fontVariant: ['tabular-nums'] },
  problem: { color: palette.danger },
  start: { alignSelf: 'flex-start' },
});
