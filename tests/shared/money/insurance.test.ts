import { insuranceValue, money } from '@/shared/money';
import { defaultTerms, type Terms } from '@/shared/schemas/terms';

const gbp = (pence: number) => money(pence, 'GBP');
const terms = (changes: Partial<Terms>): Terms => ({ ...defaultTerms, ...changes });

describe('insuranceValue: basis of docs/money-rules.md (common practice)', () => {
  it('maker-net: the agreed price less the venue’s commission, excluding VAT (model agreements)', () => {
    expect(insuranceValue(terms({}), gbp(10000))).toEqual(gbp(6000));
    // VAT added on the commission is not deducted: the value excludes VAT.
    expect(insuranceValue(terms({ commissionVat: 'added' }), gbp(10000))).toEqual(gbp(6000));
  });

  it('maker-net with VAT inside the commission deducts only the commission without VAT', () => {
    // Derived from docs/money-rules.md "L − C at S = L, with no VAT in either": £100 − (£40 − £6.67).
    expect(insuranceValue(terms({ commissionVat: 'included' }), gbp(10000))).toEqual(gbp(6667));
  });

  it('a registered maker’s values exclude the maker’s VAT (worked settlement: £600 → £500 net)', () => {
    const registered = terms({ makerVatRegistered: true, commissionRateBp: 5000 });
    expect(insuranceValue(registered, gbp(60000))).toEqual(gbp(25000));
    expect(insuranceValue({ ...registered, insuranceBasis: 'retail' }, gbp(60000))).toEqual(
      gbp(50000),
    );
  });

  it('retail is the list price; agreed is the value the terms record', () => {
    expect(insuranceValue(terms({ insuranceBasis: 'retail' }), gbp(10000))).toEqual(gbp(10000));
    const agreed = terms({ insuranceBasis: 'agreed', agreedInsuranceValue: gbp(7500) });
    expect(insuranceValue(agreed, gbp(10000))).toEqual(gbp(7500));
  });

  it('refuses an agreed basis without a value, or a value in another currency', () => {
    expect(() => insuranceValue(terms({ insuranceBasis: 'agreed' }), gbp(100))).toThrow(
      expect.objectContaining({ code: 'missing-agreed-value' }),
    );
    const euros = terms({ insuranceBasis: 'agreed', agreedInsuranceValue: money(100, 'EUR') });
    expect(() => insuranceValue(euros, gbp(100))).toThrow(
      expect.objectContaining({ code: 'currency-mismatch' }),
    );
  });
});
