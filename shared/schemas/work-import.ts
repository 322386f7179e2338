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

/**
 * The columns an import reads: every work field, and the currency of the row's amounts (checked
 * against the studio's: works are entered in the studio's currency).
 */
export const importColumns = [...importFields, 'currency'] as const;
export const importColumnSchema = z.enum(importColumns);
export type ImportColumn = z.infer<typeof importColumnSchema>;

export const importColumnLabels: Readonly<Record<ImportColumn, string>> = {
  ...importFieldLabels,
  currency: 'Currency',
};

/** 2 MB of CSV is several thousand works; more than that is better split. */
export const maxImportCsvLength = 2_000_000;

/** The most rows one import takes: enough for a whole catalogue, small enough to check at once. */
export const maxImportRows = 5_000;

/**
 * Rows a preview or a result lists in full: the first ready ones, and the first ones with a
 * problem. Every problem is also summed up with all the rows it concerns, so the answer stays
 * small however long the file (a full file of rows would only repeat itself).
 */
export const listedReadyRows = 50;
export const listedProblemRows = 200;

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
  mapping: z.partialRecord(importColumnSchema, z.string().max(200)).optional(),
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

/** One problem and every row that has it. */
export const importProblemSchema = z.object({
  field: z.string(),
  message: z.string(),
  rowNumbers: z.array(z.number().int()),
});
export type ImportProblem = z.infer<typeof importProblemSchema>;

/** What a preview answers: counts, the rows worth showing, and every problem with its rows. */
export const workImportPreviewSchema = z.object({
  mode: z.literal('preview'),
  columns: z.array(z.string()),
  mapping: z.partialRecord(importColumnSchema, z.string()),
  rowCount: z.number().int(),
  validCount: z.number().int(),
  errorCount: z.number().int(),
  rows: z.array(importRowSchema),
  problems: z.array(importProblemSchema),
});
export type WorkImportPreview = z.infer<typeof workImportPreviewSchema>;

/** What an import answers: how many went in, the first rows skipped, every problem with its rows. */
export const workImportResultSchema = z.object({
  mode: z.literal('commit'),
  imported: z.number().int(),
  skippedCount: z.number().int(),
  skipped: z.array(importRowSchema),
  problems: z.array(importProblemSchema),
});
export type WorkImportResult = z.infer<typeof workImportResultSchema>;
