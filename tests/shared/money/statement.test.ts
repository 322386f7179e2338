import * as fc from 'fast-check';

import {
  buildStatement,
  money,
  paymentDueDate,
  splitSale,
  type StatementLineInput,
} from '@/shared/money';
import { defaultTerms, type Terms } from '@/shared/schemas/terms';

import { RUNS, termsArb } from './arbitraries';

const gbp = (pence: number) => money(pence, 'GBP');
const sold = (id: number, date: string, list: number, price = list): StatementLineInput => ({
  id,
  listPrice: gbp(list),
  sale: { date, price: gbp(price) },
});

describe('paymentDueDate (docs/money-rules.md; common practice: payment terms)', () => {
  it('30 days from the end of the month of sale: a sale on 15 Oct is due on 30 Nov', () => {
    expect(paymentDueDate({ days: 30, from: 'month-end' }, { saleDate: '2024-10-15' })).toBe(
      '2024-11-30',
    );
  });

  it('days from the sale, and from the show’s closing for exhibitions', () => {
    expect(paymentDueDate({ days: 14, from: 'sale' }, { saleDate: '2024-12-25' })).toBe(
      '2025-01-08',
    );
    const closing = { saleDate: '2024-05-02', closingDate: '2024-05-31' };
    expect(paymentDueDate({ days: 30, from: 'closing' }, closing)).toBe('2024-06-30');
    expect(() => paymentDueDate({ days: 30, from: 'closing' }, { saleDate: '2024-05-02' })).toThrow(
      expect.objectContaining({ code: 'closing-date-required' }),
    );
  });
});

describe('buildStatement', () => {
  const terms: Terms = { ...defaultTerms, commissionVat: 'added' };
  const statement = buildStatement({
    terms,
    period: { from: '2024-10-01', to: '2024-10-31' },
    lines: [
      sold(3, '2024-10-20', 10000, 9000),
      sold(1, '2024-10-02', 10000),
      sold(2, '2024-09-28', 5000), // before the period: in the opening balance
      sold(4, '2024-11-01', 7000), // after the period: not on this statement
      { id: 5, listPrice: gbp(20000), sale: null }, // unsold
    ],
    payments: [
      { id: 1, date: '2024-09-30', amount: gbp(2000) }, // before the period: in the opening balance
      { id: 2, date: '2024-10-25', amount: gbp(5200) },
      { id: 3, date: '2024-11-02', amount: gbp(100) },
    ],
  });

  it('lists the period’s sales in date order with their splits and due dates', () => {
    expect(statement.lines.map((line) => [line.id, line.saleDate, line.dueDate])).toEqual([
      [1, '2024-10-02', '2024-11-30'],
      [3, '2024-10-20', '2024-11-30'],
    ]);
    expect(statement.lines[0]?.split).toEqual(splitSale(terms, gbp(10000), gbp(10000)));
  });

  it('totals the splits: £100 and £90 sales at 40% + VAT (worked-settlement rule)', () => {
    expect(statement.totals).toEqual({
      sales: gbp(19000),
      commission: gbp(7600),
      vatOnCommission: gbp(1520),
      makerShare: gbp(9880),
      makerOutputVat: gbp(0),
      makerReclaimableVat: gbp(0),
    });
  });

  it('carries earlier sales and payments as the opening balance, and the balance due', () => {
    expect(statement.openingBalance).toEqual(gbp(2600 - 2000));
    expect(statement.payments.map((p) => p.id)).toEqual([2]);
    expect(statement.paymentsTotal).toEqual(gbp(5200));
    expect(statement.balanceDue).toEqual(gbp(600 + 9880 - 5200));
    expect(statement.dueDate).toBe('2024-11-30');
  });

  it('totals equal the sum of the lines, and the balance the shares less payments', () => {
    const lineArb = fc.record({
      day: fc.integer({ min: 1, max: 28 }),
      // From £1: on a penny, VAT never rounded to nil can outweigh the price itself.
      list: fc.integer({ min: 100, max: 10_000_000 }),
      discountBp: fc.integer({ min: 0, max: 3000 }),
    });
    // Terms that can never leave a negative share, so every line is on the statement.
    const termsGbp = termsArb('GBP').filter(
      (t) => t.commissionRateBp <= 6000 && t.vatRateBp <= 2500 && t.discountRule !== 'maker',
    );
    fc.assert(
      fc.property(termsGbp, fc.array(lineArb, { maxLength: 20 }), (anyTerms, specs) => {
        const lines = specs.map((s, id) =>
          sold(
            id,
            `2024-02-${String(s.day).padStart(2, '0')}`,
            s.list,
            s.list - Math.floor((s.list * s.discountBp) / 10000),
          ),
        );
        const result = buildStatement({
          terms: anyTerms,
          period: { from: '2024-02-01', to: '2024-02-29' },
          lines,
          payments: [{ id: 1, date: '2024-02-29', amount: gbp(100) }],
          closingDate: '2024-03-10',
        });
        const sum = (pick: (l: (typeof result.lines)[number]) => number) =>
          result.lines.reduce((total, line) => total + pick(line), 0);
        expect(result.lines).toHaveLength(specs.length);
        expect(result.totals.makerShare.amount).toBe(sum((l) => l.split.makerShare.amount));
        expect(result.totals.commission.amount).toBe(sum((l) => l.split.commission.amount));
        expect(result.totals.sales.amount).toBe(sum((l) => l.salePrice.amount));
        expect(result.balanceDue.amount).toBe(result.totals.makerShare.amount - 100);
      }),
      RUNS,
    );
  });

  it('refuses a sale or payment dated on a day that does not exist, however many share its month', () => {
    const october = { terms, period: { from: '2024-10-01', to: '2024-10-31' } };
    const invalid = (date: string) =>
      expect.objectContaining({
        code: 'invalid-date',
        message: `“${date}” is not a date written as YYYY-MM-DD.`,
      });
    const lines = [sold(1, '2024-10-02', 100), sold(2, '2024-10-02', 100)];
    expect(() =>
      buildStatement({ ...october, lines: [...lines, sold(3, '2024-09-31', 100)], payments: [] }),
    ).toThrow(invalid('2024-09-31'));
    expect(() =>
      buildStatement({
        ...october,
        lines,
        payments: [{ id: 1, date: '2024-10-2', amount: gbp(100) }],
      }),
    ).toThrow(invalid('2024-10-2'));
  });

  it('refuses payment terms from the closing without a closing date', () => {
    const closingTerms: Terms = { ...terms, paymentTerms: { days: 30, from: 'closing' } };
    expect(() =>
      buildStatement({
        terms: closingTerms,
        period: { from: '2024-10-01', to: '2024-10-31' },
        lines: [sold(1, '2024-10-02', 100)],
        payments: [],
      }),
    ).toThrow(expect.objectContaining({ code: 'closing-date-required' }));
  });
});
