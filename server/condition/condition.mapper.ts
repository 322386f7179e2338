import { type ConditionCheck, type Finding, overallGrade } from '@/shared/schemas/condition';

import { type ReportRow } from './condition.repository';

export const conditionPhotoUrl = (fileId: number) => `/api/condition-photos/${fileId}`;

export function toFinding(row: ReportRow['findings'][number]): Finding {
  return {
    id: row.id,
    kind: row.kind,
    grade: row.grade,
    location: row.location,
    sizeMm: row.size_mm,
    photoUrl: row.photo_file_id === null ? null : conditionPhotoUrl(row.photo_file_id),
    notes: row.notes,
  };
}

/** A report as the API shows it, graded by its most serious finding (docs/condition.md). */
export function toConditionCheck(row: ReportRow): ConditionCheck {
  const findings = row.findings.map(toFinding);
  return {
    id: row.id,
    stage: row.stage,
    examinerName: row.examiner_name,
    examinedOn: row.examined_on,
    overallGrade: overallGrade(findings.map((f) => f.grade)),
    findings,
    notes: row.notes,
    createdAt: row.created_at,
  };
}
