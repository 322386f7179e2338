import { defaultTerms, type Terms } from '@/shared/schemas/terms';
import { percent, termsInWords } from '@/shared/terms/terms-in-words';

const terms = (over: Partial<Terms>): Terms => ({
  ...defaultTerms,
  paymentTerms: { ...defaultTerms.paymentTerms },
  ...over,
});

describe('termsInWords', () => {
  it('writes rates as people write them', () => {
    expect([percent(4000), percent(1750), percent(2000), percent(5)]).toEqual([
      '40%',
      '17.5%',
      '20%',
      '0.05%',
    ]);
  });

  it('says every term of the usual craft-shop terms in a sentence', () => {
    expect(termsInWords(terms({}))).toEqual([
      'The venue sells as the maker’s agent.',
      'Commission: 40% of the price paid, with no VAT on it.',
      'The maker is not VAT-registered.',
      'Discounts: shared; commission is on the price actually paid.',
      'Insurance: at the maker’s net (list price less commission, without VAT), by the venue on the premises and the maker in transit.',
      'Payment: within 30 days of the end of the month of sale.',
    ]);
  });

  it('names no VAT rate for a venue that charges no VAT and a maker who is not registered', () => {
    const words = termsInWords(terms({ commissionVat: 'none', vatRateBp: 500 })).join(' ');
    expect(words).toContain('with no VAT on it');
    expect(words).not.toMatch(/5%|VAT at/);
  });

  it('says how VAT on commission is charged and who insures where', () => {
    const words = termsInWords(
      terms({
        commissionRateBp: 5000,
        commissionVat: 'added',
        makerVatRegistered: true,
        insuranceBasis: 'agreed',
        agreedInsuranceValue: { amount: 25_000, currency: 'GBP' },
        insuredBy: 'maker',
        insuredInTransitBy: 'maker',
        paymentTerms: { days: 14, from: 'closing' },
      }),
    );
    expect(words).toContain(
      'Commission: 50% of the price paid without the maker’s VAT, with VAT at 20% added on top.',
    );
    // The rate is said where it is used: on the commission and in a registered maker's prices.
    expect(words).toContain('The maker is VAT-registered: prices include the maker’s VAT at 20%.');
    expect(words).toContain(
      'Insurance: at an agreed value of £250.00, by the maker on the premises and in transit.',
    );
    expect(words).toContain('Payment: within 14 days of the show’s closing.');
  });
});
