import { markUp, money } from '@/shared/money';

describe('markUp (docs/money-rules.md worked example "Mark-up ×2.2", derived from HMRC VAT rates)', () => {
  it('maker’s price £100 × 2.2: retail £220, venue keeps £120 = £100 commission + £20 VAT', () => {
    // Rule: the VAT in what the venue keeps is the VAT fraction, 1/6 at 20% (HMRC).
    expect(markUp(money(10000, 'GBP'), 22000, { charged: true, rateBp: 2000 })).toEqual({
      retailPrice: money(22000, 'GBP'),
      venueKeeps: money(12000, 'GBP'),
      commission: money(10000, 'GBP'),
      vatOnCommission: money(2000, 'GBP'),
      makerShare: money(10000, 'GBP'),
    });
  });

  it('a venue that charges no VAT keeps all of the mark-up as commission', () => {
    const result = markUp(money(10000, 'GBP'), 22000, { charged: false, rateBp: 2000 });
    expect([result.commission, result.vatOnCommission]).toEqual([
      money(12000, 'GBP'),
      money(0, 'GBP'),
    ]);
  });

  it('refuses a mark-up below ×1', () => {
    expect(() => markUp(money(100, 'GBP'), 9999, { charged: false, rateBp: 0 })).toThrow(
      expect.objectContaining({ code: 'invalid-rate' }),
    );
  });
});
