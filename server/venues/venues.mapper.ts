import { termsSchema } from '@/shared/schemas/terms';
import { type Venue, type VenueCreateParsed } from '@/shared/schemas/venue';

import { type NewVenueRow, type VenueRow } from '../db/schema/venues';

export type VenueColumns = Omit<VenueRow, 'studio_id'>;

export function toVenue(row: VenueColumns): Venue {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    addressLine1: row.address_line1,
    addressLine2: row.address_line2,
    town: row.town,
    postcode: row.postcode,
    country: row.country,
    contactName: row.contact_name,
    email: row.email,
    phone: row.phone,
    vatNumber: row.vat_number,
    defaultTerms: termsSchema.parse(JSON.parse(row.default_terms)),
    notes: row.notes,
    archivedAt: row.archived_at,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

/** The fields a maker edits, as the create schema takes them (what an edit is checked against). */
export function toVenueDraft(venue: Venue) {
  return {
    name: venue.name,
    kind: venue.kind,
    addressLine1: venue.addressLine1,
    addressLine2: venue.addressLine2,
    town: venue.town,
    postcode: venue.postcode,
    country: venue.country,
    contactName: venue.contactName,
    email: venue.email,
    phone: venue.phone,
    vatNumber: venue.vatNumber,
    defaultTerms: venue.defaultTerms,
    notes: venue.notes,
  };
}

export function toVenueRow(
  venue: VenueCreateParsed & { defaultTerms: NonNullable<VenueCreateParsed['defaultTerms']> },
): Omit<NewVenueRow, 'studio_id'> {
  return {
    name: venue.name,
    kind: venue.kind,
    address_line1: venue.addressLine1 ?? null,
    address_line2: venue.addressLine2 ?? null,
    town: venue.town ?? null,
    postcode: venue.postcode ?? null,
    country: venue.country ?? null,
    contact_name: venue.contactName ?? null,
    email: venue.email ?? null,
    phone: venue.phone ?? null,
    vat_number: venue.vatNumber ?? null,
    default_terms: JSON.stringify(venue.defaultTerms),
    notes: venue.notes ?? null,
  };
}
