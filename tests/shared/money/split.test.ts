import {
  makerNet,
  money,
  MoneyRuleError,
  splitSale,
  sumMoney,
  trySplitSale,
  venueKeeps,
} from '@/shared/money';
import { defaultTerms, type Terms } from '@/shared/schemas/terms';

const gbp = (pounds: number) => money(pounds * 100, 'GBP');
const terms = (changes: Partial<Terms>): Terms => ({ ...defaultTerms, ...changes });
const amounts = (split: ReturnType<typeof splitSale>) => ({
  commission: split.commission.amount,
  vatOnCommission: split.vatOnCommission.amount,
  makerShare: split.makerShare.amount,
  makerOutputVat: split.makerOutputVat.amount,
  makerReclaimableVat: split.makerReclaimableVat.amount,
});

describe('splitSale: worked examples (docs/money-rules.md, from HMRC VAT rates and fractions)', () => {
  it('maker not registered, venue registered, 40% + VAT added, £100: £40 + £8, maker £52', () => {
    // Rule: VAT on commission `added` V = v·C (docs/money-rules.md); 20% standard rate (HMRC).
    const split = splitSale(terms({ commissionVat: 'added' }), gbp(100), gbp(100));
    expect(amounts(split)).toEqual({
      commission: 4000,
      vatOnCommission: 800,
      makerShare: 5200,
      makerOutputVat: 0,
      makerReclaimableVat: 0,
    });
  });

  it('same, commission quoted VAT-inclusive: £40 of which VAT £6.67 (1/6), maker £60', () => {
    // Rule: `included` V = C·v/(1+v), the VAT fraction 1/6 at 20% (HMRC), 666.67p half-up.
    const split = splitSale(terms({ commissionVat: 'included' }), gbp(100), gbp(100));
    expect(amounts(split)).toEqual({
      commission: 4000,
      vatOnCommission: 667,
      makerShare: 6000,
      makerOutputVat: 0,
      makerReclaimableVat: 0,
    });
  });

  it('both registered, 50% + VAT, £600 with VAT: £250 + £50, maker £300, owes £100, nets £250', () => {
    // Rules: output VAT is the VAT fraction of the price paid; commission on the price without it.
    const both = terms({
      commissionRateBp: 5000,
      commissionVat: 'added',
      makerVatRegistered: true,
    });
    const split = splitSale(both, gbp(600), gbp(600));
    expect(amounts(split)).toEqual({
      commission: 25000,
      vatOnCommission: 5000,
      makerShare: 30000,
      makerOutputVat: 10000,
      makerReclaimableVat: 5000,
    });
    expect(makerNet(split)).toEqual(gbp(250));
    expect(venueKeeps(both, split)).toEqual(gbp(300));
  });

  it('a published total of £75 + £37.50 is £112.50, not the printed £115.50 (the caution row)', () => {
    expect(sumMoney([gbp(75), money(3750, 'GBP')], 'GBP')).toEqual(money(11250, 'GBP'));
  });
});

describe('splitSale: discount rules (docs/money-rules.md formulas), £100 listed, sold at £80, 40%', () => {
  it('shared: commission on the actual price, r·S = £32', () => {
    const split = splitSale(terms({ discountRule: 'shared' }), gbp(100), gbp(80));
    expect([split.commission, split.makerShare]).toEqual([gbp(32), gbp(48)]);
  });

  it('venue: its commission absorbs the discount, max(0, r·L − (L − S)) = £20', () => {
    const split = splitSale(terms({ discountRule: 'venue' }), gbp(100), gbp(80));
    expect([split.commission, split.makerShare]).toEqual([gbp(20), gbp(60)]);
  });

  it('venue: a discount larger than the commission leaves no commission, never a negative one', () => {
    const split = splitSale(terms({ discountRule: 'venue' }), gbp(100), gbp(50));
    expect([split.commission, split.makerShare]).toEqual([gbp(0), gbp(50)]);
  });

  it('maker: commission on the list price, r·L = £40', () => {
    const split = splitSale(terms({ discountRule: 'maker' }), gbp(100), gbp(80));
    expect([split.commission, split.makerShare]).toEqual([gbp(40), gbp(40)]);
  });

  it('maker: refuses a discount that would leave the maker a negative share', () => {
    const makerBears = terms({ discountRule: 'maker', commissionVat: 'added' });
    expect(trySplitSale(makerBears, gbp(100), gbp(45))).toBeNull();
    expect(() => splitSale(makerBears, gbp(100), gbp(45))).toThrow(
      expect.objectContaining({ name: 'MoneyRuleError', code: 'negative-maker-share' }),
    );
    // £48 taken (£40 + £8 VAT) from a £48 sale leaves exactly nothing, which is allowed.
    expect(splitSale(makerBears, gbp(100), gbp(48)).makerShare).toEqual(gbp(0));
  });
});

describe('splitSale: rounding and currencies', () => {
  it('rounds commission half-up per line (VATREC12030): 50% of 5p is 3p, the maker gets 2p', () => {
    const split = splitSale(terms({ commissionRateBp: 5000 }), money(5, 'GBP'), money(5, 'GBP'));
    expect([split.commission.amount, split.makerShare.amount]).toEqual([3, 2]);
  });

  it('works in yen, which has no minor unit (ISO 4217): 40% of ¥1,001 is ¥400', () => {
    const yen = terms({ currency: 'JPY', commissionVat: 'added' });
    const split = splitSale(yen, money(1001, 'JPY'), money(1001, 'JPY'));
    expect(amounts(split)).toMatchObject({ commission: 400, vatOnCommission: 80, makerShare: 521 });
  });

  it('works in Bahraini dinar, three decimals (ISO 4217): 40% of 1.005 BHD is 0.402', () => {
    const dinar = terms({ currency: 'BHD' });
    const split = splitSale(dinar, money(1005, 'BHD'), money(1005, 'BHD'));
    expect([split.commission, split.makerShare]).toEqual([money(402, 'BHD'), money(603, 'BHD')]);
  });

  it('a disclosed agent sale by an unregistered maker carries no output VAT (ICAEW FAQ)', () => {
    const split = splitSale(terms({ commissionVat: 'added' }), gbp(250), gbp(250));
    expect(split.makerOutputVat).toEqual(gbp(0));
    expect(split.makerReclaimableVat).toEqual(gbp(0));
  });

  it('refuses prices in another currency, a sale above the list price, and fractions', () => {
    const code = (fn: () => unknown) => {
      try {
        fn();
      } catch (error) {
        return error instanceof MoneyRuleError ? error.code : 'other';
      }
      return 'none';
    };
    expect(code(() => splitSale(defaultTerms, money(100, 'EUR'), money(100, 'EUR')))).toBe(
      'currency-mismatch',
    );
    expect(code(() => splitSale(defaultTerms, gbp(100), gbp(101)))).toBe('sale-above-list');
    expect(code(() => splitSale(defaultTerms, { amount: 10.5, currency: 'GBP' }, gbp(1)))).toBe(
      'invalid-amount',
    );
    expect(code(() => splitSale(terms({ commissionRateBp: 10001 }), gbp(1), gbp(1)))).toBe(
      'invalid-rate',
    );
  });
});
