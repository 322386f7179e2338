import { Button } from './button';

type CsvDownloadProps = { csv: string; fileName: string; label: string; testID: string };

/** The file's address is made on the press and let go once the browser has surely taken it. */
function save(csv: string, fileName: string) {
  const url = URL.createObjectURL(new Blob(['\ufeff', csv], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** A CSV made in the app, saved by the browser as a file, UTF-8 marked for spreadsheet programs. */
export function CsvDownload({ csv, fileName, label, testID }: CsvDownloadProps) {
  return (
    <Button testID={testID} label={label} variant="secondary" onPress={() => save(csv, fileName)} />
  );
}
