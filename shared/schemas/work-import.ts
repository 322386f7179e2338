import { z } from 'zod';

/** The work fields a spreadsheet column can be mapped to. */
export const importFields = [
  'stockNumber',
  'title',
  'year',
  'series',
  'category',
  'clayBody',
  'glaze',
  'firingTempC',
  'atmosphere',
  'kiln',
  'heightMm',
  'widthMm',
  'depthMm',
  'weightG',
  'retailPrice',
  'costPrice',
  'foodUse',
  'careNotes',
  'notes',
] as const;
export const importFieldSchema = z.enum(importFields);
export type ImportField = z.infer<typeof importFieldSchema>;

/** Column headers for each field: the export writes them and the import recognises them. */
export const importFieldLabels: Readonly<Record<ImportField, string>> = {
  stockNumber: 'Stock number',
  title: 'Title',
  year: 'Year',
  series: 'Series',
  category: 'Category',
  clayBody: 'Clay body',
  glaze: 'Glaze',
  firingTempC: 'Firing temperature (°C)',
  atmosphere: 'Atmosphere',
  kiln: 'Kiln',
  heightMm: 'Height (mm)',
  widthMm: 'Width (mm)',
  depthMm: 'Depth (mm)',
  weightG: 'Weight (g)',
  retailPrice: 'Retail price',
  costPrice: 'Cost price',
  foodUse: 'Food use',
  careNotes: 'Care notes',
  notes: 'Notes',
};

/** 2 MB of CSV is several thousand works; more than that is better split. */
export const maxImportCsvLength = 2_000_000;

/**
 * `POST /api/works/import`: `preview` validates every row and writes nothing; `commit` validates
 * again and imports all valid rows in one transaction. Prices in the CSV are in major units
 * (12.50) in the studio's currency.
 */
export const workImportRequestSchema = z.strictObject({
  mode: z.enum(['preview', 'commit'], { error: 'Say whether to preview or commit.' }),
  csv: z
    .string({ error: 'Attach the CSV text.' })
    .min(1, { error: 'The file is empty.' })
    .max(maxImportCsvLength, { error: 'The file is over 2 MB: split it into smaller files.' }),
  /** Field → column header. Left out, columns are matched by name. */
  mapping: z.partialRecord(importFieldSchema, z.string()).optional(),
});
export type WorkImportRequest = z.infer<typeof workImportRequestSchema>;

export const importRowSchema = z.object({
  /** 1-based, counting the header row as row 1, as a spreadsheet shows it */
  rowNumber: z.number().int(),
  stockNumber: z.string().nullable(),
  title: z.string().nullable(),
  errors: z.array(z.object({ field: z.string(), message: z.string() })),
});
export type ImportRow = z.infer<typeof importRowSchema>;

export const workImportPreviewSchema = z.object({
  mode: z.literal('preview'),
  columns: z.array(z.string()),
  mapping: z.partialRecord(importFieldSchema, z.string()),
  rows: z.array(importRowSchema),
  validCount: z.number().int(),
  errorCount: z.number().int(),
});
export type WorkImportPreview = z.infer<typeof workImportPreviewSchema>;

export const workImportResultSchema = z.object({
  mode: z.literal('commit'),
  imported: z.number().int(),
  skipped: z.array(importRowSchema),
});
export type WorkImportResult = z.infer<typeof workImportResultSchema>;
