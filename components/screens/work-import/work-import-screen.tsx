import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { counted } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Select } from '@/components/ui/select';
import { EmptyView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useWorkImportCommitMutation, useWorkImportPreviewMutation } from '@/hooks/queries/works';
import {
  type ImportColumn,
  importColumnLabels,
  importColumns,
  maxImportRows,
} from '@/shared/schemas/work-import';

import { ImportRows } from './import-rows';
import { chooseCsvFile, type ChosenCsv } from './read-csv-file';

type Mapping = Partial<Record<ImportColumn, string>>;

/** Choose a CSV, see every row checked and how columns map, then import the good rows or nothing. */
export function WorkImportScreen() {
  const preview = useWorkImportPreviewMutation();
  const commit = useWorkImportCommitMutation();
  const [file, setFile] = useState<ChosenCsv | null>(null);
  const [mapping, setMapping] = useState<Mapping | null>(null);
  const [mappingChanged, setMappingChanged] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  const runPreview = (csv: ChosenCsv, withMapping?: Mapping) =>
    preview.mutate(
      { csv: csv.text, mapping: withMapping },
      {
        onSuccess: (result) => {
          setMapping(result.mapping);
          setMappingChanged(false);
        },
      },
    );

  const choose = async () => {
    setProblem(null);
    try {
      const chosen = await chooseCsvFile();
      if (!chosen) return;
      commit.reset();
      setFile(chosen);
      runPreview(chosen);
    } catch (error) {
      setProblem(errorMessage(error));
    }
  };

  const cancel = () => {
    setFile(null);
    setMapping(null);
    preview.reset();
    commit.reset();
  };

  const data = preview.data;
  const columns = data?.columns ?? [];

  return (
    <Screen testID="work-import-screen">
      <View style={styles.heading}>
        <TextLink href="/works" label="All works" />
        <Heading level={1}>Import works from CSV</Heading>
        <Text variant="small">
          Save the spreadsheet as CSV with a header row, up to{' '}
          {maxImportRows.toLocaleString('en-GB')} rows. Prices are in the studio’s currency, with a
          decimal point (12.50). Nothing is written until you press Import; duplicate stock numbers
          are reported, not merged.
        </Text>
      </View>

      {problem ? <Notice message={problem} /> : null}

      {commit.isSuccess ? (
        <Card testID="import-done">
          <Heading level={2}>{`${counted(commit.data.imported, 'work')} imported`}</Heading>
          <Text testID="import-done-summary">
            {commit.data.skippedCount === 0
              ? 'Every row was imported.'
              : `${counted(commit.data.skippedCount, 'row')} skipped because of the problems below.`}
          </Text>
          {commit.data.skippedCount > 0 ? <ImportRows rows={commit.data.skipped} /> : null}
          <View style={styles.row}>
            <Link href="/works" asChild>
              <Button testID="import-to-works" label="See the works" />
            </Link>
            <Button label="Import another file" variant="secondary" onPress={cancel} />
          </View>
        </Card>
      ) : !file ? (
        <Card>
          <EmptyView
            title="No file chosen"
            message="Choose a CSV file to see every row checked before anything is imported."
          />
          <View style={styles.start}>
            <Button
              testID="import-choose"
              label="Choose a CSV file"
              onPress={() => void choose()}
            />
          </View>
        </Card>
      ) : preview.isPending ? (
        <LoadingView message={`Checking ${file.name}…`} />
      ) : preview.isError ? (
        <View style={styles.stack}>
          <Notice testID="import-error" message={errorMessage(preview.error)} />
          <View style={styles.row}>
            <Button label="Choose another file" onPress={() => void choose()} />
            <Button label="Cancel" variant="secondary" onPress={cancel} />
          </View>
        </View>
      ) : data ? (
        <>
          <Card style={styles.stack}>
            <Heading level={2}>{file.name}</Heading>
            <Text testID="import-summary">
              {`${counted(data.rowCount, 'row')}: ${data.validCount} ready to import, ${data.errorCount} with problems.`}
            </Text>
          </Card>

          <Card style={styles.stack}>
            <Heading level={2}>Columns</Heading>
            <Text variant="small">
              Which column of the file fills each field. Change one and check again.
            </Text>
            <View style={styles.mapping}>
              {importColumns.map((field) => (
                <View key={field} style={styles.mapSlot}>
                  <Select
                    testID={`import-map-${field}`}
                    label={importColumnLabels[field]}
                    emptyLabel="Not imported"
                    options={columns.map((c) => ({ value: c, label: c }))}
                    value={mapping?.[field] ?? ''}
                    onChange={(column) => {
                      setMapping((current) => {
                        const next = { ...current };
                        if (column === '') delete next[field];
                        else next[field] = column;
                        return next;
                      });
                      setMappingChanged(true);
                    }}
                  />
                </View>
              ))}
            </View>
            {mappingChanged ? (
              <View style={styles.start}>
                <Button
                  testID="import-repreview"
                  label="Check again with these columns"
                  variant="secondary"
                  onPress={() => runPreview(file, mapping ?? undefined)}
                />
              </View>
            ) : null}
          </Card>

          <View style={styles.stack}>
            <Heading level={2}>Rows</Heading>
            {data.rows.length < data.rowCount ? (
              <Text variant="small" testID="import-rows-shown">
                {`Showing ${data.rows.length} of ${data.rowCount} rows: the first ones ready to import and the first ones with a problem.`}
              </Text>
            ) : null}
            <ImportRows rows={data.rows} />
          </View>

          {commit.isError ? (
            <Notice testID="import-commit-error" message={errorMessage(commit.error)} />
          ) : null}
          <View style={styles.row}>
            <Button
              testID="import-commit"
              label={`Import ${counted(data.validCount, 'work')}`}
              busyLabel="Importing…"
              busy={commit.isPending}
              disabled={data.validCount === 0 || mappingChanged}
              onPress={() => commit.mutate({ csv: file.text, mapping: mapping ?? undefined })}
            />
            <Button testID="import-cancel" label="Cancel" variant="secondary" onPress={cancel} />
          </View>
          {mappingChanged ? (
            <Text variant="small">Check again with the new columns before importing.</Text>
          ) : null}
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  stack: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
  mapping: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  mapSlot: { flexGrow: 1, flexBasis: 200 },
});
