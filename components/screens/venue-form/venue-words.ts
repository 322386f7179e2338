import {
  type CommissionVat,
  type DiscountRule,
  type InsuranceBasis,
  type Insurer,
  type PaymentTerms,
  type Terms,
  type VenueRole,
} from '@/shared/schemas/terms';
import { type VenueKind } from '@/shared/schemas/venue';
import { percent } from '@/shared/terms/terms-in-words';

export const venueKindWords: Record<VenueKind, string> = {
  gallery: 'Gallery',
  shop: 'Shop',
  fair: 'Fair',
  exhibition: 'Exhibition',
  'open-studio': 'Open studio',
};

export const venueRoleWords: Record<VenueRole, string> = {
  agent: 'Sells as my agent',
  'sale-or-return': 'Buys on sale or return',
};

export const commissionVatWords: Record<CommissionVat, string> = {
  none: 'No VAT (venue not registered)',
  added: 'VAT added on top',
  included: 'VAT included in the rate',
};

/**
 * VAT on the commission as terms show it: the rate only where VAT is charged, so a venue that is
 * not registered never reads as charging 20%.
 */
export function commissionVatText(terms: Pick<Terms, 'commissionVat' | 'vatRateBp'>): string {
  const rate = percent(terms.vatRateBp);
  if (terms.commissionVat === 'added') return `VAT at ${rate} added on top`;
  if (terms.commissionVat === 'included') return `VAT at ${rate} included in the rate`;
  return 'No VAT on commission';
}

/** Whether the maker is VAT-registered, with the rate in their prices when they are. */
export function makerVatText(terms: Pick<Terms, 'makerVatRegistered' | 'vatRateBp'>): string {
  return terms.makerVatRegistered
    ? `Yes: your prices include VAT at ${percent(terms.vatRateBp)}`
    : 'No';
}

export const discountRuleWords: Record<DiscountRule, string> = {
  shared: 'Shared (commission on the price paid)',
  venue: 'The venue bears it',
  maker: 'I bear it',
};

export const insuranceBasisWords: Record<InsuranceBasis, string> = {
  'maker-net': 'My net (price less commission)',
  retail: 'Retail price',
  agreed: 'An agreed value',
};

export const insurerWords: Record<Insurer, string> = { venue: 'The venue', maker: 'Me' };

export const paymentFromWords: Record<PaymentTerms['from'], string> = {
  sale: 'the sale',
  'month-end': 'the end of the month of sale',
  closing: 'the show’s closing',
};

export function options<T extends string>(words: Record<T, string>) {
  return (Object.keys(words) as T[]).map((value) => ({ value, label: words[value] }));
}
