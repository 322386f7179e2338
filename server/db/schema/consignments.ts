import { type Generated, type Insertable, type Selectable, type Updateable } from 'kysely';

import { type ConsignmentState, type LineState } from '@/shared/schemas/consignment';

export type EnteredBy = 'venue' | 'studio';

export interface ConsignmentsTable {
  id: Generated<number>;
  studio_id: number;
  venue_id: number;
  reference: string;
  title: string;
  state: Generated<ConsignmentState>;
  dispatch_date: string | null;
  opening_date: string | null;
  closing_date: string | null;
  return_due_date: string | null;
  /** JSON of the shared Terms schema, copied from the venue at agreement */
  terms: string | null;
  agreed_at: string | null;
  dispatched_at: string | null;
  acknowledged_at: string | null;
  acknowledged_by: string | null;
  cancelled_at: string | null;
  closed_at: string | null;
  settled_at: string | null;
  notes: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type ConsignmentRow = Selectable<ConsignmentsTable>;
export type NewConsignmentRow = Insertable<ConsignmentsTable>;
export type ConsignmentUpdate = Updateable<ConsignmentsTable>;

export interface ConsignmentLinesTable {
  id: Generated<number>;
  studio_id: number;
  consignment_id: number;
  work_id: number;
  currency: string;
  /** minor units */
  list_price: number;
  insurance_value: number;
  state: Generated<LineState>;
  sold_on: string | null;
  sale_price: number | null;
  discount: number | null;
  sale_recorded_by: string | null;
  sale_recorded_at: string | null;
  discount_reason: string | null;
  /** Which side entered the sale: the venue's staff, or the studio for a venue that phoned it in. */
  sale_entered_by: EnteredBy | null;
  /** The queued e-mail telling the maker of this sale, while it can still take more sales. */
  sale_mail_id: number | null;
  /** the day it was returned, found damaged or declared lost */
  resolved_on: string | null;
  resolution_note: string | null;
  /** A photo of the damage (a condition photo's file). */
  resolution_photo_id: number | null;
  resolved_by: string | null;
  resolved_at: string | null;
  resolution_entered_by: EnteredBy | null;
  /** 1 while this line holds its work on an open consignment, null otherwise (unique per work) */
  holds_work: 1 | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type ConsignmentLineRow = Selectable<ConsignmentLinesTable>;
export type NewConsignmentLineRow = Insertable<ConsignmentLinesTable>;
export type ConsignmentLineUpdate = Updateable<ConsignmentLinesTable>;
