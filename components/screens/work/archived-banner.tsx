import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { useToast } from '@/components/ui/toast';
import { palette, radii, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useWorkArchiveMutation } from '@/hooks/queries/works';
import { type Work } from '@/shared/schemas/work';

/** An archived work says so at the top of its page, with the way back into the lists. */
export function ArchivedBanner({ work, archivedAt }: { work: Work; archivedAt: string }) {
  const restore = useWorkArchiveMutation(work.id);
  const toast = useToast();
  return (
    <View testID="work-archived" style={styles.banner}>
      <View style={styles.words}>
        <View style={styles.glyph}>
          <StateGlyph shape="open-square" color={palette.ochre} />
        </View>
        <View style={styles.text}>
          <Text variant="bodyStrong">{`Archived on ${formatDate(archivedAt.slice(0, 10))}`}</Text>
          <Text variant="small">
            Kept for the record, but left out of the works list unless you ask for archived works.
          </Text>
        </View>
      </View>
      <Button
        testID="work-restore"
        label={`Restore ‘${work.title}’`}
        busyLabel="Restoring…"
        busy={restore.isPending}
        variant="secondary"
        onPress={() =>
          restore.mutate('restore', {
            onSuccess: () => toast({ message: `‘${work.title}’ is back in the works list.` }),
          })
        }
      />
      {restore.isError ? <Notice message={errorMessage(restore.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderLeftWidth: 4,
    borderColor: palette.ochre,
    backgroundColor: palette.sunken,
    alignItems: 'flex-start',
  },
  words: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  // Level with the first line of text.
  glyph: { paddingTop: 6 },
  text: { flex: 1, gap: spacing.xxs },
});
