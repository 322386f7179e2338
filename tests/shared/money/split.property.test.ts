import * as fc from 'fast-check';

import { insuranceValue, MoneyRuleError, splitSale, trySplitSale } from '@/shared/money';

import { rateArb, RUNS, saleArb } from './arbitraries';
import { referenceSplit } from './reference-split';

/** Property tests of the split rules in docs/money-rules.md over every terms combination and currency. */
describe('splitSale properties', () => {
  it('commission (+ VAT when added) + maker share is exactly the price paid, or it is refused', () => {
    fc.assert(
      fc.property(saleArb, ({ terms, listPrice, salePrice }) => {
        const split = trySplitSale(terms, listPrice, salePrice);
        if (split === null) {
          expect(() => splitSale(terms, listPrice, salePrice)).toThrow(MoneyRuleError);
          return;
        }
        const added = terms.commissionVat === 'added' ? split.vatOnCommission.amount : 0;
        expect(split.commission.amount + added + split.makerShare.amount).toBe(salePrice.amount);
      }),
      RUNS,
    );
  });

  it('no part is negative, every part is a whole minor unit in the terms’ currency', () => {
    fc.assert(
      fc.property(saleArb, ({ terms, listPrice, salePrice }) => {
        const split = trySplitSale(terms, listPrice, salePrice);
        if (split === null) return;
        for (const part of Object.values(split)) {
          expect(Number.isSafeInteger(part.amount) && part.amount >= 0).toBe(true);
          expect(part.currency).toBe(terms.currency);
        }
        expect(split.makerOutputVat.amount).toBeLessThanOrEqual(salePrice.amount);
        if (terms.commissionVat === 'included') {
          expect(split.vatOnCommission.amount).toBeLessThanOrEqual(split.commission.amount);
        }
      }),
      RUNS,
    );
  });

  it('agrees, part for part, with an independent BigInt restatement of the rules', () => {
    fc.assert(
      fc.property(saleArb, ({ terms, listPrice, salePrice }) => {
        const split = trySplitSale(terms, listPrice, salePrice);
        const reference = referenceSplit(terms, listPrice.amount, salePrice.amount);
        if (reference === null) {
          expect(split).toBeNull();
          return;
        }
        expect(split).toEqual({
          commission: { amount: reference.commission, currency: terms.currency },
          vatOnCommission: { amount: reference.vatOnCommission, currency: terms.currency },
          makerShare: { amount: reference.makerShare, currency: terms.currency },
          makerOutputVat: { amount: reference.makerOutputVat, currency: terms.currency },
          makerReclaimableVat: { amount: reference.makerReclaimableVat, currency: terms.currency },
          insuranceValue: insuranceValue(terms, listPrice),
        });
      }),
      RUNS,
    );
  });

  it('commission grows with the rate, and a higher rate is refused whenever a lower one is', () => {
    fc.assert(
      fc.property(saleArb, rateArb, rateArb, ({ terms, listPrice, salePrice }, a, b) => {
        const [low, high] = a <= b ? [a, b] : [b, a];
        const atLow = trySplitSale({ ...terms, commissionRateBp: low }, listPrice, salePrice);
        const atHigh = trySplitSale({ ...terms, commissionRateBp: high }, listPrice, salePrice);
        if (atLow === null) {
          expect(atHigh).toBeNull();
          return;
        }
        if (atHigh === null) return;
        expect(atHigh.commission.amount).toBeGreaterThanOrEqual(atLow.commission.amount);
        expect(atHigh.makerShare.amount).toBeLessThanOrEqual(atLow.makerShare.amount);
      }),
      RUNS,
    );
  });
});
