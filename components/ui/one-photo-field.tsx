import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { pickPhotos } from '@/components/ui/photo-picker';
import { SquareImage } from '@/components/ui/square-image';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { type ChosenFile } from '@/hooks/chosen-file';

export type AttachedPhoto = { fileId: number; url: string };

/**
 * One photo picked and sent at once (a finding's, a damaged piece's), shown as a thumbnail
 * beside the button that changes it; a refused upload is said below it.
 */
export function OnePhotoField({
  upload,
  photo,
  onChange,
  addLabel,
  imageLabel,
  testID,
}: {
  upload: { mutateAsync: (file: ChosenFile) => Promise<AttachedPhoto>; isPending: boolean };
  photo: AttachedPhoto | null;
  onChange: (photo: AttachedPhoto) => void;
  addLabel: string;
  imageLabel: string;
  testID: string;
}) {
  const [problem, setProblem] = useState<string | null>(null);
  const addPhoto = async () => {
    setProblem(null);
    try {
      const [file] = await pickPhotos();
      if (file) onChange(await upload.mutateAsync(file));
    } catch (error) {
      setProblem(errorMessage(error));
    }
  };
  return (
    <>
      <View style={styles.photo}>
        {photo ? <SquareImage uri={`${photo.url}/thumbnail`} size={72} label={imageLabel} /> : null}
        <Button
          testID={testID}
          label={photo ? 'Change the photo' : addLabel}
          busyLabel="Sending the photo…"
          busy={upload.isPending}
          variant="secondary"
          onPress={() => void addPhoto()}
        />
      </View>
      {problem ? <Notice message={problem} /> : null}
    </>
  );
}

const styles = StyleSheet.create({
  photo: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
});
