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
import { TickBox } from '@/components/ui/tick-box';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useStudioQuery } from '@/hooks/queries/studio';
import { useWorkImportCommitMutation, useWorkImportPreviewMutation } from '@/hooks/queries/works';
import {
  type ImportColumn,
  importColumnLabels,
  importColumns,
  maxImportRows,
  overridableDuplicates,
} from '@/shared/schemas/work-import';

import { ImportColumnsGuide } from './import-columns-guide';
import { ImportGroups } from './import-groups';
import { ImportResult } from './import-result';
import { ImportRows } from './import-rows';
import { chooseCsvFile, type ChosenCsv } from './read-csv-file';

type Mapping = Partial<Record<ImportColumn, string>>;

/**
 * Choose a CSV, see every row checked (what it reads as, its problems, whether it repeats a work)
 * and how columns map, then import the rows that go in; afterwards the skipped rows stay listed,
 * with a CSV of them to correct.
 */
export function WorkImportScreen() {
  const preview = useWorkImportPreviewMutation();
  const commit = useWorkImportCommitMutation();
  const studio = useStudioQuery();
  const [file, setFile] = useState<ChosenCsv | null>(null);
  const [mapping, setMapping] = useState<Mapping | null>(null);
  const [mappingChanged, setMappingChanged] = useState(false);
  const [importDuplicates, setImportDuplicates] = useState(false);
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
      setImportDuplicates(false);
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
  const toImport = data
    ? data.validCount + (importDuplicates ? data.importableDuplicateCount : 0)
    : 0;

  return (
    // A scroll view of its own for the result, so that it opens at its top rather than where the
    // Import button was.
    <Screen testID="work-import-screen" key={commit.isSuccess ? 'result' : 'check'}>
      <View style={styles.heading}>
        <TextLink href="/works" label="All works" />
        <Heading level={1}>Import works from CSV</Heading>
        <Text variant="small">
          Save the spreadsheet as CSV with a header row, up to{' '}
          {maxImportRows.toLocaleString('en-GB')} rows. Nothing is written until you press Import;
          rows that repeat a work already in the catalogue are set aside, not merged.
        </Text>
      </View>

      {problem ? <Notice message={problem} /> : null}

      {commit.isSuccess && file ? (
        <ImportResult result={commit.data} fileName={file.name} onAnother={cancel} />
      ) : !file ? (
        <>
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
          <ImportColumnsGuide currency={studio.data?.currency ?? 'the studio’s currency'} />
        </>
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
              {`${counted(data.rowCount, 'row')}: ${data.validCount} ready to import, ${data.errorCount} with problems${data.duplicateCount > 0 ? `, ${counted(data.duplicateCount, 'duplicate')}` : ''}.`}
            </Text>
            {data.importableDuplicateCount > 0 ? (
              <TickBox
                testID="import-duplicates-anyway"
                label={`Import them anyway as new works (${counted(data.importableDuplicateCount, 'row')} with the same title, year and price as a work in the catalogue or an earlier row)`}
                ticked={importDuplicates}
                onToggle={() => setImportDuplicates((d) => !d)}
              />
            ) : null}
            {data.duplicates.some((d) => !overridableDuplicates.has(d.kind)) ? (
              <Text variant="small" testID="import-taken-note">
                Rows whose stock number is already used are never imported: stock numbers are
                unique.
              </Text>
            ) : null}
          </Card>

          <ImportGroups problems={data.problems} duplicates={data.duplicates} />

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
                {`Showing ${data.rows.length} of ${data.rowCount} rows: the first ones ready to import and the first ones that will not be.`}
              </Text>
            ) : null}
            <ImportRows rows={data.rows} importDuplicates={importDuplicates} />
          </View>

          {commit.isError ? (
            <Notice testID="import-commit-error" message={errorMessage(commit.error)} />
          ) : null}
          <View style={styles.row}>
            <Button
              testID="import-commit"
              label={`Import ${counted(toImport, 'work')}`}
              busyLabel="Importing…"
              busy={commit.isPending}
              disabled={toImport === 0 || mappingChanged}
              onPress={() =>
                commit.mutate({ csv: file.text, mapping: mapping ?? undefined, importDuplicates })
              }
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
