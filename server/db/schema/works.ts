import { type Generated, type Insertable, type Selectable, type Updateable } from 'kysely';

import { type FoodUse } from '@/shared/schemas/work';

/** A work's status is not here: it is derived from its latest consignment line. */
export interface WorksTable {
  id: Generated<number>;
  studio_id: number;
  stock_number: string;
  title: string;
  year: number | null;
  series: string | null;
  category: string | null;
  clay_body: string | null;
  glaze: string | null;
  firing_temp_c: number | null;
  atmosphere: string | null;
  kiln: string | null;
  height_mm: number | null;
  width_mm: number | null;
  depth_mm: number | null;
  weight_g: number | null;
  /** minor units of `currency` */
  retail_price: number;
  currency: string;
  cost_price: number | null;
  food_use: Generated<FoodUse>;
  care_notes: string | null;
  notes: string | null;
  archived_at: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type WorkRow = Selectable<WorksTable>;
export type NewWorkRow = Insertable<WorksTable>;
export type WorkUpdate = Updateable<WorksTable>;

export interface WorkPhotosTable {
  id: Generated<number>;
  work_id: number;
  file_id: number;
  /** 0 is the cover */
  position: number;
  caption: string | null;
  created_at: Generated<string>;
}
export type WorkPhotoRow = Selectable<WorkPhotosTable>;
export type NewWorkPhotoRow = Insertable<WorkPhotosTable>;
