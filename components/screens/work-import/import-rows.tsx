import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { formatDimensions, formatWeight } from '@/components/ui/format';
import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money';
import {
  importColumnLabel,
  type ImportRead,
  type ImportRow,
  overridableDuplicates,
} from '@/shared/schemas/work-import';

/** What the row's prices and measurements were read as: "£85.00 GBP · 140 mm · 1.2 kg". */
function readAs(read: ImportRead): string | null {
  const { retailPrice, costPrice, heightMm, widthMm, depthMm, weightG } = read;
  const parts = [
    retailPrice && `${formatMoney(retailPrice)} ${retailPrice.currency}`,
    costPrice && `cost ${formatMoney(costPrice)}`,
    (heightMm ?? widthMm ?? depthMm) !== null && formatDimensions(heightMm, widthMm, depthMm),
    weightG !== null && formatWeight(weightG),
  ].filter((p): p is string => typeof p === 'string');
  return parts.length === 0 ? null : parts.join(' · ');
}

type RowState = 'ready' | 'problem' | 'duplicate' | 'anyway';

const stateLooks = {
  ready: { word: 'Ready', shape: 'dot', color: palette.accent },
  problem: { word: 'Will be skipped', shape: 'diamond', color: palette.danger },
  duplicate: { word: 'Duplicate: skipped', shape: 'square', color: palette.ochre },
  anyway: { word: 'Duplicate: imported as new', shape: 'open-square', color: palette.ochre },
} as const;

function stateOf(row: ImportRow, importDuplicates: boolean): RowState {
  if (row.errors.length > 0) return 'problem';
  if (row.duplicate === null) return 'ready';
  return importDuplicates && overridableDuplicates.has(row.duplicate.kind) ? 'anyway' : 'duplicate';
}

type ImportRowsProps = {
  rows: readonly ImportRow[];
  /** Whether look-alike rows are to go in as new works. */
  importDuplicates?: boolean;
  /** After an import, every row listed was skipped. */
  skipped?: boolean;
};

/** Rows of the file, as the spreadsheet numbers them: what each reads as, and what stops it. */
export function ImportRows({ rows, importDuplicates = false, skipped = false }: ImportRowsProps) {
  return (
    <Card role="list" aria-label="Rows in the file" style={styles.list}>
      {rows.map((row, index) => {
        const state = stateOf(row, importDuplicates);
        const look = stateLooks[state];
        const read = readAs(row.read);
        const goesIn = state === 'ready' || state === 'anyway';
        return (
          <View
            key={row.rowNumber}
            role="listitem"
            testID={goesIn ? `import-row-${row.rowNumber}` : `import-row-error-${row.rowNumber}`}
            style={[styles.row, index > 0 && styles.divided]}
          >
            <View style={styles.top}>
              <StateGlyph shape={look.shape} color={look.color} />
              <Text variant="number" style={styles.number}>{`Row ${row.rowNumber}`}</Text>
              <Text variant="bodyStrong" style={styles.title}>
                {[row.stockNumber, row.title].filter(Boolean).join(' · ') ||
                  'No stock number or title'}
              </Text>
              <Text variant="label">{skipped ? 'Skipped' : look.word}</Text>
            </View>
            {read ? (
              <Text
                variant="small"
                style={styles.detail}
                testID={`import-row-read-${row.rowNumber}`}
              >
                {`Reads as ${read}`}
              </Text>
            ) : null}
            {row.errors.map((error) => (
              <Text key={`${error.field}-${error.message}`} style={[styles.detail, styles.error]}>
                {`${importColumnLabel(error.field)}: ${error.message}`}
              </Text>
            ))}
            {row.duplicate ? (
              <Text style={[styles.detail, styles.duplicate]}>
                {`Duplicate: ${row.duplicate.message}`}
              </Text>
            ) : null}
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
  detail: { paddingLeft: spacing.xl },
  error: { color: palette.danger },
  duplicate: { color: palette.ochre },
});
