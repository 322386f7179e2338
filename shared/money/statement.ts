import { type Money } from '../schemas/money';
import { type SaleSplit, type Terms } from '../schemas/terms';
import { assertCurrency } from './amounts';
import { assertIsoDate, type IsoDate } from './calendar';
import { MoneyRuleError } from './errors';
import { paymentDueDate } from './payment-terms';
import { splitSale } from './split';

export interface StatementLineInput {
  id: number;
  listPrice: Money;
  /** Null while the piece is unsold (out, returned, lost…): it is not on a statement. */
  sale: { date: IsoDate; price: Money } | null;
  /** The line's consignment terms, when they differ from the statement's. */
  terms?: Terms;
}

export interface StatementPayment {
  id: number;
  date: IsoDate;
  amount: Money;
}

export interface StatementInput {
  terms: Terms;
  /** Inclusive. */
  period: { from: IsoDate; to: IsoDate };
  lines: readonly StatementLineInput[];
  payments: readonly StatementPayment[];
  /** The show's closing date, needed when payment is counted from the closing. */
  closingDate?: IsoDate | null;
}

export interface StatementLine {
  id: number;
  saleDate: IsoDate;
  listPrice: Money;
  salePrice: Money;
  split: SaleSplit;
  dueDate: IsoDate;
}

export interface StatementTotals {
  sales: Money;
  commission: Money;
  vatOnCommission: Money;
  makerShare: Money;
  makerOutputVat: Money;
  makerReclaimableVat: Money;
}

export interface Statement {
  currency: string;
  period: { from: IsoDate; to: IsoDate };
  lines: StatementLine[];
  totals: StatementTotals;
  /** Maker's shares of earlier sales less earlier payments. */
  openingBalance: Money;
  payments: StatementPayment[];
  paymentsTotal: Money;
  /** Opening balance + this period's maker's shares − this period's payments. */
  balanceDue: Money;
  /** When the last sale on the statement falls due; null with no sales. */
  dueDate: IsoDate | null;
}

/**
 * A statement of account for a period (docs/money-rules.md; common practice: monthly or end-of-show
 * statements): each sale in the period split by its terms, the totals, the payments received,
 * and the balance carried from earlier sales and payments, with due dates from the payment terms.
 */
export function buildStatement(input: StatementInput): Statement {
  const { terms, period, closingDate } = input;
  const currency = terms.currency;
  assertIsoDate(period.from);
  assertIsoDate(period.to);
  if (period.to < period.from) {
    throw new MoneyRuleError('invalid-date', 'The statement period ends before it starts.');
  }

  // Many sales share a date, and reading a date is the costly part of checking it: once each.
  const checkedDates = new Set<IsoDate>();
  const checkDate = (date: IsoDate) => {
    if (checkedDates.has(date)) return;
    assertIsoDate(date);
    checkedDates.add(date);
  };

  const sums = { sales: 0, commission: 0, vat: 0, share: 0, output: 0, reclaim: 0 };
  let opening = 0;
  const lines: StatementLine[] = [];
  // Many sales share a date: each date's due date under the statement's terms is worked out once.
  const dueDates = new Map<IsoDate, IsoDate>();
  for (const line of input.lines) {
    if (line.sale === null) continue;
    const { date, price } = line.sale;
    checkDate(date);
    if (date > period.to) continue;
    const lineTerms = line.terms ?? terms;
    if (lineTerms.currency !== currency) {
      throw new MoneyRuleError(
        'currency-mismatch',
        `Line ${line.id} is in ${lineTerms.currency}; this statement is in ${currency}.`,
      );
    }
    const split = splitSale(lineTerms, line.listPrice, price);
    if (date < period.from) {
      opening += split.makerShare.amount;
      continue;
    }
    sums.sales += price.amount;
    sums.commission += split.commission.amount;
    sums.vat += split.vatOnCommission.amount;
    sums.share += split.makerShare.amount;
    sums.output += split.makerOutputVat.amount;
    sums.reclaim += split.makerReclaimableVat.amount;
    let dueDate = lineTerms === terms ? dueDates.get(date) : undefined;
    if (dueDate === undefined) {
      dueDate = paymentDueDate(lineTerms.paymentTerms, { saleDate: date, closingDate });
      if (lineTerms === terms) dueDates.set(date, dueDate);
    }
    lines.push({
      id: line.id,
      saleDate: date,
      listPrice: line.listPrice,
      salePrice: price,
      split,
      dueDate,
    });
  }
  lines.sort((a, b) => (a.saleDate < b.saleDate ? -1 : a.saleDate > b.saleDate ? 1 : a.id - b.id));

  let paid = 0;
  const payments: StatementPayment[] = [];
  for (const payment of input.payments) {
    checkDate(payment.date);
    assertCurrency(payment.amount, currency);
    if (payment.date > period.to) continue;
    if (payment.date < period.from) opening -= payment.amount.amount;
    else {
      paid += payment.amount.amount;
      payments.push(payment);
    }
  }
  payments.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : a.id - b.id));

  const of = (amount: number): Money => {
    if (!Number.isSafeInteger(amount)) {
      throw new MoneyRuleError(
        'invalid-amount',
        'That total is too large for the product to handle.',
      );
    }
    return { amount, currency };
  };
  let dueDate: IsoDate | null = null;
  for (const line of lines) if (dueDate === null || line.dueDate > dueDate) dueDate = line.dueDate;
  return {
    currency,
    period: { from: period.from, to: period.to },
    lines,
    totals: {
      sales: of(sums.sales),
      commission: of(sums.commission),
      vatOnCommission: of(sums.vat),
      makerShare: of(sums.share),
      makerOutputVat: of(sums.output),
      makerReclaimableVat: of(sums.reclaim),
    },
    openingBalance: of(opening),
    payments,
    paymentsTotal: of(paid),
    balanceDue: of(opening + sums.share - paid),
    dueDate,
  };
}
