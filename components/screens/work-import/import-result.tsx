import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { CsvDownload } from '@/components/ui/csv-download';
import { counted } from '@/components/ui/format';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { type WorkImportResult } from '@/shared/schemas/work-import';

import { ImportGroups } from './import-groups';
import { ImportRows } from './import-rows';

type ImportResultProps = { result: WorkImportResult; fileName: string; onAnother: () => void };

/** What went in, and every row that did not, with why and a CSV of them to correct. */
export function ImportResult({ result, fileName, onAnother }: ImportResultProps) {
  const { imported, skippedCount, skipped, skippedCsv } = result;
  const base = fileName.replace(/\.csv$/i, '');
  return (
    <View style={styles.stack} testID="import-done">
      <Card style={styles.stack}>
        <Heading level={2}>{`${counted(imported, 'work')} imported`}</Heading>
        <Text testID="import-done-summary">
          {skippedCount === 0
            ? 'Every row was imported.'
            : `${counted(skippedCount, 'row')} skipped, listed below with why. Download them, correct them in the spreadsheet and import that file: the Problem column is not read.`}
        </Text>
        <View style={styles.row}>
          {skippedCsv ? (
            <CsvDownload
              csv={skippedCsv}
              fileName={`${base}-skipped.csv`}
              label="Download the skipped rows"
              testID="import-skipped-csv"
            />
          ) : null}
          <Link href="/works" asChild>
            <Button testID="import-to-works" label="See the works" />
          </Link>
          <Button
            testID="import-another"
            label="Import another file"
            variant="secondary"
            onPress={onAnother}
          />
        </View>
      </Card>
      <ImportGroups
        title="Why rows were skipped"
        problems={result.problems}
        duplicates={result.duplicates}
      />
      {skippedCount > 0 ? (
        <View style={styles.stack}>
          <Heading level={2}>Skipped rows</Heading>
          {skipped.length < skippedCount ? (
            <Text variant="small">{`Showing the first ${skipped.length} of ${skippedCount}; the download has them all.`}</Text>
          ) : null}
          <ImportRows rows={skipped} skipped />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
