import { z } from 'zod';

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
