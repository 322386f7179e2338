import { Share } from 'react-native';

import { Button } from './button';

type CsvDownloadProps = { csv: string; fileName: string; label: string; testID: string };

/** Native: the CSV handed to the share sheet, to save or send to a spreadsheet program. */
export function CsvDownload({ csv, fileName, label, testID }: CsvDownloadProps) {
  return (
    <Button
      testID={testID}
      label={label}
      variant="secondary"
      onPress={() => void Share.share({ title: fileName, message: csv })}
    />
  );
}
