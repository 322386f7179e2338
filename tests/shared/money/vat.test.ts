import {
  grossFromNet,
  money,
  ukStandardVatRateBp,
  vatFraction,
  vatInPrice,
  vatOnNet,
} from '@/shared/money';

describe('VAT (HMRC VAT rates, fractions and rounding; see docs/money-rules.md)', () => {
  it('£100 net + 20% = £120 gross; £100 at 5% = £105 (HMRC, VAT-exclusive prices)', () => {
    expect(grossFromNet(money(10000, 'GBP'), 2000)).toEqual(money(12000, 'GBP'));
    expect(grossFromNet(money(10000, 'GBP'), 500)).toEqual(money(10500, 'GBP'));
  });

  it('VAT fractions 1/6 at 20%, 1/21 at 5%, 7/47 at 17.5%, 3/23 at 15% (HMRC VAT fraction)', () => {
    expect(vatFraction(2000)).toEqual({ numerator: 1, denominator: 6 });
    expect(vatFraction(500)).toEqual({ numerator: 1, denominator: 21 });
    expect(vatFraction(1750)).toEqual({ numerator: 7, denominator: 47 });
    expect(vatFraction(1500)).toEqual({ numerator: 3, denominator: 23 });
  });

  it('the VAT in £120 at 20% is £20 and in £80 at 5% is £3.81 (HMRC VAT fraction)', () => {
    expect(vatInPrice(money(12000, 'GBP'), 2000)).toEqual(money(2000, 'GBP'));
    expect(vatInPrice(money(8000, 'GBP'), 500)).toEqual(money(381, 'GBP'));
  });

  it('rounds to the nearest penny, as retailers must, never down (VATREC12030, Notice 700 17.5)', () => {
    expect(vatOnNet(13, 2000)).toBe(3); // 2.6p
    expect(vatOnNet(12, 2000)).toBe(2); // 2.4p
    expect(vatOnNet(38, 2000)).toBe(8); // 7.6p: rounding down would give 7p
    expect(vatOnNet(10, 500)).toBe(1); // 0.5p rounds up
  });

  it('never rounds a unit’s VAT down to nil (VAT Notice 700 17.5, secondary)', () => {
    expect(vatOnNet(2, 2000)).toBe(1); // 0.4p
    expect(vatInPrice(money(1, 'GBP'), 2000)).toEqual(money(1, 'GBP'));
    expect(vatOnNet(0, 2000)).toBe(0);
    expect(vatOnNet(2, 0)).toBe(0);
  });

  it('standard rate by date: 20% from 4 Jan 2011, 17.5% from 1 Jan 2010, 15% from 1 Dec 2008 (HMRC)', () => {
    expect(ukStandardVatRateBp('2024-06-01')).toBe(2000);
    expect(ukStandardVatRateBp('2011-01-04')).toBe(2000);
    expect(ukStandardVatRateBp('2011-01-03')).toBe(1750);
    expect(ukStandardVatRateBp('2010-01-01')).toBe(1750);
    expect(ukStandardVatRateBp('2009-12-31')).toBe(1500);
    expect(ukStandardVatRateBp('2008-12-01')).toBe(1500);
    // Earlier rates are not in the published table held here.
    expect(ukStandardVatRateBp('2008-11-30')).toBeNull();
    expect(() => ukStandardVatRateBp('2011-02-30')).toThrow('not a date');
  });
});
