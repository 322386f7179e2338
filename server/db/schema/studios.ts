import { type Generated, type Insertable, type Selectable, type Updateable } from 'kysely';

export interface StudiosTable {
  id: Generated<number>;
  name: string;
  /** ISO 3166-1 alpha-2 */
  country: Generated<string>;
  /** ISO 4217 */
  currency: Generated<string>;
  locale: Generated<string>;
  time_zone: Generated<string>;
  vat_number: string | null;
  stock_number_pattern: Generated<string>;
  /** minor units */
  price_step: Generated<number>;
  /** JSON of the shared Terms schema */
  default_terms: string | null;
  /** JSON of the shared BankColumns: which column of the bank's CSV holds what */
  bank_csv_columns: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type StudioRow = Selectable<StudiosTable>;
export type NewStudioRow = Insertable<StudiosTable>;
export type StudioUpdate = Updateable<StudiosTable>;
