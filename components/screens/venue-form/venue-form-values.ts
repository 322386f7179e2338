import { bindForm, type FieldBindings } from '@/components/ui/form/binding';
import { choiceCodec, textCodec } from '@/components/ui/form/codecs';
import { defaultTerms } from '@/shared/schemas/terms';
import {
  type Venue,
  type VenueCreateParsed,
  venueCreateSchema,
  type VenueKind,
  type VenueUpdateParsed,
  venueUpdateSchema,
} from '@/shared/schemas/venue';

import {
  codeCodec,
  termsFields,
  type TermsFormValues,
  termsValues,
} from '../terms-form/terms-form-values';

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
    ...termsFields<VenueFormValues>('defaultTerms.', () => withTerms),
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
