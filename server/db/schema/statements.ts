import { type Generated, type Insertable, type Selectable, type Updateable } from 'kysely';

export type StatementState = 'draft' | 'issued' | 'settled' | 'void';

export interface StatementsTable {
  id: Generated<number>;
  studio_id: number;
  venue_id: number;
  consignment_id: number | null;
  reference: string;
  period_start: string;
  period_end: string;
  state: Generated<StatementState>;
  currency: string;
  /** minor units, frozen when issued */
  sales_total: number | null;
  commission_total: number | null;
  vat_on_commission_total: number | null;
  maker_net_total: number | null;
  output_vat_total: number | null;
  reclaimable_vat_total: number | null;
  /** JSON of the shared Terms schema the statement was issued under */
  terms: string | null;
  issued_at: string | null;
  due_date: string | null;
  settled_at: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type StatementRow = Selectable<StatementsTable>;
export type NewStatementRow = Insertable<StatementsTable>;
export type StatementUpdate = Updateable<StatementsTable>;

/** One sold line on an issued statement, with its split as issued. */
export interface StatementLinesTable {
  statement_id: number;
  consignment_line_id: number;
  sale_price: number;
  commission: number;
  vat_on_commission: number;
  maker_share: number;
}
export type NewStatementLineRow = Insertable<StatementLinesTable>;

export type AdjustmentKind =
  'unreported-sale' | 'discount-not-agreed' | 'fee-deducted' | 'rounding' | 'other';

/** The maker's explanation of part of a difference between what was owed and what was paid. */
export interface StatementAdjustmentsTable {
  id: Generated<number>;
  studio_id: number;
  statement_id: number;
  kind: AdjustmentKind;
  /** minor units, signed: taken off the balance owed */
  amount: number;
  currency: string;
  note: string | null;
  created_by: string | null;
  created_at: string;
}
