import { type Money } from '../schemas/money';
import { type Terms } from '../schemas/terms';
import { assertAmount, assertCurrency } from './amounts';
import { MoneyRuleError } from './errors';
import { applyRate } from './rounding';
import { vatInGross } from './vat';

// Bound once: compiled to CommonJS (tsx, jest) every call through an import is a property
// getter, which costs more than the integer arithmetic on this per-line path.
const rateOf = applyRate;
const vatInside = vatInGross;

/**
 * A line's insurance value by the terms' basis (docs/money-rules.md; common practice, "no less
 * than the agreed sale price less the venue's commission, excluding VAT"). `maker-net` is L − C at
 * S = L and `retail` is L, with no VAT in either; `agreed` is the value the terms record.
 */
export function insuranceValue(terms: Terms, listPrice: Money): Money {
  assertCurrency(listPrice, terms.currency);
  assertAmount(listPrice.amount);
  const listNet = terms.makerVatRegistered
    ? listPrice.amount - vatInGross(listPrice.amount, terms.vatRateBp)
    : listPrice.amount;
  return { amount: insuranceAmount(terms, listNet), currency: terms.currency };
}

/** The insurance amount from the list price without the maker's VAT (shared with the split). */
export function insuranceAmount(terms: Terms, listNet: number): number {
  if (terms.insuranceBasis === 'retail') return listNet;
  if (terms.insuranceBasis === 'agreed') {
    const agreed = terms.agreedInsuranceValue;
    if (agreed === undefined) {
      throw new MoneyRuleError('missing-agreed-value', 'Enter the agreed insurance value.');
    }
    assertCurrency(agreed, terms.currency);
    return agreed.amount;
  }
  // At S = L every discount rule charges r·L; the VAT inside an `included` commission is not
  // commission the maker gives up, so it stays in the insured value.
  const commission = rateOf(listNet, terms.commissionRateBp);
  const commissionVat =
    terms.commissionVat === 'included' ? vatInside(commission, terms.vatRateBp) : 0;
  return listNet - (commission - commissionVat);
}
