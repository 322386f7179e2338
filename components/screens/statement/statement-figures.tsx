import { StyleSheet, View } from 'react-native';

import { Caution } from '@/components/ui/caution';
import { type FigureColumn, FigureTable } from '@/components/ui/figure-table';
import { formatDate } from '@/components/ui/format';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Statement } from '@/shared/schemas/statement';

type LineKey = 'piece' | 'soldOn' | 'price' | 'commission' | 'vat' | 'share';

function lineColumns(vat: boolean): FigureColumn<LineKey>[] {
  return [
    { key: 'piece', header: 'Piece', flex: 2.4 },
    { key: 'soldOn', header: 'Sold', flex: 1.1 },
    { key: 'price', header: 'Price paid', figure: true },
    { key: 'commission', header: 'Commission', figure: true },
    ...(vat ? [{ key: 'vat' as const, header: 'VAT on commission', figure: true }] : []),
    { key: 'share', header: 'To the maker', figure: true },
  ];
}

/** The statement's sales, one a line, and their totals: every figure as the server gave it. */
export function StatementLines({ statement }: { statement: Statement }) {
  const s = statement;
  const vat = s.totals.vatOnCommission.amount !== 0;
  const several = new Set(s.lines.map((l) => l.consignmentId)).size > 1;
  if (s.lines.length === 0) {
    return <Text testID="statement-no-lines">No sales are left for this statement to cover.</Text>;
  }
  return (
    <FigureTable
      label={`Sales on ${s.reference}`}
      testID="statement-lines"
      columns={lineColumns(vat)}
      rows={s.lines.map((l) => ({
        key: String(l.lineId),
        testID: `statement-line-${l.lineId}`,
        cells: {
          piece: `${l.stockNumber} ${l.title}${several ? ` (${l.consignmentReference})` : ''}`,
          soldOn: formatDate(l.soldOn),
          price: formatMoney(l.salePrice),
          commission: formatMoney(l.commission),
          vat: formatMoney(l.vatOnCommission),
          share: formatMoney(l.makerShare),
        },
      }))}
      total={{
        key: 'total',
        testID: 'statement-total',
        cells: {
          piece: `Total, ${s.lines.length} ${s.lines.length === 1 ? 'sale' : 'sales'}`,
          soldOn: '',
          price: formatMoney(s.totals.sales),
          commission: formatMoney(s.totals.commission),
          vat: formatMoney(s.totals.vatOnCommission),
          share: formatMoney(s.totals.makerShare),
        },
      }}
    />
  );
}

/**
 * For a VAT-registered maker: the output VAT owed on the sales and the VAT on the commission that
 * can be reclaimed, as guidance.
 */
export function StatementVat({ statement }: { statement: Statement }) {
  if (!statement.terms.makerVatRegistered) return null;
  const { makerOutputVat, makerReclaimableVat } = statement.totals;
  return (
    <View style={styles.vat} testID="statement-vat">
      <Heading level={3}>VAT</Heading>
      <FigureTable
        label="VAT on these sales"
        testID="statement-vat-table"
        columns={[
          { key: 'what', header: 'VAT', flex: 2.5 },
          { key: 'amount', header: 'Amount', figure: true },
        ]}
        rows={[
          {
            key: 'output',
            cells: { what: 'Output VAT in the prices paid', amount: formatMoney(makerOutputVat) },
          },
          {
            key: 'reclaim',
            cells: {
              what: 'VAT on the commission, to reclaim',
              amount: formatMoney(makerReclaimableVat),
            },
          },
        ]}
      />
      <Caution title="Guidance only" testID="statement-vat-caution">
        These VAT figures are guidance: check them with HMRC or an accountant before you file a
        return.
      </Caution>
    </View>
  );
}

/** Which dates the statement covers and when the money is due. */
export function statementDates(s: Statement): string {
  const parts = [
    `Sales from ${formatDate(s.periodStart)} to ${formatDate(s.periodEnd)}.`,
    s.issuedAt ? `Issued on ${formatDate(s.issuedAt.slice(0, 10))}.` : 'Not issued yet.',
    s.dueDate ? `Due by ${formatDate(s.dueDate)}.` : null,
  ];
  return parts.filter(Boolean).join(' ');
}

const styles = StyleSheet.create({
  vat: { gap: spacing.sm },
});
