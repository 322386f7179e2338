import { type Generated, type Insertable, type Selectable, type Updateable } from 'kysely';

import { type VenueKind } from '@/shared/schemas/venue';

export interface VenuesTable {
  id: Generated<number>;
  studio_id: number;
  name: string;
  kind: VenueKind;
  address_line1: string | null;
  address_line2: string | null;
  town: string | null;
  postcode: string | null;
  country: string | null;
  contact_name: string | null;
  email: string | null;
  phone: string | null;
  vat_number: string | null;
  /** JSON of the shared Terms schema */
  default_terms: string;
  notes: string | null;
  archived_at: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type VenueRow = Selectable<VenuesTable>;
export type NewVenueRow = Insertable<VenuesTable>;
export type VenueUpdate = Updateable<VenuesTable>;
