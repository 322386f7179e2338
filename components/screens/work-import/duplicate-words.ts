import { type ImportDuplicateKind } from '@/shared/schemas/work-import';

/** How each kind of duplicate is named on a list of them, and what becomes of it. */
export const duplicateWords: Readonly<
  Record<ImportDuplicateKind, { title: string; outcome: string }>
> = {
  'stock-number-in-catalogue': {
    title: 'Stock number already in the catalogue',
    outcome:
      'Never imported: stock numbers are unique. Give the row another stock number, or leave it blank to have one made.',
  },
  'stock-number-in-file': {
    title: 'Stock number repeated in the file',
    outcome: 'Only the first row with a stock number is imported: stock numbers are unique.',
  },
  'same-in-catalogue': {
    title: 'Same title, year and price as a work in the catalogue',
    outcome: 'Probably imported before. Skipped unless you import them anyway as new works.',
  },
  'same-in-file': {
    title: 'Same title, year and price as an earlier row',
    outcome: 'Skipped unless you import them anyway as new works.',
  },
};
