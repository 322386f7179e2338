import { type Generated, type Insertable, type Selectable } from 'kysely';

import {
  type ConditionGrade,
  type ConditionStage,
  type FindingKind,
} from '@/shared/schemas/condition';

/** The overall grade is not stored: it is the grade of the most serious finding. */
export interface ConditionReportsTable {
  id: Generated<number>;
  studio_id: number;
  work_id: number;
  consignment_line_id: number | null;
  stage: ConditionStage;
  examiner_name: string;
  examined_by: string | null;
  examined_on: string;
  notes: string | null;
  created_at: Generated<string>;
}
export type ConditionReportRow = Selectable<ConditionReportsTable>;
export type NewConditionReportRow = Insertable<ConditionReportsTable>;

export interface ConditionFindingsTable {
  id: Generated<number>;
  report_id: number;
  kind: FindingKind;
  grade: Exclude<ConditionGrade, 'sound'>;
  location: string | null;
  size_mm: number | null;
  photo_file_id: number | null;
  notes: string | null;
}
export type ConditionFindingRow = Selectable<ConditionFindingsTable>;
export type NewConditionFindingRow = Insertable<ConditionFindingsTable>;
