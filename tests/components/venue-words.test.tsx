import { commissionVatText, makerVatText } from '@/components/screens/venue-form/venue-words';

describe('commissionVatText', () => {
  it('names no rate when the venue charges no VAT on its commission', () => {
    // The stored rate (20%) is the form's default and is not charged.
    expect(commissionVatText({ commissionVat: 'none', vatRateBp: 2000 })).toBe(
      'No VAT on commission',
    );
  });

  it('names the rate where VAT is charged, on top or inside (UK standard rate 20%, HMRC)', () => {
    expect(commissionVatText({ commissionVat: 'added', vatRateBp: 2000 })).toBe(
      'VAT at 20% added on top',
    );
    expect(commissionVatText({ commissionVat: 'included', vatRateBp: 500 })).toBe(
      'VAT at 5% included in the rate',
    );
  });
});

describe('makerVatText', () => {
  it('gives the rate only for a registered maker', () => {
    expect(makerVatText({ makerVatRegistered: false, vatRateBp: 2000 })).toBe('No');
    expect(makerVatText({ makerVatRegistered: true, vatRateBp: 2000 })).toBe(
      'Yes: your prices include VAT at 20%',
    );
  });
});
