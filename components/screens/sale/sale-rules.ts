import { formatDate } from '@/components/ui/format';
import { formatMoney } from '@/shared/money/format';
import { type Money } from '@/shared/schemas/money';

/**
 * The days a sale or a return may carry: from the day the piece was sent to today in the
 * studio's time zone. The server checks the same again; these say it beside the field first.
 */
export type DateWindow = { dispatchDate: string | null; today: string };

export function dateProblem(date: string, { dispatchDate, today }: DateWindow): string | null {
  if (dispatchDate && date < dispatchDate) {
    return `The date cannot come before the piece was sent, on ${formatDate(dispatchDate)}.`;
  }
  if (date > today) return `The date cannot be after today, ${formatDate(today)}.`;
  return null;
}

/** A price paid above the list price is refused: a sale is at the list price or less. */
export function priceProblem(price: Money, listPrice: Money): string | null {
  return price.amount > listPrice.amount
    ? `The price paid cannot be above the list price, ${formatMoney(listPrice)}.`
    : null;
}
