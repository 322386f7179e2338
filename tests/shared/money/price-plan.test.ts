import * as fc from 'fast-check';

import {
  makerNet,
  money,
  netsAcrossVenues,
  planListPrice,
  quotePricePlan,
  splitSale,
} from '@/shared/money';
import { defaultTerms, type Terms } from '@/shared/schemas/terms';

import { amountArb, currencyArb, RUNS, termsArb } from './arbitraries';

const gbp = (pounds: number) => money(pounds * 100, 'GBP');
const terms = (changes: Partial<Terms>): Terms => ({ ...defaultTerms, ...changes });

describe('planListPrice (docs/money-rules.md, price planning)', () => {
  it('40% commission: a wanted net of £60 needs a list price of £100', () => {
    expect(planListPrice(terms({}), gbp(60), gbp(1))).toEqual(gbp(100));
  });

  it('40% + VAT added: a wanted net of £52 needs £100 (worked settlement, first row)', () => {
    expect(planListPrice(terms({ commissionVat: 'added' }), gbp(52), gbp(5))).toEqual(gbp(100));
  });

  it('both registered, 50% + VAT: a wanted net of £250 needs £600 (worked settlement, third row)', () => {
    const both = terms({
      commissionRateBp: 5000,
      commissionVat: 'added',
      makerVatRegistered: true,
    });
    expect(planListPrice(both, gbp(250), gbp(10))).toEqual(gbp(600));
  });

  it('rounds up to the price step: £61 at 40% needs £101.66 (£40.66 commission), so £105 in £5 steps', () => {
    expect(planListPrice(terms({}), gbp(61), gbp(5))).toEqual(gbp(105));
    expect(planListPrice(terms({}), gbp(61), money(1, 'GBP'))).toEqual(money(10166, 'GBP'));
  });

  it('refuses a net no price can reach, such as any net at 100% commission', () => {
    expect(() => planListPrice(terms({ commissionRateBp: 10000 }), gbp(1), gbp(1))).toThrow(
      expect.objectContaining({ code: 'net-unreachable' }),
    );
  });

  it('quotePricePlan answers the price and the split of a sale at it', () => {
    const plan = quotePricePlan({ terms: terms({}), wantedNet: gbp(60), step: gbp(5) });
    expect(plan.listPrice).toEqual(gbp(100));
    expect(plan.split.makerShare).toEqual(gbp(60));
  });

  it('a planned price, split again, nets at least the wanted net; one step less does not', () => {
    const planArb = currencyArb.chain((currency) =>
      fc.record({
        terms: termsArb(currency).filter((t) => t.commissionRateBp < 9000),
        wanted: amountArb.map((amount) => Math.min(Math.max(amount, 1), 5_000_000_000)),
        step: fc.oneof(fc.constantFrom(1, 100, 500, 1000), fc.integer({ min: 1, max: 100_000 })),
      }),
    );
    fc.assert(
      fc.property(planArb, ({ terms: planTerms, wanted, step }) => {
        const currency = planTerms.currency;
        const wantedNet = money(wanted, currency);
        let listPrice;
        try {
          listPrice = planListPrice(planTerms, wantedNet, money(step, currency));
        } catch (error) {
          // Only terms whose net share is tiny cannot reach a large net within the limit.
          expect(error).toMatchObject({ code: 'net-unreachable' });
          return;
        }
        expect(listPrice.amount % step).toBe(0);
        const net = makerNet(splitSale(planTerms, listPrice, listPrice)).amount;
        expect(net).toBeGreaterThanOrEqual(wanted);
        const lower = money(listPrice.amount - step, currency);
        if (lower.amount >= 0) {
          const split = splitSale(planTerms, lower, lower);
          expect(makerNet(split).amount).toBeLessThan(wanted);
        }
      }),
      RUNS,
    );
  });
});

describe('netsAcrossVenues (docs/money-rules.md: the same list price side by side)', () => {
  it('shows what the maker nets at each venue for one list price', () => {
    const shop = terms({});
    const gallery = terms({ commissionRateBp: 5000, commissionVat: 'added' });
    const rows = netsAcrossVenues(gbp(100), [
      { venueId: 1, terms: shop },
      { venueId: 2, terms: gallery },
    ]);
    expect(rows.map((row) => [row.venueId, row.net.amount])).toEqual([
      [1, 6000],
      [2, 4000],
    ]);
  });
});
