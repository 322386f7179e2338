import { quoteSplit } from '@/shared/money';
import {
  defaultTerms,
  pricePlanRequestSchema,
  splitQuoteRequestSchema,
  splitQuoteResponseSchema,
  termsSchema,
} from '@/shared/schemas/terms';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const issues = (result: { error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  result.error?.issues.map((issue) => ({ path: issue.path, message: issue.message }));

describe('termsSchema', () => {
  it('accepts the product’s default terms', () => {
    expect(termsSchema.parse(defaultTerms)).toEqual(defaultTerms);
    expect(defaultTerms).toMatchObject({
      currency: 'GBP',
      commissionRateBp: 4000,
      vatRateBp: 2000,
      insuranceBasis: 'maker-net',
      paymentTerms: { days: 30, from: 'month-end' },
    });
  });

  it('keeps rates between 0 and 10000 basis points', () => {
    expect(issues(termsSchema.safeParse({ ...defaultTerms, commissionRateBp: 10001 }))).toEqual([
      { path: ['commissionRateBp'], message: 'The commission rate cannot be above 100%.' },
    ]);
    expect(issues(termsSchema.safeParse({ ...defaultTerms, vatRateBp: 17.5 }))).toEqual([
      {
        path: ['vatRateBp'],
        message: 'Enter the VAT rate as a whole number of basis points (4000 is 40%).',
      },
    ]);
  });

  it('needs an agreed insurance value, in the terms’ currency, for the agreed basis', () => {
    expect(issues(termsSchema.safeParse({ ...defaultTerms, insuranceBasis: 'agreed' }))).toEqual([
      { path: ['agreedInsuranceValue'], message: 'Enter the agreed insurance value.' },
    ]);
    const euros = {
      ...defaultTerms,
      insuranceBasis: 'agreed',
      agreedInsuranceValue: { amount: 100, currency: 'EUR' },
    };
    expect(issues(termsSchema.safeParse(euros))).toEqual([
      {
        path: ['agreedInsuranceValue', 'currency'],
        message: 'The agreed insurance value must be in GBP, the terms’ currency.',
      },
    ]);
  });

  it('refuses unknown fields and unknown choices', () => {
    expect(termsSchema.safeParse({ ...defaultTerms, colour: 'blue' }).success).toBe(false);
    expect(issues(termsSchema.safeParse({ ...defaultTerms, discountRule: 'half' }))).toEqual([
      {
        path: ['discountRule'],
        message: 'Choose who bears a discount: shared, the venue or the maker.',
      },
    ]);
  });
});

describe('quote request and response schemas', () => {
  it('a split request is strict, in one currency, and sells at or below the list price', () => {
    const ok = { terms: defaultTerms, listPrice: gbp(10000), salePrice: gbp(9000) };
    expect(splitQuoteRequestSchema.safeParse(ok).success).toBe(true);
    expect(splitQuoteRequestSchema.safeParse({ ...ok, note: 'x' }).success).toBe(false);
    expect(issues(splitQuoteRequestSchema.safeParse({ ...ok, salePrice: gbp(10001) }))).toEqual([
      { path: ['salePrice', 'amount'], message: 'The sale price cannot be above the list price.' },
    ]);
    const euro = { ...ok, listPrice: { amount: 10000, currency: 'EUR' } };
    expect(issues(splitQuoteRequestSchema.safeParse(euro))).toEqual([
      {
        path: ['listPrice', 'currency'],
        message: 'Enter this amount in GBP, the terms’ currency.',
      },
    ]);
  });

  it('a price-plan request needs a wanted net and a step above zero', () => {
    const ok = { terms: defaultTerms, wantedNet: gbp(6000), step: gbp(500) };
    expect(pricePlanRequestSchema.safeParse(ok).success).toBe(true);
    expect(issues(pricePlanRequestSchema.safeParse({ ...ok, step: gbp(0) }))).toEqual([
      { path: ['step', 'amount'], message: 'Enter an amount above zero.' },
    ]);
  });

  it('the engine’s split answers in the response schema’s shape', () => {
    const request = splitQuoteRequestSchema.parse({
      terms: defaultTerms,
      listPrice: gbp(10000),
      salePrice: gbp(10000),
    });
    const split = quoteSplit(request);
    expect(splitQuoteResponseSchema.parse(split)).toEqual(split);
  });
});
