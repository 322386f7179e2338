import Papa from 'papaparse';

import { splitSale, toDecimalString } from '@/shared/money';
import { type Money } from '@/shared/schemas/money';

import { type Scope } from '../access/viewer';
import { termsOf } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { getStatement, listStatements } from '../statements/statements.service';
import { listAccountPayments, listAccountSales } from './year.repository';

// papaparse's own `true` tests /^[=+\-@\t\r].*$/, which a cell with a line break escapes.
const csvOptions = { escapeFormulae: /^[=+\-@\t\r]/, newline: '\r\n' } as const;

/** The byte-order mark tells spreadsheet programs the file is UTF-8. */
const csv = (header: string[], rows: (string | number | null)[][]) =>
  `\ufeff${Papa.unparse([header, ...rows.map((r) => r.map((c) => c ?? ''))], csvOptions)}\r\n`;

const amount = (m: Money) => toDecimalString(m);

/** A year's sales for the maker's accountant: one row a sale, amounts in major units. */
export async function salesCsv(db: Db, scope: Scope, year: number): Promise<string> {
  const rows = await listAccountSales(db, scope, `${year}-01-01`, `${year}-12-31`);
  return csv(
    [
      'Sold on',
      'Consignment',
      'Venue',
      'Stock number',
      'Title',
      'Currency',
      'List price',
      'Price paid',
      'Discount reason',
      'Commission',
      'VAT on commission',
      "Maker's share",
      'Output VAT',
      'VAT to reclaim',
      'Statement',
    ],
    rows.map((r) => {
      const list = { amount: r.list_price, currency: r.currency };
      const price = { amount: r.sale_price!, currency: r.currency };
      const split = splitSale(termsOf(r), list, price);
      return [
        r.sold_on,
        r.reference,
        r.venue_name,
        r.stock_number,
        r.title,
        r.currency,
        amount(list),
        amount(price),
        r.discount_reason,
        amount(split.commission),
        amount(split.vatOnCommission),
        amount(split.makerShare),
        amount(split.makerOutputVat),
        amount(split.makerReclaimableVat),
        r.statement_reference,
      ];
    }),
  );
}

/** A year's payments received, one row each. */
export async function paymentsCsv(db: Db, scope: Scope, year: number): Promise<string> {
  const rows = await listAccountPayments(db, scope, `${year}-01-01`, `${year}-12-31`);
  return csv(
    ['Received on', 'Statement', 'Venue', 'Method', 'Reference', 'Currency', 'Amount'],
    rows.map((r) => [
      r.received_on,
      r.statement_reference,
      r.venue_name,
      r.method,
      r.reference,
      r.currency,
      amount({ amount: r.amount, currency: r.currency }),
    ]),
  );
}

/** The statements issued in a year, with their totals, what was paid and the balance. */
export async function statementsCsv(db: Db, scope: Scope, year: number): Promise<string> {
  const { items } = await listStatements(db, scope);
  const issued = items.filter((s) => s.issuedAt?.startsWith(String(year)));
  const rows = [];
  for (const item of issued) {
    const s = await getStatement(db, scope, item.id);
    rows.push([
      s.reference,
      s.venue.name,
      s.consignment?.reference ?? null,
      s.periodStart,
      s.periodEnd,
      s.state,
      s.issuedAt?.slice(0, 10) ?? null,
      s.dueDate,
      s.currency,
      amount(s.totals.sales),
      amount(s.totals.commission),
      amount(s.totals.vatOnCommission),
      amount(s.totals.makerShare),
      amount(s.paid),
      amount(s.balance),
    ]);
  }
  return csv(
    [
      'Statement',
      'Venue',
      'Consignment',
      'From',
      'To',
      'State',
      'Issued on',
      'Due by',
      'Currency',
      'Sales',
      'Commission',
      'VAT on commission',
      "Maker's share",
      'Paid',
      'Balance',
    ],
    rows,
  );
}
