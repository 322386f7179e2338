import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useWorkArchiveMutation, useWorkDeleteMutation } from '@/hooks/queries/works';
import { type Work } from '@/shared/schemas/work';

/** Edit, archive or restore, and delete — which the server refuses, with its reason, once consigned. */
export function WorkActions({ work }: { work: Work }) {
  const router = useRouter();
  const archive = useWorkArchiveMutation(work.id);
  const remove = useWorkDeleteMutation(work.id);
  const [confirming, setConfirming] = useState(false);
  const archived = work.archivedAt !== null;

  return (
    <View style={styles.actions}>
      <View style={styles.row}>
        <Link href={{ pathname: '/works/[id]/edit', params: { id: String(work.id) } }} asChild>
          <Button testID="work-edit" label="Edit" />
        </Link>
        <Button
          testID={archived ? 'work-restore' : 'work-archive'}
          label={archived ? 'Restore' : 'Archive'}
          busyLabel={archived ? 'Restoring…' : 'Archiving…'}
          busy={archive.isPending}
          variant="secondary"
          onPress={() => archive.mutate(archived ? 'restore' : 'archive')}
        />
        {confirming ? null : (
          <Button
            testID="work-delete"
            label="Delete"
            variant="quiet"
            onPress={() => {
              remove.reset();
              setConfirming(true);
            }}
          />
        )}
      </View>
      {confirming ? (
        <View style={styles.confirm}>
          <Text>{`Delete ${work.stockNumber} and its photos for good? Archiving keeps the record.`}</Text>
          <View style={styles.row}>
            <Button
              testID="work-delete-confirm"
              label="Delete for good"
              busyLabel="Deleting…"
              busy={remove.isPending}
              onPress={() =>
                remove.mutate(undefined, {
                  onSuccess: () => router.replace('/works'),
                  onSettled: () => setConfirming(false),
                })
              }
            />
            <Button label="Keep it" variant="secondary" onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : null}
      {remove.isError ? (
        <Notice testID="work-delete-refused" message={errorMessage(remove.error)} />
      ) : null}
      {archive.isError ? <Notice message={errorMessage(archive.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  confirm: { gap: spacing.sm },
});
