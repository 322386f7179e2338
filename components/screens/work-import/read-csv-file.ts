import * as DocumentPicker from 'expo-document-picker';

export type ChosenCsv = { name: string; text: string };

/** A CSV file from the file chooser (web) or the document picker, read as text; null if cancelled. */
export async function chooseCsvFile(): Promise<ChosenCsv | null> {
  const result = await DocumentPicker.getDocumentAsync({
    type: ['text/csv', 'text/comma-separated-values', 'application/vnd.ms-excel', 'text/plain'],
    multiple: false,
    copyToCacheDirectory: true,
    base64: false,
  });
  if (result.canceled) return null;
  const asset = result.assets[0];
  if (!asset) return null;
  const text = asset.file ? await asset.file.text() : await (await fetch(asset.uri)).text();
  return { name: asset.name, text };
}
