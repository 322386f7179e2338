import { type Money } from '../schemas/money';
import { assertAmount } from './amounts';
import { MoneyRuleError } from './errors';
import { BASIS_POINTS, divideHalfUp, safeProduct } from './rounding';
import { vatInGross } from './vat';

export interface MarkUp {
  retailPrice: Money;
  /** What the venue keeps: its commission and, when it charges VAT, the VAT on it. */
  venueKeeps: Money;
  commission: Money;
  vatOnCommission: Money;
  makerShare: Money;
}

/**
 * Mark-up pricing, the venue's side of price planning: retail = the maker's price × the mark-up
 * (in basis points, ×2.2 = 22000), rounded half-up. The venue keeps the difference; when it
 * charges VAT on its commission, that VAT is the VAT fraction of what it keeps (docs/money-rules.md
 * worked settlement: £100 × 2.2 = £220, venue keeps £120 = £100 commission + £20 VAT).
 */
export function markUp(
  makerPrice: Money,
  markUpBp: number,
  commissionVat: { charged: boolean; rateBp: number },
): MarkUp {
  assertAmount(makerPrice.amount);
  if (!Number.isSafeInteger(markUpBp) || markUpBp < BASIS_POINTS) {
    throw new MoneyRuleError(
      'invalid-rate',
      'A mark-up is a whole number of basis points, ×1 or more.',
    );
  }
  const currency = makerPrice.currency;
  const retail = divideHalfUp(safeProduct(makerPrice.amount, markUpBp), BASIS_POINTS);
  assertAmount(retail);
  const keeps = retail - makerPrice.amount;
  const vat = commissionVat.charged ? vatInGross(keeps, commissionVat.rateBp) : 0;
  return {
    retailPrice: { amount: retail, currency },
    venueKeeps: { amount: keeps, currency },
    commission: { amount: keeps - vat, currency },
    vatOnCommission: { amount: vat, currency },
    makerShare: { amount: makerPrice.amount, currency },
  };
}
