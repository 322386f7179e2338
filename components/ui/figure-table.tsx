import { StyleSheet, View } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

import { Text } from './text';

export type FigureColumn<Key extends string> = {
  key: Key;
  header: string;
  /** Figures are right-aligned, in tabular digits. */
  figure?: boolean;
  /** Share of the row's width. */
  flex?: number;
};

export type FigureRow<Key extends string> = {
  key: string;
  cells: Record<Key, string>;
  testID?: string;
};

type FigureTableProps<Key extends string> = {
  /** What the table holds, for screen readers. */
  label: string;
  columns: readonly FigureColumn<Key>[];
  rows: readonly FigureRow<Key>[];
  /** The totals row, set apart below the rows. */
  total?: FigureRow<Key>;
  testID: string;
  /**
   * On a phone, a table of more than three columns becomes one card a row (the first column its
   * title); a narrow one stays a table.
   */
  maxPhoneColumns?: number;
};

/**
 * Figures for reading, not sorting: a plain table on a wide screen (and on a phone while it fits),
 * a card a row otherwise. Amounts come formatted; nothing is added up here.
 */
export function FigureTable<Key extends string>({
  label,
  columns,
  rows,
  total,
  testID,
  maxPhoneColumns = 3,
}: FigureTableProps<Key>) {
  const { wide } = useBreakpoint();
  const all = total ? [...rows, total] : rows;
  if (!wide && columns.length > maxPhoneColumns) {
    const [first, ...rest] = columns;
    return (
      <View role="list" aria-label={label} testID={testID} style={styles.cards}>
        {all.map((row) => (
          <View
            key={row.key}
            role="listitem"
            testID={row.testID}
            style={[styles.card, row === total && styles.totalCard]}
          >
            <Text variant="bodyStrong">{row.cells[first!.key]}</Text>
            {rest.map((column) => (
              <View key={column.key} style={styles.pair}>
                <Text variant="small" style={styles.pairLabel}>
                  {column.header}
                </Text>
                <Text variant={column.figure ? 'number' : 'body'} style={styles.pairValue}>
                  {row.cells[column.key]}
                </Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    );
  }
  const cellStyle = (column: FigureColumn<Key>) => [
    { flexGrow: column.flex ?? 1, flexBasis: 0 },
    column.figure ? styles.end : null,
  ];
  return (
    <View role="table" aria-label={label} testID={testID} style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        {columns.map((column) => (
          <View key={column.key} role="columnheader" style={[styles.cell, cellStyle(column)]}>
            <Text variant="label" style={column.figure ? styles.endText : undefined}>
              {column.header}
            </Text>
          </View>
        ))}
      </View>
      {all.map((row) => (
        <View
          key={row.key}
          role="row"
          testID={row.testID}
          style={[styles.row, row === total && styles.totalRow]}
        >
          {columns.map((column) => (
            <View key={column.key} role="cell" style={[styles.cell, cellStyle(column)]}>
              <Text
                variant={row === total ? 'label' : column.figure ? 'number' : 'body'}
                style={column.figure ? [styles.endText, styles.tabular] : undefined}
              >
                {row.cells[column.key]}
              </Text>
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: {
    borderWidth: 1,
    borderColor: palette.hairline,
    borderRadius: radii.md,
    backgroundColor: palette.surface,
    overflow: 'hidden',
  },
  row: {
    flexDirection: 'row',
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  header: { borderTopWidth: 0, backgroundColor: palette.sunken },
  totalRow: { borderTopWidth: 2, borderTopColor: palette.outline },
  cell: { paddingVertical: spacing.sm, paddingHorizontal: spacing.sm, minWidth: 0 },
  end: { alignItems: 'flex-end' },
  endText: { textAlign: 'right' },
  tabular: { fontVariant: ['tabular-nums'] },
  cards: { gap: spacing.sm },
  card: {
    gap: spacing.xxs,
    padding: spacing.md,
    borderWidth: 1,
    borderColor: palette.hairline,
    borderRadius: radii.md,
    backgroundColor: palette.surface,
  },
  totalCard: { borderColor: palette.outline, borderWidth: 2 },
  pair: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.md },
  pairLabel: { flexShrink: 1 },
  pairValue: { textAlign: 'right', fontVariant: ['tabular-nums'] },
});
