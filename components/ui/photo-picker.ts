import * as ImagePicker from 'expo-image-picker';

import { type ChosenFile } from '@/hooks/chosen-file';

/**
 * Photos from the phone's library, or the browser's file chooser on the web; several at once.
 * Resolves with none when the person cancels.
 */
export async function pickPhotos(): Promise<ChosenFile[]> {
  const result = await ImagePicker.launchImageLibraryAsync({
    mediaTypes: ['images'],
    allowsMultipleSelection: true,
    quality: 1,
  });
  if (result.canceled) return [];
  return result.assets.map((asset, index) => ({
    uri: asset.uri,
    name: asset.fileName ?? `photo-${index + 1}.jpg`,
    mimeType: asset.mimeType ?? 'image/jpeg',
    file: asset.file ?? undefined,
  }));
}
