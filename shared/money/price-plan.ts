import { MAX_MONEY_AMOUNT, type Money } from '../schemas/money';
import { type SaleSplit, type Terms } from '../schemas/terms';
import { assertAmount, assertCurrency } from './amounts';
import { MoneyRuleError } from './errors';
import { makerNet, splitSale, trySplitSale } from './split';

/**
 * Price planning (docs/money-rules.md): the lowest list price, a multiple of the price step, at which a sale
 * at that price nets the maker at least `wantedNet` (after VAT, as `makerNet`). Rounding makes the
 * net rise unevenly with the price, so the search checks the step below its answer too.
 */
export function planListPrice(terms: Terms, wantedNet: Money, step: Money): Money {
  assertCurrency(wantedNet, terms.currency);
  assertCurrency(step, terms.currency);
  assertAmount(wantedNet.amount);
  assertAmount(step.amount, 1);
  const wanted = wantedNet.amount;
  const size = step.amount;
  const maxSteps = Math.floor(MAX_MONEY_AMOUNT / size);
  const nets = (steps: number) => netAt(terms, steps * size) >= wanted;
  if (wanted === 0) return { amount: 0, currency: terms.currency };

  let high = 1;
  while (!nets(high)) {
    if (high === maxSteps) throw unreachable();
    high = Math.min(high * 2, maxSteps);
  }
  let low = Math.floor(high / 2);
  while (high - low > 1) {
    const middle = Math.floor((low + high) / 2);
    if (nets(middle)) high = middle;
    else low = middle;
  }
  while (high > 1 && nets(high - 1)) high -= 1;
  return { amount: high * size, currency: terms.currency };
}

export interface VenueTerms {
  venueId: number;
  terms: Terms;
}

export interface VenueNet {
  venueId: number;
  split: SaleSplit;
  net: Money;
}

/**
 * One list price across several venues side by side: each venue's split of a sale at that price
 * and what the maker nets there (docs/money-rules.md, price planning).
 */
export function netsAcrossVenues(listPrice: Money, venues: readonly VenueTerms[]): VenueNet[] {
  return venues.map(({ venueId, terms }) => {
    const split = splitSale(terms, listPrice, listPrice);
    return { venueId, split, net: makerNet(split) };
  });
}

function netAt(terms: Terms, amount: number): number {
  const price = { amount, currency: terms.currency };
  const split = trySplitSale(terms, price, price);
  return split === null ? -Infinity : makerNet(split).amount;
}

function unreachable(): MoneyRuleError {
  return new MoneyRuleError(
    'net-unreachable',
    'Under these terms no list price the product handles nets the maker that much.',
  );
}
