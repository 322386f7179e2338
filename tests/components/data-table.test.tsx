import { createColumnHelper, type SortingState, useTable } from '@tanstack/react-table';
import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { useState } from 'react';
import { Dimensions, StyleSheet, Text } from 'react-native';

import { DataTable, type DataTableFeatures, dataTableFeatures } from '@/components/ui/data-table';

type Pot = { id: number; title: string; price: number };
const pots: Pot[] = [
  { id: 1, title: 'Moon jar', price: 180000 },
  { id: 2, title: 'Tea bowl', price: 9500 },
];
const column = createColumnHelper<DataTableFeatures, Pot>();
const columns = column.columns([
  column.display({ id: 'photo', header: 'Photo', enableSorting: false, cell: () => null }),
  column.accessor('title', { header: 'Title', cell: ({ getValue }) => <Text>{getValue()}</Text> }),
  column.accessor('price', {
    header: 'Price',
    meta: { align: 'end' },
    cell: ({ getValue }) => <Text>{String(getValue())}</Text>,
  }),
]);

function setWidth(width: number) {
  act(() => {
    Dimensions.set({
      window: { width, height: 800, scale: 1, fontScale: 1 },
      screen: { width, height: 800, scale: 1, fontScale: 1 },
    });
  });
}

const sortChanges: SortingState[] = [];

function Pots() {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'title', desc: false }]);
  const table = useTable({
    features: dataTableFeatures,
    columns,
    data: pots,
    getRowId: (pot) => String(pot.id),
    manualSorting: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      sortChanges.push(next);
      setSorting(next);
    },
  });
  return (
    <DataTable
      table={table}
      label="Pots"
      testID="pots"
      rowTestID={(row) => `pot-row-${row.id}`}
      renderCard={(row) => (
        <Text testID={`pot-card-${row.id}`}>{`Card: ${row.original.title}`}</Text>
      )}
    />
  );
}

describe('DataTable', () => {
  beforeEach(() => {
    sortChanges.length = 0;
  });

  it('renders the rows as cards on a phone', () => {
    setWidth(390);
    render(<Pots />);

    expect(screen.getByTestId('pots-cards')).toBeTruthy();
    expect(screen.queryByTestId('pots-table')).toBeNull();
    expect(screen.getByTestId('pot-card-1')).toHaveTextContent('Card: Moon jar');
    expect(screen.getByTestId('pot-card-2')).toHaveTextContent('Card: Tea bowl');
  });

  it('renders the same rows as a table with sortable headers from 768 px', () => {
    setWidth(1024);
    render(<Pots />);

    expect(screen.getByTestId('pots-table')).toBeTruthy();
    expect(screen.queryByTestId('pots-cards')).toBeNull();
    expect(screen.getByTestId('pot-row-1')).toHaveTextContent('Moon jar180000');
    expect(screen.getByTestId('pot-row-2')).toHaveTextContent('Tea bowl9500');
    expect(screen.getByTestId('sort-title')).toHaveTextContent('Title↑');
  });

  it('writes every column heading in the same type, sortable or not', () => {
    setWidth(1024);
    render(<Pots />);

    const typeOf = (text: string) => {
      const { fontFamily, fontSize, lineHeight, color } = StyleSheet.flatten(
        screen.getByText(text).props.style,
      );
      return { fontFamily, fontSize, lineHeight, color };
    };
    expect(typeOf('Photo')).toEqual(typeOf('Title'));
    expect(typeOf('Photo').fontFamily).toEqual(expect.any(String));
  });

  it('asks for the other direction, or another column, when a header is pressed', () => {
    setWidth(1024);
    render(<Pots />);

    fireEvent.press(screen.getByTestId('sort-title'));
    expect(sortChanges.at(-1)).toEqual([{ id: 'title', desc: true }]);
    expect(screen.getByTestId('sort-title')).toHaveTextContent('Title↓');

    fireEvent.press(screen.getByTestId('sort-price'));
    expect(sortChanges.at(-1)?.[0]?.id).toBe('price');
  });

  it('switches between the two when the window is resized', () => {
    setWidth(1024);
    render(<Pots />);
    expect(screen.getByTestId('pots-table')).toBeTruthy();

    setWidth(390);
    expect(screen.getByTestId('pots-cards')).toBeTruthy();
    expect(screen.queryByTestId('pots-table')).toBeNull();
  });
});
