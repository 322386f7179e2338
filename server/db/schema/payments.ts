import { type Generated, type Insertable, type Selectable } from 'kysely';

export type PaymentMethod = 'bank-transfer' | 'cheque' | 'cash' | 'online';
export type PaymentState = 'pending' | 'received' | 'failed' | 'refunded';

export interface PaymentsTable {
  id: Generated<number>;
  studio_id: number;
  venue_id: number;
  statement_id: number | null;
  /** minor units */
  amount: number;
  currency: string;
  method: PaymentMethod;
  state: Generated<PaymentState>;
  received_on: string | null;
  reference: string | null;
  provider_payment_id: string | null;
  recorded_by: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type PaymentRow = Selectable<PaymentsTable>;
export type NewPaymentRow = Insertable<PaymentsTable>;
