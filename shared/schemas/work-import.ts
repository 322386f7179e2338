import { z } from 'zod';

import { moneySchema } from './money';

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

/** The name a maker reads for a column an import problem names; the name itself otherwise. */
export function importColumnLabel(column: string): string {
  const known = importColumns.find((c) => c === column);
  return known ? importColumnLabels[known] : column === 'row' ? 'Row' : column;
}

/** The fields a row cannot be imported without; every other cell may be blank. */
export const requiredImportFields: readonly ImportField[] = ['title', 'retailPrice'];

/**
 * Other headers makers commonly use for a column, besides its label and name; matched ignoring
 * case, spaces and punctuation, so "STOCK NO" is "Stock no.".
 */
export const importColumnAliases: Readonly<Partial<Record<ImportColumn, readonly string[]>>> = {
  stockNumber: ['Stock', 'Stock no.', 'Ref', 'Reference', 'SKU'],
  retailPrice: ['Price', 'Retail'],
  costPrice: ['Cost'],
  firingTempC: ['Firing temperature', 'Firing', 'Temperature'],
  clayBody: ['Clay'],
  weightG: ['Weight'],
  heightMm: ['Height'],
  widthMm: ['Width'],
  depthMm: ['Depth'],
  currency: ['Currency code', 'CCY'],
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
  /**
   * Import rows that look like works already imported (same title, year and price) as new works.
   * A stock number already used is never imported, whatever this says: stock numbers are unique.
   */
  importDuplicates: z.boolean({ error: 'Say yes or no.' }).optional(),
});
export type WorkImportRequest = z.infer<typeof workImportRequestSchema>;

/**
 * Why a row looks like one already imported. A stock number already in the catalogue, or on an
 * earlier row of the file, can never be imported again; a row without one that has the same
 * title, year and price as a work in the catalogue or an earlier row can, if the maker says so.
 */
export const importDuplicateKinds = [
  'stock-number-in-catalogue',
  'stock-number-in-file',
  'same-in-catalogue',
  'same-in-file',
] as const;
export type ImportDuplicateKind = (typeof importDuplicateKinds)[number];
export const overridableDuplicates: ReadonlySet<ImportDuplicateKind> = new Set([
  'same-in-catalogue',
  'same-in-file',
]);

/** What the row's measured cells were read as; null where blank or unreadable. */
export const importReadSchema = z.object({
  retailPrice: moneySchema.nullable(),
  costPrice: moneySchema.nullable(),
  heightMm: z.number().nullable(),
  widthMm: z.number().nullable(),
  depthMm: z.number().nullable(),
  weightG: z.number().nullable(),
});
export type ImportRead = z.infer<typeof importReadSchema>;

export const importRowSchema = z.object({
  /** 1-based, counting the header row as row 1, as a spreadsheet shows it */
  rowNumber: z.number().int(),
  stockNumber: z.string().nullable(),
  title: z.string().nullable(),
  read: importReadSchema,
  errors: z.array(z.object({ field: z.string(), message: z.string() })),
  duplicate: z.object({ kind: z.enum(importDuplicateKinds), message: z.string() }).nullable(),
});
export type ImportRow = z.infer<typeof importRowSchema>;

/** One problem and every row that has it. */
export const importProblemSchema = z.object({
  field: z.string(),
  message: z.string(),
  rowNumbers: z.array(z.number().int()),
});
export type ImportProblem = z.infer<typeof importProblemSchema>;

/** One kind of duplicate and every row that is one. */
export const importDuplicateGroupSchema = z.object({
  kind: z.enum(importDuplicateKinds),
  rowNumbers: z.array(z.number().int()),
});
export type ImportDuplicateGroup = z.infer<typeof importDuplicateGroupSchema>;

/**
 * What a preview answers: counts, the rows worth showing, and every problem and duplicate with its
 * rows. Each row counts once: ready, with problems, or (problems aside) a duplicate.
 */
export const workImportPreviewSchema = z.object({
  mode: z.literal('preview'),
  columns: z.array(z.string()),
  mapping: z.partialRecord(importColumnSchema, z.string()),
  rowCount: z.number().int(),
  validCount: z.number().int(),
  errorCount: z.number().int(),
  duplicateCount: z.number().int(),
  /** The duplicates `importDuplicates` would import as new works. */
  importableDuplicateCount: z.number().int(),
  rows: z.array(importRowSchema),
  problems: z.array(importProblemSchema),
  duplicates: z.array(importDuplicateGroupSchema),
});
export type WorkImportPreview = z.infer<typeof workImportPreviewSchema>;

/**
 * What an import answers: how many went in, the first rows skipped, every problem and duplicate
 * with its rows, and every skipped row as CSV (the file's own columns and a Problem column) to
 * correct and import again; null when nothing was skipped.
 */
export const workImportResultSchema = z.object({
  mode: z.literal('commit'),
  imported: z.number().int(),
  skippedCount: z.number().int(),
  skipped: z.array(importRowSchema),
  problems: z.array(importProblemSchema),
  duplicates: z.array(importDuplicateGroupSchema),
  skippedCsv: z.string().nullable(),
});
export type WorkImportResult = z.infer<typeof workImportResultSchema>;
