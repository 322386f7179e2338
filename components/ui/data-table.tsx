import {
  type Header,
  type ReactTable,
  type Row,
  type RowData,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
} from '@tanstack/react-table';
import { type ReactNode, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';

import { palette, radii, spacing, touchTarget } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

import { Text } from './text';
import { focusRing, useFocusRing } from './use-focus-ring';

/** How a column sits in the wide table: figures right-aligned, and its share of the width. */
export type DataColumnMeta = { align?: 'end'; flex?: number; width?: number };

/** Sorting and paging belong to the server: the table only holds their state. */
export const dataTableFeatures = tableFeatures({
  rowSortingFeature,
  rowPaginationFeature,
  columnMeta: {} as DataColumnMeta,
});
export type DataTableFeatures = typeof dataTableFeatures;

type DataTableProps<TData extends RowData> = {
  table: ReactTable<DataTableFeatures, TData, unknown>;
  /** What the table lists, for screen readers: "Works". */
  label: string;
  /** One row as a card on a phone. */
  renderCard: (row: Row<DataTableFeatures, TData>) => ReactNode;
  testID: string;
  rowTestID?: (row: Row<DataTableFeatures, TData>) => string;
  /** Narrowest the wide table gets before it scrolls sideways. */
  minWidth?: number;
};

const fixed = { flexGrow: 0, flexShrink: 0, flexBasis: 'auto' } as const;

const sortWords = { asc: 'ascending', desc: 'descending' } as const;

function columnStyle(meta: DataColumnMeta | undefined) {
  return [
    meta?.width !== undefined
      ? { width: meta.width, flexGrow: 0, flexShrink: 0 }
      : { flexGrow: meta?.flex ?? 1, flexBasis: 0 },
    meta?.align === 'end' ? styles.end : null,
  ];
}

function SortButton<TData extends RowData>({
  header,
  title,
}: {
  header: Header<DataTableFeatures, TData, unknown>;
  title: string;
}) {
  const { focused, focusProps } = useFocusRing();
  const sorted = header.column.getIsSorted();
  const arrow = sorted === 'asc' ? '↑' : sorted === 'desc' ? '↓' : '↕';
  return (
    <Pressable
      testID={`sort-${header.column.id}`}
      role="button"
      accessibilityLabel={`${title}, sort ${sorted === 'asc' ? 'descending' : 'ascending'}`}
      // One column at a time: a press event carries no shift key to ask for more.
      onPress={() => header.column.toggleSorting(undefined, false)}
      {...focusProps}
      style={({ pressed }) => [
        styles.sortButton,
        header.column.columnDef.meta?.align === 'end' && styles.sortButtonEnd,
        pressed && styles.pressed,
        focused && focusRing,
      ]}
    >
      <Text variant="label">{title}</Text>
      <Text variant="label" aria-hidden style={sorted ? styles.arrowOn : styles.arrowOff}>
        {arrow}
      </Text>
    </Pressable>
  );
}

/**
 * Rows of a react-table instance: a table with sortable headers on a wide screen, a list of
 * cards on a phone. The same rows, in the same order, either way.
 */
export function DataTable<TData extends RowData>({
  table,
  label,
  renderCard,
  testID,
  rowTestID,
  minWidth = 720,
}: DataTableProps<TData>) {
  const { wide } = useBreakpoint();
  // The room the table has: inside a sideways scroller its width would otherwise follow its
  // longest unwrapped text, and one long name would push the last columns out of sight.
  const [room, setRoom] = useState(0);
  const rows = table.getRowModel().rows;

  if (!wide) {
    return (
      <View testID={`${testID}-cards`} role="list" aria-label={label} style={styles.cards}>
        {rows.map((row) => (
          <View key={row.id} role="listitem">
            {renderCard(row)}
          </View>
        ))}
      </View>
    );
  }

  return (
    <ScrollView
      horizontal
      contentContainerStyle={styles.scroller}
      onLayout={(event) => setRoom(event.nativeEvent.layout.width)}
    >
      <View
        testID={`${testID}-table`}
        role="table"
        aria-label={label}
        style={[
          styles.table,
          { minWidth },
          room > 0 && { ...fixed, width: Math.max(minWidth, room) },
        ]}
      >
        <View role="rowgroup">
          {table.getHeaderGroups().map((group) => (
            <View key={group.id} role="row" style={[styles.row, styles.headerRow]}>
              {group.headers.map((header) => {
                const meta = header.column.columnDef.meta;
                const title =
                  typeof header.column.columnDef.header === 'string'
                    ? header.column.columnDef.header
                    : header.column.id;
                const sorted = header.column.getIsSorted();
                return (
                  <View
                    key={header.id}
                    role="columnheader"
                    aria-sort={sorted ? sortWords[sorted] : undefined}
                    style={[styles.cell, columnStyle(meta)]}
                  >
                    {header.isPlaceholder ? null : header.column.getCanSort() ? (
                      <SortButton header={header} title={title} />
                    ) : typeof header.column.columnDef.header === 'string' ? (
                      // In the sortable headings' type, which a bare string would not take.
                      <View style={styles.heading}>
                        <Text variant="label">{title}</Text>
                      </View>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </View>
                );
              })}
            </View>
          ))}
        </View>
        <View role="rowgroup">
          {rows.map((row, index) => (
            <View
              key={row.id}
              role="row"
              testID={rowTestID?.(row)}
              style={[styles.row, index > 0 && styles.divided]}
            >
              {row.getAllCells().map((cell) => (
                <View
                  key={cell.id}
                  role="cell"
                  style={[styles.cell, columnStyle(cell.column.columnDef.meta)]}
                >
                  <table.FlexRender cell={cell} />
                </View>
              ))}
            </View>
          ))}
        </View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.md },
  scroller: { flexGrow: 1 },
  table: {
    flex: 1,
    backgroundColor: palette.surface,
    borderWidth: 1,
    borderColor: palette.hairline,
    borderRadius: radii.lg,
    overflow: 'hidden',
  },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: touchTarget + 12,
    paddingHorizontal: spacing.sm,
  },
  headerRow: { backgroundColor: palette.sunken, minHeight: touchTarget + 4 },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
  cell: {
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xs,
    minWidth: 0,
    alignItems: 'flex-start',
  },
  end: { alignItems: 'flex-end' },
  sortButton: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    borderRadius: radii.sm,
  },
  sortButtonEnd: { justifyContent: 'flex-end' },
  heading: { minHeight: touchTarget, justifyContent: 'center' },
  pressed: { opacity: 0.7 },
  arrowOn: { color: palette.accent },
  arrowOff: { color: palette.inkMuted },
});
