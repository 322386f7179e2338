import { useState } from 'react';

import { pickPhotos } from '@/components/ui/photo-picker';
import { PhotoStrip } from '@/components/ui/photo-strip';
import { errorMessage } from '@/hooks/api-errors';
import {
  usePhotoDeleteMutation,
  usePhotoOrderMutation,
  usePhotoUploadMutation,
} from '@/hooks/queries/works';
import { type Work } from '@/shared/schemas/work';

import { moved } from './pending-photos';

/** A saved work's photos: each change is sent at once, and the list refreshes from the server. */
export function PhotoManager({ work }: { work: Work }) {
  const upload = usePhotoUploadMutation();
  const order = usePhotoOrderMutation(work.id);
  const remove = usePhotoDeleteMutation(work.id);
  const [progress, setProgress] = useState<number | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const photos = [...work.photos].sort((a, b) => a.position - b.position);
  const ids = photos.map((p) => p.id);
  const indexOf = (key: string) => ids.indexOf(Number(key));
  const run = async (action: () => Promise<unknown>) => {
    setProblem(null);
    try {
      await action();
    } catch (error) {
      setProblem(errorMessage(error));
    }
  };

  return (
    <PhotoStrip
      testID="work-photos"
      photos={photos.map((photo, i) => ({
        key: String(photo.id),
        uri: photo.thumbnailUrl,
        label: `${work.title}, photo ${i + 1}${i === 0 ? ', the cover' : ''}`,
      }))}
      busy={progress !== null || order.isPending || remove.isPending}
      progress={progress}
      error={problem}
      onAdd={() =>
        void run(async () => {
          const files = await pickPhotos();
          if (files.length === 0) return;
          setProgress(0);
          try {
            await upload.mutateAsync({
              workId: work.id,
              files,
              onProgress: ({ loaded, total }) => setProgress(loaded / total),
            });
          } finally {
            setProgress(null);
          }
        })
      }
      onMove={(key, offset) => {
        const from = indexOf(key);
        const to = Math.max(0, Math.min(ids.length - 1, from + offset));
        void run(() => order.mutateAsync(moved(ids, from, to)));
      }}
      onMakeCover={(key) => void run(() => order.mutateAsync(moved(ids, indexOf(key), 0)))}
      onRemove={(key) => void run(() => remove.mutateAsync(Number(key)))}
    />
  );
}
