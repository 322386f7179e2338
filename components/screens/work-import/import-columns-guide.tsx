import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { Heading, Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { workImportTemplatePath } from '@/hooks/queries/works';
import {
  importColumnAliases,
  importColumnLabels,
  importColumns,
  requiredImportFields,
} from '@/shared/schemas/work-import';

import { importColumnNote } from './import-column-notes';

const required = new Set<string>(requiredImportFields);

/**
 * The columns an import reads, by the headers it recognises, which are required and what units
 * a cell may be in; with a template to start from. The full list opens on request, since a maker
 * who exported from Saggar needs none of it.
 */
export function ImportColumnsGuide({ currency }: { currency: string }) {
  const [open, setOpen] = useState(false);
  return (
    <Card style={styles.card} testID="import-columns-guide">
      <Heading level={2}>Columns</Heading>
      <Text>
        {`Each work needs a ${importColumnLabels.title} and a ${importColumnLabels.retailPrice}; every other column may be left out or blank. Sizes are in millimetres and weights in grams unless a cell says otherwise (14 cm, 1.2 kg). Headers are matched ignoring case and punctuation.`}
      </Text>
      <View style={styles.actions}>
        <DownloadLink
          href={workImportTemplatePath}
          fileName="works-import-template.csv"
          label="Download a template CSV"
          testID="import-template"
        />
        <Button
          testID="import-columns-toggle"
          label={open ? 'Hide the columns' : `Show all ${importColumns.length} columns`}
          variant="quiet"
          aria-expanded={open}
          onPress={() => setOpen((o) => !o)}
        />
      </View>
      {open ? (
        <View role="list" aria-label="Columns the import reads" style={styles.list}>
          {importColumns.map((column) => {
            const also = importColumnAliases[column] ?? [];
            const note = importColumnNote(column, currency);
            return (
              <View
                key={column}
                role="listitem"
                style={styles.column}
                testID={`import-column-${column}`}
              >
                <Text variant="label">
                  {importColumnLabels[column]}
                  {required.has(column) ? ' (required)' : ''}
                </Text>
                {also.length > 0 ? (
                  <Text variant="small">{`Also read from: ${also.join(', ')}`}</Text>
                ) : null}
                {note ? <Text variant="small">{note}</Text> : null}
              </View>
            );
          })}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  list: { gap: 0 },
  column: {
    gap: spacing.xxs,
    paddingVertical: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
});
