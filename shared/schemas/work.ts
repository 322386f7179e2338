import { z } from 'zod';

import { parseLengthMm, parseWeightGrams } from '../measurements';
import { maxStockNumberLength } from '../works/stock-number';
import { moneySchema, priceSchema } from './money';
import { lineText, optionalText } from './text';

/**
 * Where a work is, derived from its latest consignment line (never stored on the work):
 * no line, or a withdrawn one, means it is in the studio.
 */
export const workStatuses = [
  'in-studio',
  'on-consignment',
  'sold',
  'returned',
  'damaged',
  'lost',
] as const;
export const workStatusSchema = z.enum(workStatuses);
export type WorkStatus = z.infer<typeof workStatusSchema>;

export const foodUses = ['food-safe', 'decorative', 'not-stated'] as const;
export const foodUseSchema = z.enum(foodUses, {
  error: 'Choose food-safe, decorative only, or not stated.',
});
export type FoodUse = z.infer<typeof foodUseSchema>;

/** Above this a piece carries a handling caution (UK HSE INDG143 guideline weight, 16 kg). */
export const heavyWeightG = 16_000;

/** `unit` is the symbol after a figure (" mm"); `unitName` the word in a sentence ("millimetres"). */
function wholeNumber(label: string, min: number, max: number, unit = '', unitName = '') {
  return z
    .number({ error: `Enter the ${label} as a number.` })
    .int({ error: `Enter the ${label} as a whole number${unitName ? ` of ${unitName}` : ''}.` })
    .min(min, { error: `The ${label} must be at least ${min}${unit}.` })
    .max(max, { error: `The ${label} must be at most ${max}${unit}.` })
    .nullable()
    .optional();
}

/**
 * A size or weight stored as a whole number, judged by the reader that takes it as typed, so the
 * form, the import and this schema say the same words about it.
 */
function measurement(read: typeof parseWeightGrams) {
  const refusal = (text: string) => {
    const result = read(text);
    return result.ok ? undefined : result.message;
  };
  return z
    .number({ error: () => refusal('') })
    .superRefine((value, ctx) => {
      const message = refusal(String(value));
      // Aborting, as a failed number check does: the object's own checks wait for sound fields.
      if (message) ctx.addIssue({ code: 'custom', message, continue: false });
    })
    .nullable()
    .optional();
}

/** The fields a maker enters; only the title and the retail price are required. */
const workFields = {
  stockNumber: lineText('stock number', maxStockNumberLength)
    .min(1, { error: 'Enter a stock number, or leave it out to have one made for you.' })
    .optional(),
  title: lineText('title', 200).min(1, { error: 'Enter a title.' }),
  year: wholeNumber('year', 1900, 2100),
  series: optionalText('series', 120),
  category: optionalText('category', 120),
  clayBody: optionalText('clay body', 200),
  glaze: optionalText('glaze', 200),
  firingTempC: wholeNumber('firing temperature', 500, 1600, ' °C', 'degrees Celsius'),
  atmosphere: optionalText('atmosphere', 80),
  kiln: optionalText('kiln type', 80),
  heightMm: measurement(parseLengthMm),
  widthMm: measurement(parseLengthMm),
  depthMm: measurement(parseLengthMm),
  weightG: measurement(parseWeightGrams),
  retailPrice: z.strictObject(priceSchema.shape, { error: 'Enter the retail price.' }),
  costPrice: priceSchema.nullable().optional(),
  foodUse: foodUseSchema.optional(),
  careNotes: optionalText('care notes', 2000, 'lines'),
  notes: optionalText('notes', 4000, 'lines'),
};

function sameCurrency(
  work: { retailPrice?: { currency: string }; costPrice?: { currency: string } | null },
  ctx: z.RefinementCtx,
) {
  if (work.retailPrice && work.costPrice && work.costPrice.currency !== work.retailPrice.currency) {
    ctx.addIssue({
      code: 'custom',
      path: ['costPrice', 'currency'],
      message: 'Enter the cost in the same currency as the retail price.',
    });
  }
}

/** `POST /api/works` */
export const workCreateSchema = z.strictObject(workFields).superRefine(sameCurrency);
export type WorkCreate = z.input<typeof workCreateSchema>;
export type WorkCreateParsed = z.output<typeof workCreateSchema>;

/** `PATCH /api/works/:id`: any of the same fields. */
export const workUpdateSchema = z
  .strictObject({ ...workFields })
  .partial()
  .superRefine(sameCurrency);
export type WorkUpdate = z.input<typeof workUpdateSchema>;
export type WorkUpdateParsed = z.output<typeof workUpdateSchema>;

export const photoSchema = z.object({
  id: z.number().int(),
  /** 0 is the cover */
  position: z.number().int(),
  url: z.string(),
  thumbnailUrl: z.string(),
  widthPx: z.number().int().nullable(),
  heightPx: z.number().int().nullable(),
});
export type Photo = z.infer<typeof photoSchema>;

/** A work as the studio side sees it. The gallery side never receives this shape (it has cost). */
export const workSchema = z.object({
  id: z.number().int(),
  stockNumber: z.string(),
  title: z.string(),
  year: z.number().int().nullable(),
  series: z.string().nullable(),
  category: z.string().nullable(),
  clayBody: z.string().nullable(),
  glaze: z.string().nullable(),
  firingTempC: z.number().int().nullable(),
  atmosphere: z.string().nullable(),
  kiln: z.string().nullable(),
  heightMm: z.number().int().nullable(),
  widthMm: z.number().int().nullable(),
  depthMm: z.number().int().nullable(),
  weightG: z.number().int().nullable(),
  retailPrice: moneySchema,
  costPrice: moneySchema.nullable(),
  foodUse: foodUseSchema,
  careNotes: z.string().nullable(),
  notes: z.string().nullable(),
  status: workStatusSchema,
  /** Where it is when on consignment. */
  venue: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  /**
   * The open consignment holding it: sent (`reserved` false), or still being put together, when
   * the work is in the studio but reserved for it.
   */
  consignment: z
    .object({ id: z.number().int(), reference: z.string(), reserved: z.boolean() })
    .nullable(),
  photos: z.array(photoSchema),
  /**
   * Never consigned nor condition-checked, so it may be deleted; a work with a history is kept for
   * the record and can only be archived.
   */
  deletable: z.boolean(),
  archivedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Work = z.infer<typeof workSchema>;

export const workSorts = [
  'stockNumber',
  '-stockNumber',
  'title',
  '-title',
  'year',
  '-year',
  'price',
  '-price',
  'status',
  '-status',
] as const;
export const workSortSchema = z.enum(workSorts, { error: 'Choose a sort the list offers.' });
export type WorkSort = z.infer<typeof workSortSchema>;

/** `GET /api/works` query; numbers arrive as text in a URL. */
export const workListQuerySchema = z.strictObject({
  search: lineText('search', 200).optional(),
  status: workStatusSchema.optional(),
  series: lineText('series', 120).optional(),
  category: lineText('category', 120).optional(),
  venueId: z.coerce.number<number | string>().int().positive().optional(),
  archived: z.enum(['exclude', 'include', 'only']).default('exclude'),
  sort: workSortSchema.default('stockNumber'),
  page: z.coerce.number<number | string>().int().min(1, { error: 'Pages start at 1.' }).default(1),
  pageSize: z.coerce
    .number<number | string>()
    .int()
    .min(1)
    .max(100, { error: 'Ask for at most 100 works a page.' })
    .default(25),
});
export type WorkListQuery = z.input<typeof workListQuerySchema>;

export const workListSchema = z.object({
  items: z.array(workSchema),
  total: z.number().int(),
});
export type WorkList = z.infer<typeof workListSchema>;

/** `GET /api/works/facets`: the values the filters offer. */
export const workFacetsSchema = z.object({
  series: z.array(z.string()),
  categories: z.array(z.string()),
  venues: z.array(z.object({ id: z.number().int(), name: z.string() })),
});
export type WorkFacets = z.infer<typeof workFacetsSchema>;

/** `PUT /api/works/:id/photos/order`: photo ids, cover first. */
export const photoOrderSchema = z.strictObject({
  photoIds: z.array(z.number().int().positive()).min(1, { error: 'List at least one photo.' }),
});
export type PhotoOrder = z.infer<typeof photoOrderSchema>;

export const idParamsSchema = z.strictObject({
  id: z.coerce.number({ error: 'The id must be a number.' }).int().positive(),
});
export const photoParamsSchema = z.strictObject({
  id: z.coerce.number().int().positive(),
  photoId: z.coerce.number().int().positive(),
});

/** `GET /api/photos/:photoId` and `…/thumbnail` */
export const photoFileParamsSchema = z.strictObject({
  photoId: z.coerce.number({ error: 'The photo id must be a number.' }).int().positive(),
});

/** What the photo routes answer: the work's photos, cover first. */
export const workPhotosSchema = z.array(photoSchema);
export type WorkPhotos = z.infer<typeof workPhotosSchema>;

/** `GET /api/works/export.csv`: the list's filters and sort, without paging. */
export const workExportQuerySchema = workListQuerySchema.omit({ page: true, pageSize: true });
export type WorkExportQuery = z.input<typeof workExportQuerySchema>;
