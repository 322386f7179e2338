import { MAX_MONEY_AMOUNT, type Money } from '../schemas/money';
import { type SaleSplit, type Terms } from '../schemas/terms';
import { MoneyRuleError } from './errors';
import { insuranceAmount } from './insurance';
import { applyRate, BASIS_POINTS } from './rounding';
import { vatInGross, vatOnNet } from './vat';

// Bound once: compiled to CommonJS (tsx, jest) every call through an import is a property
// getter, which costs more than the integer arithmetic on this per-line path.
const rateOf = applyRate;
const vatInside = vatInGross;
const vatOnTop = vatOnNet;
const insured = insuranceAmount;
const MAX_AMOUNT = MAX_MONEY_AMOUNT;
const BP = BASIS_POINTS;

/**
 * Splits one sale (docs/money-rules.md, "One sale"). Commission on the price without the
 * maker's VAT: `shared` r·S, `venue` max(0, r·L − (L − S)), `maker` r·L; VAT on commission
 * `added` v·C or `included` C·v/(1+v); a registered maker's output VAT is the VAT fraction of S.
 * Each is rounded half-up per line (HMRC VATREC12030) and the maker's share is what is left, so
 * commission (+ VAT when added) + maker's share is exactly the price paid. Refuses a split that
 * would leave the maker a negative share (MoneyRuleError `negative-maker-share`).
 */
export function splitSale(terms: Terms, listPrice: Money, salePrice: Money): SaleSplit {
  const split = trySplitSale(terms, listPrice, salePrice);
  if (split === null) throw negativeShareError(terms);
  return split;
}

/** As `splitSale`, but answers null where the rules would leave the maker a negative share. */
export function trySplitSale(terms: Terms, listPrice: Money, salePrice: Money): SaleSplit | null {
  const currency = terms.currency;
  const list = listPrice.amount;
  const sale = salePrice.amount;
  checkInputs(terms, listPrice, salePrice);
  const rate = terms.commissionRateBp;
  const vatRate = terms.vatRateBp;
  const registered = terms.makerVatRegistered;

  const outputVat = registered ? vatInside(sale, vatRate) : 0;
  const saleNet = sale - outputVat;
  const listNet = registered ? list - vatInside(list, vatRate) : list;

  let commission: number;
  if (terms.discountRule === 'shared') commission = rateOf(saleNet, rate);
  else if (terms.discountRule === 'venue') {
    commission = Math.max(0, rateOf(listNet, rate) - (listNet - saleNet));
  } else commission = rateOf(listNet, rate);

  let vat = 0;
  let venueKeeps = commission;
  if (terms.commissionVat === 'added') {
    vat = vatOnTop(commission, vatRate);
    venueKeeps = commission + vat;
  } else if (terms.commissionVat === 'included') {
    vat = vatInside(commission, vatRate);
  }
  const makerShare = sale - venueKeeps;
  if (makerShare < 0) return null;

  return {
    commission: { amount: commission, currency },
    vatOnCommission: { amount: vat, currency },
    makerShare: { amount: makerShare, currency },
    makerOutputVat: { amount: outputVat, currency },
    makerReclaimableVat: { amount: registered ? vat : 0, currency },
    insuranceValue: { amount: insured(terms, listNet), currency },
  };
}

/**
 * What the venue keeps of the price paid: the commission, plus its VAT when the VAT is added on
 * top (with `included` the VAT is already inside the commission).
 */
export function venueKeeps(terms: Terms, split: SaleSplit): Money {
  const extra = terms.commissionVat === 'added' ? split.vatOnCommission.amount : 0;
  return { amount: split.commission.amount + extra, currency: split.commission.currency };
}

/**
 * What the maker nets after settling VAT: the share received, less the output VAT owed, plus the
 * VAT on commission reclaimed (worked settlement, both registered: £300 − £100 + £50 = £250).
 */
export function makerNet(split: SaleSplit): Money {
  const amount =
    split.makerShare.amount - split.makerOutputVat.amount + split.makerReclaimableVat.amount;
  return { amount, currency: split.makerShare.currency };
}

function checkInputs(terms: Terms, listPrice: Money, salePrice: Money): void {
  const { amount: list } = listPrice;
  const { amount: sale } = salePrice;
  if (listPrice.currency !== terms.currency || salePrice.currency !== terms.currency) {
    throw new MoneyRuleError(
      'currency-mismatch',
      `Enter the list and sale prices in ${terms.currency}, the terms’ currency.`,
    );
  }
  if (!isPrice(list) || !isPrice(sale)) {
    throw new MoneyRuleError(
      'invalid-amount',
      'Enter prices as whole numbers of minor units, not below zero.',
    );
  }
  if (sale > list) {
    throw new MoneyRuleError('sale-above-list', 'The sale price cannot be above the list price.');
  }
  if (!isRate(terms.commissionRateBp) || !isRate(terms.vatRateBp)) {
    throw new MoneyRuleError('invalid-rate', 'Rates must be whole basis points from 0 to 10000.');
  }
}

function isPrice(amount: number): boolean {
  return Number.isSafeInteger(amount) && amount >= 0 && amount <= MAX_AMOUNT;
}

function isRate(rateBp: number): boolean {
  return Number.isInteger(rateBp) && rateBp >= 0 && rateBp <= BP;
}

function negativeShareError(terms: Terms): MoneyRuleError {
  const message =
    terms.discountRule === 'maker'
      ? 'With the maker bearing the discount, the commission on the list price would be more ' +
        'than this sale brings in. Record a smaller discount or agree another discount rule.'
      : 'The commission and its VAT would come to more than the sale price, leaving the maker ' +
        'a negative share. Check the commission and VAT rates in the terms.';
  return new MoneyRuleError('negative-maker-share', message);
}
