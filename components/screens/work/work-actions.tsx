import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useToast } from '@/components/ui/toast';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useWorkArchiveMutation, useWorkDeleteMutation } from '@/hooks/queries/works';
import { type Work } from '@/shared/schemas/work';

/**
 * Edit, archive (at once, undone from the message that confirms it) and delete, asked once more
 * and offered only while nothing on record needs the work.
 */
export function WorkActions({ work }: { work: Work }) {
  const router = useRouter();
  const toast = useToast();
  const archive = useWorkArchiveMutation(work.id);
  const remove = useWorkDeleteMutation(work.id);
  const [confirming, setConfirming] = useState(false);
  const name = `‘${work.title}’`;

  const archiveNow = () =>
    archive.mutate('archive', {
      onSuccess: () =>
        toast({
          testID: 'work-archived-toast',
          message: `Archived ${name}.`,
          action: {
            label: 'Undo',
            onPress: () =>
              archive.mutate('restore', {
                onSuccess: () => toast({ message: `${name} is back in the works list.` }),
              }),
          },
        }),
    });

  return (
    <View style={styles.actions}>
      <View style={styles.row}>
        <Link href={{ pathname: '/works/[id]/edit', params: { id: String(work.id) } }} asChild>
          <Button testID="work-edit" label="Edit" />
        </Link>
        {work.archivedAt === null ? (
          <Button
            testID="work-archive"
            label={`Archive ${name}`}
            busyLabel="Archiving…"
            busy={archive.isPending}
            variant="danger"
            onPress={archiveNow}
          />
        ) : null}
        {work.deletable && !confirming ? (
          <Button
            testID="work-delete"
            label={`Delete ${name}…`}
            variant="danger"
            onPress={() => {
              remove.reset();
              setConfirming(true);
            }}
          />
        ) : null}
      </View>
      {work.deletable && confirming ? (
        <View style={styles.confirm}>
          <Text>{`Delete ${name} (${work.stockNumber}) and its photos for good? This cannot be undone; archiving keeps the record instead.`}</Text>
          <View style={styles.row}>
            <Button
              testID="work-delete-confirm"
              label={`Delete ${name} for good`}
              busyLabel="Deleting…"
              busy={remove.isPending}
              variant="danger"
              onPress={() =>
                remove.mutate(undefined, {
                  onSuccess: () => {
                    router.replace('/works');
                    toast({ message: `Deleted ${name}.` });
                  },
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
