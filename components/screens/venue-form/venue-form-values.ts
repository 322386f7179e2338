import { zodResolver } from '@hookform/resolvers/zod';
import { type Resolver } from 'react-hook-form';

import {
  moneyText,
  parseMoneyText,
  parsePercentText,
  percentText,
  wholeNumberValue,
} from '@/components/ui/decimal-text';
import { liftErrors, messagesToErrors } from '@/components/ui/form-errors';
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
export type VenueField = keyof VenueFormValues;

const textFields = [
  'name',
  'addressLine1',
  'addressLine2',
  'town',
  'postcode',
  'contactName',
  'email',
  'phone',
  'vatNumber',
  'notes',
] as const satisfies readonly VenueField[];

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

type Converted<T> = { value: T; messages: Record<string, string> };

/**
 * The terms fields as the Terms shape: percentages to basis points and amounts to minor units,
 * exactly. Unreadable text gets a message here; the shared schema judges the rest.
 */
export function toTermsInput(values: TermsFormValues): Converted<Record<string, unknown>> {
  const messages: Record<string, string> = {};
  const currency = values.currency.trim().toUpperCase();
  const rate = (text: string, field: string, what: string) => {
    const parsed = parsePercentText(text);
    if (parsed.kind === 'ok') return parsed.value;
    messages[field] = parsed.kind === 'empty' ? `Enter the ${what}, such as 40.` : parsed.message;
    return undefined;
  };
  const terms: Record<string, unknown> = {
    currency,
    commissionRateBp: rate(values.commissionRate, 'commissionRate', 'commission rate'),
    vatRateBp: rate(values.vatRate, 'vatRate', 'VAT rate'),
    venueRole: values.venueRole,
    commissionVat: values.commissionVat,
    makerVatRegistered: values.makerVatRegistered === 'yes',
    discountRule: values.discountRule,
    insuranceBasis: values.insuranceBasis,
    insuredBy: values.insuredBy,
    paymentTerms: { days: wholeNumberValue(values.paymentDays), from: values.paymentFrom },
  };
  if (values.insuranceBasis === 'agreed') {
    const agreed = /^[A-Z]{3}$/.test(currency)
      ? parseMoneyText(values.agreedInsuranceValue, currency)
      : ({ kind: 'empty' } as const);
    if (agreed.kind === 'ok') terms.agreedInsuranceValue = agreed.value;
    else if (agreed.kind === 'invalid') messages.agreedInsuranceValue = agreed.message;
  }
  return { value: terms, messages };
}

/** The form as the API's venue body; without `withTerms` (an assistant) the terms stay out. */
export function toVenueInput(
  values: VenueFormValues,
  withTerms = true,
): Converted<Record<string, unknown>> {
  const input: Record<string, unknown> = { kind: values.kind };
  for (const field of textFields) input[field] = values[field];
  const country = values.country.trim().toUpperCase();
  input.country = country === '' ? null : country;
  if (!withTerms) return { value: input, messages: {} };
  const terms = toTermsInput(values);
  input.defaultTerms = terms.value;
  return { value: input, messages: terms.messages };
}

const termsPaths: Record<string, VenueField> = {
  commissionRateBp: 'commissionRate',
  vatRateBp: 'vatRate',
  paymentTerms: 'paymentDays',
  'paymentTerms.days': 'paymentDays',
  'paymentTerms.from': 'paymentFrom',
  agreedInsuranceValue: 'agreedInsuranceValue',
};

const allFields = new Set<string>([
  ...textFields,
  'kind',
  'country',
  'currency',
  'venueRole',
  'commissionVat',
  'makerVatRegistered',
  'discountRule',
  'insuranceBasis',
  'insuredBy',
]);

/** A schema path (`defaultTerms.commissionRateBp`) to the form field that shows it. */
export function venueFieldFor(path: string): VenueField | undefined {
  const parts = path.split('.');
  if (parts[0] !== 'defaultTerms') {
    return allFields.has(parts[0] ?? '') ? (parts[0] as VenueField) : undefined;
  }
  const rest = parts.slice(1);
  const exact = termsPaths[rest.join('.')] ?? termsPaths[rest.slice(0, 2).join('.')];
  if (exact) return exact;
  const first = rest[0] ?? '';
  if (first === 'agreedInsuranceValue') return 'agreedInsuranceValue';
  return allFields.has(first) ? (first as VenueField) : undefined;
}

/** Terms from the form for the net preview; null while something in them cannot be read. */
export function previewTerms(values: TermsFormValues): Terms | null {
  const { value, messages } = toTermsInput(values);
  if (Object.keys(messages).length > 0) return null;
  const result = termsSchema.safeParse(value);
  return result.success ? result.data : null;
}

function composeResolver<Parsed extends object>(
  check: Resolver<Record<string, unknown>, unknown, Parsed>,
  withTerms: boolean,
): Resolver<VenueFormValues, unknown, Parsed> {
  return async (values, context, options) => {
    const { value, messages } = toVenueInput(values, withTerms);
    const result = await check(value, context, options as never);
    const errors = { ...liftErrors(result.errors, venueFieldFor), ...messagesToErrors(messages) };
    if (Object.keys(errors).length > 0) return { values: {}, errors };
    return { values: result.values as Parsed, errors: {} };
  };
}

const checkCreate = zodResolver(venueCreateSchema) as unknown as Resolver<
  Record<string, unknown>,
  unknown,
  VenueCreateParsed
>;
const checkUpdate = zodResolver(venueUpdateSchema) as unknown as Resolver<
  Record<string, unknown>,
  unknown,
  VenueUpdateParsed
>;

/** Resolvers for the owner, who sets terms, and for an assistant, who keeps the details only. */
export const venueCreateResolvers = {
  withTerms: composeResolver(checkCreate, true),
  detailsOnly: composeResolver(checkCreate, false),
};
export const venueUpdateResolvers = {
  withTerms: composeResolver(checkUpdate, true),
  detailsOnly: composeResolver(checkUpdate, false),
};
