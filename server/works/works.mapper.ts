import { type ConsignmentState } from '@/shared/schemas/consignment';
import {
  type Photo,
  type Work,
  type WorkCreateParsed,
  type WorkStatus,
  type WorkUpdateParsed,
} from '@/shared/schemas/work';

import { type NewWorkRow, type WorkRow, type WorkUpdate } from '../db/schema/works';

/** A works row as the list and detail queries select it: its place comes from its latest line. */
export type WorkListRow = Omit<WorkRow, 'studio_id'> & {
  status: WorkStatus;
  deletable: number;
  placed_consignment_id: number | null;
  placed_reference: string | null;
  placed_state: ConsignmentState | null;
  venue_id: number | null;
  venue_name: string | null;
};

export type PhotoRow = {
  id: number;
  work_id: number;
  position: number;
  width_px: number | null;
  height_px: number | null;
};

export function toPhoto(row: PhotoRow): Photo {
  return {
    id: row.id,
    position: row.position,
    url: `/api/photos/${row.id}`,
    thumbnailUrl: `/api/photos/${row.id}/thumbnail`,
    widthPx: row.width_px,
    heightPx: row.height_px,
  };
}

export function toWork(row: WorkListRow, photos: Photo[]): Work {
  return {
    id: row.id,
    stockNumber: row.stock_number,
    title: row.title,
    year: row.year,
    series: row.series,
    category: row.category,
    clayBody: row.clay_body,
    glaze: row.glaze,
    firingTempC: row.firing_temp_c,
    atmosphere: row.atmosphere,
    kiln: row.kiln,
    heightMm: row.height_mm,
    widthMm: row.width_mm,
    depthMm: row.depth_mm,
    weightG: row.weight_g,
    retailPrice: { amount: row.retail_price, currency: row.currency },
    costPrice: row.cost_price === null ? null : { amount: row.cost_price, currency: row.currency },
    foodUse: row.food_use,
    careNotes: row.care_notes,
    notes: row.notes,
    status: row.status,
    venue:
      row.status === 'on-consignment' && row.venue_id !== null && row.venue_name !== null
        ? { id: row.venue_id, name: row.venue_name }
        : null,
    consignment:
      row.placed_consignment_id !== null && row.placed_reference !== null
        ? {
            id: row.placed_consignment_id,
            reference: row.placed_reference,
            reserved: row.status === 'in-studio',
          }
        : null,
    photos,
    deletable: row.deletable === 1,
    archivedAt: row.archived_at,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

type EditableColumns = Omit<
  WorkUpdate,
  'id' | 'studio_id' | 'archived_at' | 'created_at' | 'updated_at'
>;

/** The columns a create or an edit sets; fields left out stay out, so an edit keeps them. */
export function toWorkColumns(input: WorkUpdateParsed): EditableColumns {
  const columns: EditableColumns = {
    stock_number: input.stockNumber,
    title: input.title,
    year: input.year,
    series: input.series,
    category: input.category,
    clay_body: input.clayBody,
    glaze: input.glaze,
    firing_temp_c: input.firingTempC,
    atmosphere: input.atmosphere,
    kiln: input.kiln,
    height_mm: input.heightMm,
    width_mm: input.widthMm,
    depth_mm: input.depthMm,
    weight_g: input.weightG,
    retail_price: input.retailPrice?.amount,
    currency: input.retailPrice?.currency,
    cost_price: input.costPrice === null ? null : input.costPrice?.amount,
    food_use: input.foodUse,
    care_notes: input.careNotes,
    notes: input.notes,
  };
  return Object.fromEntries(
    Object.entries(columns).filter(([, value]) => value !== undefined),
  ) as EditableColumns;
}

export function toNewWorkRow(
  input: WorkCreateParsed,
  studioId: number,
  stockNumber: string,
): NewWorkRow {
  return {
    year: null,
    series: null,
    category: null,
    clay_body: null,
    glaze: null,
    firing_temp_c: null,
    atmosphere: null,
    kiln: null,
    height_mm: null,
    width_mm: null,
    depth_mm: null,
    weight_g: null,
    cost_price: null,
    care_notes: null,
    notes: null,
    // Said outright: rows inserted together share one column list, so a row without it would
    // send NULL beside a row with it, not the column's default.
    food_use: 'not-stated',
    ...toWorkColumns(input),
    studio_id: studioId,
    stock_number: stockNumber,
    title: input.title,
    retail_price: input.retailPrice.amount,
    currency: input.retailPrice.currency,
    archived_at: null,
  };
}
