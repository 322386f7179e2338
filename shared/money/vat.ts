import { type Money } from '../schemas/money';
import { assertAmount } from './amounts';
import { parseIsoDate } from './calendar';
import { BASIS_POINTS, divideHalfUp, safeProduct } from './rounding';

// Bound once: compiled to CommonJS (tsx, jest) every call through an import is a property
// getter, which costs more than the integer arithmetic on this per-line path.
const divide = divideHalfUp;
const product = safeProduct;
const BP = BASIS_POINTS;

/**
 * VAT on a net amount, rounded half-up per line (HMRC VATREC12030). When there is VAT to charge,
 * a unit's VAT is never rounded down to nil (VAT Notice 700, 17.5).
 */
export function vatOnNet(net: number, rateBp: number): number {
  const vat = divide(product(net, rateBp), BP);
  return vat === 0 && net > 0 && rateBp > 0 ? 1 : vat;
}

/**
 * The VAT inside a VAT-inclusive amount: the VAT fraction v/(1+v), 1/6 at 20% (HMRC VAT
 * fraction guidance), rounded half-up and never to nil, as `vatOnNet`.
 */
export function vatInGross(gross: number, rateBp: number): number {
  const vat = divide(product(gross, rateBp), BP + rateBp);
  return vat === 0 && gross > 0 && rateBp > 0 ? 1 : vat;
}

/** The VAT fraction of a rate in lowest terms: 1/6 at 20%, 1/21 at 5%, 7/47 at 17.5% (HMRC). */
export function vatFraction(rateBp: number): { numerator: number; denominator: number } {
  const denominator = BASIS_POINTS + rateBp;
  const divisor = greatestCommonDivisor(rateBp, denominator);
  return { numerator: rateBp / divisor, denominator: denominator / divisor };
}

/** A net price with VAT added: £100 + 20% = £120 (HMRC, VAT-exclusive prices). */
export function grossFromNet(net: Money, rateBp: number): Money {
  assertAmount(net.amount);
  return { amount: net.amount + vatOnNet(net.amount, rateBp), currency: net.currency };
}

/** The VAT in a VAT-inclusive price by the VAT fraction: £120 at 20% holds £20 (HMRC). */
export function vatInPrice(gross: Money, rateBp: number): Money {
  assertAmount(gross.amount);
  return { amount: vatInGross(gross.amount, rateBp), currency: gross.currency };
}

/**
 * The UK standard rate in force on a date (HMRC VAT rates): 20% from 4 Jan 2011, 17.5% from
 * 1 Jan 2010, 15% from 1 Dec 2008. Earlier dates are outside the published table held here: null.
 */
export function ukStandardVatRateBp(date: string): number | null {
  parseIsoDate(date);
  if (date >= '2011-01-04') return 2000;
  if (date >= '2010-01-01') return 1750;
  if (date >= '2008-12-01') return 1500;
  return null;
}

function greatestCommonDivisor(a: number, b: number): number {
  return b === 0 ? a : greatestCommonDivisor(b, a % b);
}
