import { z } from 'zod';

import { isoDateSchema } from './dates';
import { lineText, optionalText } from './text';

export const conditionStages = ['dispatch', 'arrival', 'return', 'claim'] as const;
export const conditionStageSchema = z.enum(conditionStages);
export type ConditionStage = z.infer<typeof conditionStageSchema>;

/** Trade terms for what an examiner finds on a ceramic piece. */
export const findingKinds = [
  'chip',
  'crack',
  'hairline-crack',
  'crazing',
  'glaze-fault',
  'loss',
  'abrasion',
  'stain',
  'previous-repair',
] as const;
export const findingKindSchema = z.enum(findingKinds);
export type FindingKind = z.infer<typeof findingKindSchema>;

/**
 * Grades from least to most serious. A report's overall grade is its most serious finding's
 * (Collections Trust, Spectrum "Condition"); a report without findings is `sound`.
 */
export const conditionGrades = ['sound', 'slight', 'marked', 'serious'] as const;
export const conditionGradeSchema = z.enum(conditionGrades);
export type ConditionGrade = z.infer<typeof conditionGradeSchema>;

/**
 * A report's overall grade: its most serious finding's grade, `sound` with none (Collections
 * Trust, Spectrum "Condition": the overall condition is that of the most serious one).
 */
export function overallGrade(findingGrades: readonly ConditionGrade[]): ConditionGrade {
  let worst = 0;
  for (const grade of findingGrades) worst = Math.max(worst, conditionGrades.indexOf(grade));
  return conditionGrades[worst]!;
}

/** Grades a finding can have (a report without findings is `sound`). */
export const findingGrades = ['slight', 'marked', 'serious'] as const;
export const findingGradeSchema = z.enum(findingGrades, {
  error: 'Choose how serious it is: slight, marked or serious.',
});
export type FindingGrade = z.infer<typeof findingGradeSchema>;

/** One thing an examiner found on a piece. */
export const findingInputSchema = z.strictObject({
  kind: z.enum(findingKinds, { error: 'Choose what was found: a chip, a crack, crazing…' }),
  grade: findingGradeSchema,
  location: optionalText('place on the piece', 120),
  sizeMm: z
    .number({ error: 'Enter the size in millimetres.' })
    .int({ error: 'Enter the size as a whole number of millimetres.' })
    .min(1, { error: 'The size must be at least 1 mm.' })
    .max(5000, { error: 'The size must be at most 5000 mm.' })
    .nullable()
    .optional(),
  photoFileId: z.number().int().positive().nullable().optional(),
  notes: optionalText('notes', 1000, 'lines'),
});
export type FindingInput = z.input<typeof findingInputSchema>;

const reportFields = {
  examinerName: lineText('examiner’s name', 120).min(1, { error: 'Enter who examined the piece.' }),
  examinedOn: isoDateSchema,
  findings: z.array(findingInputSchema).max(50, { error: 'Record at most 50 findings a report.' }),
  notes: optionalText('notes', 2000, 'lines'),
};

/** Who examined a piece and when, as a check's form asks for them before its findings. */
export const reportHeaderSchema = z.strictObject({
  examinerName: reportFields.examinerName,
  examinedOn: reportFields.examinedOn,
  notes: reportFields.notes,
});

/** `POST /api/consignment-lines/:lineId/condition-reports` */
export const conditionReportCreateSchema = z.strictObject({
  stage: conditionStageSchema,
  ...reportFields,
});
export type ConditionReportCreate = z.input<typeof conditionReportCreateSchema>;
export type ConditionReportCreateParsed = z.output<typeof conditionReportCreateSchema>;

/** One piece's arrival check, inside the venue's acknowledgment. */
export const arrivalReportSchema = z.strictObject({
  lineId: z.number().int().positive(),
  ...reportFields,
});
export type ArrivalReport = z.input<typeof arrivalReportSchema>;

export const findingSchema = z.object({
  id: z.number().int(),
  kind: findingKindSchema,
  grade: findingGradeSchema,
  location: z.string().nullable(),
  sizeMm: z.number().int().nullable(),
  photoUrl: z.string().nullable(),
  notes: z.string().nullable(),
});
export type Finding = z.infer<typeof findingSchema>;

/** A condition report as answered: its findings and overall grade. */
export const conditionCheckSchema = z.object({
  id: z.number().int(),
  stage: conditionStageSchema,
  examinerName: z.string(),
  examinedOn: isoDateSchema,
  overallGrade: conditionGradeSchema,
  findings: z.array(findingSchema),
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type ConditionCheck = z.infer<typeof conditionCheckSchema>;

/**
 * How a later check differs from the dispatch check: a finding that is `new` (or worse: its
 * grade rose), `changed` (same kind and place, other grade or size), or `missing` (recorded at
 * dispatch, not found since).
 */
export const conditionDifferenceSchema = z.object({
  change: z.enum(['new', 'changed', 'missing']),
  finding: findingSchema,
  before: findingSchema.nullable(),
});
export type ConditionDifference = z.infer<typeof conditionDifferenceSchema>;

/** `POST /api/condition-photos` answers the stored photo, to name in a finding. */
export const conditionPhotoSchema = z.object({ fileId: z.number().int(), url: z.string() });
export type ConditionPhoto = z.infer<typeof conditionPhotoSchema>;

/** A report as `POST …/condition-reports` answers it: the check and its line. */
export const conditionReportSchema = conditionCheckSchema.extend({ lineId: z.number().int() });
