import { moneyText, type Parsed, percentText } from '@/components/ui/decimal-text';
import { bindForm, type FieldBindings } from '@/components/ui/form/binding';
import {
  choiceCodec,
  moneyCodec,
  numberCodec,
  percentCodec,
  textCodec,
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
import {
  type Venue,
  type VenueCreateParsed,
  venueCreateSchema,
  type VenueKind,
  type VenueUpdateParsed,
  venueUpdateSchema,
} from '@/shared/schemas/venue';

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

export type VenueFormValues = TermsFormValues & {
  name: string;
  kind: VenueKind;
  addressLine1: string;
  addressLine2: string;
  town: string;
  postcode: string;
  country: string;
  contactName: string;
  email: string;
  phone: string;
  vatNumber: string;
  notes: string;
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

/** A new venue starts from the product's usual terms, in the studio's currency. */
export function newVenueValues(currency: string): VenueFormValues {
  return {
    name: '',
    kind: 'gallery',
    addressLine1: '',
    addressLine2: '',
    town: '',
    postcode: '',
    country: 'GB',
    contactName: '',
    email: '',
    phone: '',
    vatNumber: '',
    notes: '',
    ...termsValues({ ...defaultTerms, currency }),
  };
}

export function venueValues(venue: Venue): VenueFormValues {
  return {
    name: venue.name,
    kind: venue.kind,
    addressLine1: venue.addressLine1 ?? '',
    addressLine2: venue.addressLine2 ?? '',
    town: venue.town ?? '',
    postcode: venue.postcode ?? '',
    country: venue.country ?? '',
    contactName: venue.contactName ?? '',
    email: venue.email ?? '',
    phone: venue.phone ?? '',
    vatNumber: venue.vatNumber ?? '',
    notes: venue.notes ?? '',
    ...termsValues(venue.defaultTerms),
  };
}

/** A code typed in capitals or not (a currency, a country); blank is none. */
const codeCodec = (text: string): Parsed<string> =>
  text.trim() === '' ? { kind: 'empty' } : { kind: 'ok', value: text.trim().toUpperCase() };

/** The terms fields, placed at `prefix` in the body (`defaultTerms.` in a venue's). */
function termsFields(prefix: string, sent: () => boolean): FieldBindings<TermsFormValues> {
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
      read: percentCodec,
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
      when: (values) => sent() && values.insuranceBasis === 'agreed',
      blank: 'omit',
    },
    insuredBy: { ...at('insuredBy'), read: choiceCodec },
    insuredInTransitBy: { ...at('insuredInTransitBy'), read: choiceCodec },
    paymentDays: { ...at('paymentTerms.days'), read: numberCodec },
    paymentFrom: { ...at('paymentTerms.from'), read: choiceCodec },
  };
}

function venueFields(withTerms: boolean): FieldBindings<VenueFormValues> {
  return {
    name: { read: textCodec, blank: { required: 'Enter the venue’s name.' } },
    kind: { read: choiceCodec },
    addressLine1: { read: textCodec },
    addressLine2: { read: textCodec },
    town: { read: textCodec },
    postcode: { read: textCodec },
    country: { read: codeCodec },
    contactName: { read: textCodec },
    email: { read: textCodec },
    phone: { read: textCodec },
    vatNumber: { read: textCodec },
    notes: { read: textCodec },
    ...termsFields('defaultTerms.', () => withTerms),
  };
}

/**
 * The owner's form sends the terms; an assistant's keeps the details only (the server refuses
 * terms from anyone but the owner).
 */
export const venueCreateBindings = {
  withTerms: bindForm<VenueFormValues, VenueCreateParsed>(venueCreateSchema, venueFields(true)),
  detailsOnly: bindForm<VenueFormValues, VenueCreateParsed>(venueCreateSchema, venueFields(false)),
};
export const venueUpdateBindings = {
  withTerms: bindForm<VenueFormValues, VenueUpdateParsed>(venueUpdateSchema, venueFields(true)),
  detailsOnly: bindForm<VenueFormValues, VenueUpdateParsed>(venueUpdateSchema, venueFields(false)),
};

const termsBinding = bindForm<TermsFormValues, Terms>(
  termsSchema,
  termsFields('', () => true),
);

/** Terms from the form for the net preview; null while something in them cannot be read. */
export function previewTerms(values: TermsFormValues): Terms | null {
  const { body, messages } = termsBinding.toBody(values);
  if (Object.keys(messages).length > 0) return null;
  const result = termsSchema.safeParse(body);
  return result.success ? result.data : null;
}
