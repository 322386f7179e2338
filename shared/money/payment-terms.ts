import { type PaymentTerms } from '../schemas/terms';
import { addDays, endOfMonth, type IsoDate } from './calendar';
import { MoneyRuleError } from './errors';

/**
 * When a sale must be paid for under the payment terms: a number of days from the sale, from the
 * end of the month of sale, or from the show's closing (docs/money-rules.md; common practice:
 * commonly 30 days from the month end, exhibitions after the show closes).
 */
export function paymentDueDate(
  paymentTerms: PaymentTerms,
  dates: { saleDate: IsoDate; closingDate?: IsoDate | null },
): IsoDate {
  if (paymentTerms.from === 'sale') return addDays(dates.saleDate, paymentTerms.days);
  if (paymentTerms.from === 'month-end') {
    return addDays(endOfMonth(dates.saleDate), paymentTerms.days);
  }
  if (dates.closingDate === undefined || dates.closingDate === null) {
    throw new MoneyRuleError(
      'closing-date-required',
      'These terms count payment from the show’s closing: enter the closing date.',
    );
  }
  return addDays(dates.closingDate, paymentTerms.days);
}
