import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { useLeaveGuard } from '@/components/ui/form/use-leave-guard';
import { Notice } from '@/components/ui/notice';
import { pickPhotos } from '@/components/ui/photo-picker';
import { PhotoStrip } from '@/components/ui/photo-strip';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { useToast } from '@/components/ui/toast';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useStudioQuery } from '@/hooks/queries/studio';
import { usePhotoUploadMutation, useWorkCreateMutation } from '@/hooks/queries/works';
import { type Work } from '@/shared/schemas/work';

import { usePendingPhotos } from './pending-photos';
import { WorkForm } from './work-form';
import { emptyWorkValues, workBinding } from './work-form-values';

export function WorkCreateScreen() {
  const router = useRouter();
  const studio = useStudioQuery();
  const create = useWorkCreateMutation();
  const upload = usePhotoUploadMutation();
  const photos = usePendingPhotos();
  const [progress, setProgress] = useState<number | null>(null);
  const [unsent, setUnsent] = useState<{ work: Work; reason: string } | null>(null);
  const [dirty, setDirty] = useState(false);
  const guard = useLeaveGuard(dirty || photos.files.length > 0);
  const toast = useToast();

  const open = (work: Work) =>
    guard.leave(() => {
      router.replace({ pathname: '/works/[id]', params: { id: String(work.id) } });
      toast({ message: `Saved ‘${work.title}’ as ${work.stockNumber}.` });
    });

  const [photoProblem, setPhotoProblem] = useState<string | null>(null);
  const addPhotos = async () => {
    try {
      photos.add(await pickPhotos());
      setPhotoProblem(null);
    } catch (error) {
      setPhotoProblem(errorMessage(error));
    }
  };

  return (
    <Screen testID="work-create-screen">
      <View style={styles.heading}>
        <Heading level={1}>New work</Heading>
        <Text variant="small">
          Only the title and the retail price are needed; add the rest when you can.
        </Text>
      </View>
      {studio.isPending ? (
        <LoadingView message="Finding the next stock number…" />
      ) : studio.isError ? (
        <ErrorView error={studio.error} onRetry={() => studio.refetch()} />
      ) : (
        <WorkForm
          mode="create"
          onDirtyChange={setDirty}
          defaultValues={emptyWorkValues(studio.data.nextStockNumber)}
          binding={workBinding('create', studio.data.currency)}
          currency={studio.data.currency}
          submitLabel={photos.files.length > 0 ? 'Save work and photos' : 'Save work'}
          busyLabel={progress === null ? 'Saving…' : 'Sending photos…'}
          onSubmit={async (values) => {
            const work = unsent?.work ?? (await create.mutateAsync(values));
            if (photos.files.length === 0) return open(work);
            setProgress(0);
            try {
              await upload.mutateAsync({
                workId: work.id,
                files: photos.files,
                onProgress: ({ loaded, total }) => setProgress(loaded / total),
              });
              open(work);
            } catch (error) {
              setUnsent({ work, reason: errorMessage(error) });
            } finally {
              setProgress(null);
            }
          }}
          photos={
            <Card style={styles.photos}>
              <Heading level={2}>Photos</Heading>
              <PhotoStrip
                testID="work-photos"
                photos={photos.tiles}
                onAdd={() => void addPhotos()}
                onMove={photos.move}
                onMakeCover={photos.makeCover}
                onRemove={photos.remove}
                progress={progress}
                busy={progress !== null}
                error={photoProblem}
              />
            </Card>
          }
          afterNotice={
            unsent ? (
              <View style={styles.unsent}>
                <Notice
                  testID="work-photos-unsent"
                  message={`${unsent.work.stockNumber} is saved, but its photos were not sent: ${unsent.reason} Save again to retry, or open the work and add them there.`}
                />
                <Button
                  label="Open the work"
                  variant="secondary"
                  onPress={() => open(unsent.work)}
                />
              </View>
            ) : null
          }
        />
      )}
      {guard.prompt}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  photos: { gap: spacing.md },
  unsent: { gap: spacing.sm, alignItems: 'flex-start' },
});
