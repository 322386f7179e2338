import { importFieldLabels, importFields } from '@/shared/schemas/work-import';

/** The name a maker reads for a field an import error names; the field's own name otherwise. */
export function fieldLabel(field: string): string {
  const known = importFields.find((f) => f === field);
  return known ? importFieldLabels[known] : field;
}
