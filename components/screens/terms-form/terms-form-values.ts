import { moneyText, type Parsed, percentText } from '@/components/ui/decimal-text';
import { bindForm, type FieldBinding } from '@/components/ui/form/binding';
import {
  choiceCodec,
  moneyCodec,
  numberCodec,
  percentCodec,
  yesNoCodec,
} from '@/components/ui/form/codecs';
import {
  type CommissionVat,
  defaultTerms,
  type DiscountRule,
  type InsuranceBasis,
  type Insurer,
  type PaymentTerms,
  type Terms,
  termsSchema,
  type VenueRole,
} from '@/shared/schemas/terms';

/** The terms as the form holds them: rates as percentages typed, amounts as typed. */
export type TermsFormValues = {
  currency: string;
  commissionRate: string;
  vatRate: string;
  venueRole: VenueRole;
  commissionVat: CommissionVat;
  makerVatRegistered: 'yes' | 'no';
  discountRule: DiscountRule;
  insuranceBasis: InsuranceBasis;
  agreedInsuranceValue: string;
  insuredBy: Insurer;
  insuredInTransitBy: Insurer;
  paymentDays: string;
  paymentFrom: PaymentTerms['from'];
};

export function termsValues(terms: Terms): TermsFormValues {
  return {
    currency: terms.currency,
    commissionRate: percentText(terms.commissionRateBp),
    vatRate: percentText(terms.vatRateBp),
    venueRole: terms.venueRole,
    commissionVat: terms.commissionVat,
    makerVatRegistered: terms.makerVatRegistered ? 'yes' : 'no',
    discountRule: terms.discountRule,
    insuranceBasis: terms.insuranceBasis,
    agreedInsuranceValue: moneyText(terms.agreedInsuranceValue),
    insuredBy: terms.insuredBy,
    insuredInTransitBy: terms.insuredInTransitBy,
    paymentDays: String(terms.paymentTerms.days),
    paymentFrom: terms.paymentTerms.from,
  };
}

/** Whether the terms use their VAT rate: on the commission, or in a registered maker's prices. */
export function vatRateApplies(
  values: Pick<TermsFormValues, 'commissionVat' | 'makerVatRegistered'>,
): boolean {
  return values.commissionVat !== 'none' || values.makerVatRegistered === 'yes';
}

/**
 * The rate of terms that charge no VAT, whose field is hidden: kept when it reads, otherwise the
 * usual rate, so a value nobody can see never stops the form being saved.
 */
function unusedVatRate(text: string): Parsed<number> {
  const read = percentCodec(text);
  return read.kind === 'ok' ? read : { kind: 'ok', value: defaultTerms.vatRateBp };
}

/** A code typed in capitals or not (a currency, a country); blank is none. */
export const codeCodec = (text: string): Parsed<string> =>
  text.trim() === '' ? { kind: 'empty' } : { kind: 'ok', value: text.trim().toUpperCase() };

/**
 * The terms fields, placed at `prefix` in the body (`defaultTerms.` in a venue's, `terms.` in a
 * consignment's), sent when `sent` says so.
 */
export function termsFields<Values extends TermsFormValues>(
  prefix: string,
  sent: (values: Values) => boolean,
): { [K in keyof TermsFormValues]: FieldBinding<TermsFormValues[K], Values> } {
  const at = (path: string) => ({ path: `${prefix}${path}`, when: sent });
  return {
    currency: { ...at('currency'), read: codeCodec },
    commissionRate: {
      ...at('commissionRateBp'),
      read: percentCodec,
      blank: { required: 'Enter the commission rate, such as 40.' },
    },
    vatRate: {
      ...at('vatRateBp'),
      read: (text, values) => (vatRateApplies(values) ? percentCodec(text) : unusedVatRate(text)),
      blank: { required: 'Enter the VAT rate, such as 20.' },
    },
    venueRole: { ...at('venueRole'), read: choiceCodec },
    commissionVat: { ...at('commissionVat'), read: choiceCodec },
    makerVatRegistered: { ...at('makerVatRegistered'), read: yesNoCodec },
    discountRule: { ...at('discountRule'), read: choiceCodec },
    insuranceBasis: { ...at('insuranceBasis'), read: choiceCodec },
    agreedInsuranceValue: {
      path: `${prefix}agreedInsuranceValue`,
      // In the terms' own currency, and only when the basis is an agreed value.
      read: (text, values) => moneyCodec(values.currency.trim().toUpperCase())(text),
      when: (values) => sent(values) && values.insuranceBasis === 'agreed',
      blank: 'omit',
    },
    insuredBy: { ...at('insuredBy'), read: choiceCodec },
    insuredInTransitBy: { ...at('insuredInTransitBy'), read: choiceCodec },
    paymentDays: { ...at('paymentTerms.days'), read: numberCodec },
    paymentFrom: { ...at('paymentTerms.from'), read: choiceCodec },
  };
}

/** The terms on their own, as a form that edits nothing else sends them. */
export const termsBinding = bindForm<TermsFormValues, Terms>(
  termsSchema,
  termsFields<TermsFormValues>('', () => true),
);

/** Terms from the form for the net preview; null while something in them cannot be read. */
export function previewTerms(values: TermsFormValues): Terms | null {
  const { body, messages } = termsBinding.toBody(values);
  if (Object.keys(messages).length > 0) return null;
  const result = termsSchema.safeParse(body);
  return result.success ? result.data : null;
}
