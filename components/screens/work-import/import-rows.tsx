import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { type ImportRow } from '@/shared/schemas/work-import';

import { fieldLabel } from './import-fields';

/** Every row of the file, as the spreadsheet numbers it, each with what is wrong with it. */
export function ImportRows({ rows }: { rows: readonly ImportRow[] }) {
  return (
    <Card role="list" aria-label="Rows in the file" style={styles.list}>
      {rows.map((row, index) => {
        const bad = row.errors.length > 0;
        return (
          <View
            key={row.rowNumber}
            role="listitem"
            testID={bad ? `import-row-error-${row.rowNumber}` : `import-row-${row.rowNumber}`}
            style={[styles.row, index > 0 && styles.divided]}
          >
            <View style={styles.top}>
              <StateGlyph
                shape={bad ? 'diamond' : 'dot'}
                color={bad ? palette.danger : palette.accent}
              />
              <Text variant="number" style={styles.number}>{`Row ${row.rowNumber}`}</Text>
              <Text variant="bodyStrong" style={styles.title}>
                {[row.stockNumber, row.title].filter(Boolean).join(' · ') ||
                  'No stock number or title'}
              </Text>
              <Text variant="label">{bad ? 'Will be skipped' : 'Ready'}</Text>
            </View>
            {row.errors.map((error) => (
              <Text key={`${error.field}-${error.message}`} style={styles.error}>
                {`${fieldLabel(error.field)}: ${error.message}`}
              </Text>
            ))}
          </View>
        );
      })}
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0, paddingVertical: spacing.xs },
  row: { paddingVertical: spacing.sm, gap: spacing.xxs },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
  top: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  number: { minWidth: 72 },
  title: { flex: 1, minWidth: 140 },
  error: { color: palette.danger, paddingLeft: spacing.xl },
});
