import {
  type ConditionStage,
  type FindingGrade,
  type FindingKind,
} from '@/shared/schemas/condition';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** A consignment line the scope may see, with what deciding on a condition report needs. */
export async function findLineForCheck(db: Db, scope: Scope, lineId: number) {
  return scoped
    .consignmentLines(db, scope)
    .select([
      'consignment_lines.id',
      'consignment_lines.work_id',
      'consignment_lines.state',
      'consignments.id as consignment_id',
      'consignments.state as consignment_state',
    ])
    .where('consignment_lines.id', '=', lineId)
    .executeTakeFirst();
}

export type NewReport = {
  lineId: number;
  workId: number;
  stage: ConditionStage;
  examinerName: string;
  examinedOn: string;
  notes: string | null;
  findings: {
    kind: FindingKind;
    grade: FindingGrade;
    location: string | null;
    sizeMm: number | null;
    photoFileId: number | null;
    notes: string | null;
  }[];
};

export async function insertReport(db: Db, scope: Scope, report: NewReport): Promise<number> {
  const { id } = await db
    .insertInto('condition_reports')
    .values({
      studio_id: scope.studioId,
      work_id: report.workId,
      consignment_line_id: report.lineId,
      stage: report.stage,
      examiner_name: report.examinerName,
      examined_by: scope.userId,
      examined_on: report.examinedOn,
      notes: report.notes,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  if (report.findings.length > 0) {
    await db
      .insertInto('condition_findings')
      .values(
        report.findings.map((f) => ({
          report_id: id,
          kind: f.kind,
          grade: f.grade,
          location: f.location,
          size_mm: f.sizeMm,
          photo_file_id: f.photoFileId,
          notes: f.notes,
        })),
      )
      .execute();
  }
  return id;
}

/** The reports on these lines, oldest first, each with its findings in the order recorded. */
export async function listReportsOfLines(db: Db, scope: Scope, lineIds: readonly number[]) {
  if (lineIds.length === 0) return [];
  const reports = await scoped
    .conditionReports(db, scope)
    .select([
      'condition_reports.id',
      'condition_reports.consignment_line_id',
      'condition_reports.stage',
      'condition_reports.examiner_name',
      'condition_reports.examined_on',
      'condition_reports.notes',
      'condition_reports.created_at',
    ])
    .where('condition_reports.consignment_line_id', 'in', lineIds)
    .orderBy('condition_reports.id')
    .execute();
  const findings =
    reports.length === 0
      ? []
      : await db
          .selectFrom('condition_findings')
          .select([
            'condition_findings.id',
            'condition_findings.report_id',
            'condition_findings.kind',
            'condition_findings.grade',
            'condition_findings.location',
            'condition_findings.size_mm',
            'condition_findings.photo_file_id',
            'condition_findings.notes',
          ])
          .where(
            'condition_findings.report_id',
            'in',
            reports.map((r) => r.id),
          )
          .orderBy('condition_findings.id')
          .execute();
  return reports.map((report) => ({
    ...report,
    findings: findings.filter((f) => f.report_id === report.id),
  }));
}
export type ReportRow = Awaited<ReturnType<typeof listReportsOfLines>>[number];

/** Which of these files the studio holds. */
export async function studioFileIds(db: Db, scope: Scope, fileIds: readonly number[]) {
  if (fileIds.length === 0) return new Set<number>();
  const rows = await scoped
    .files(db, scope)
    .select('files.id')
    .where('files.id', 'in', fileIds)
    .execute();
  return new Set(rows.map((r) => r.id));
}

/**
 * A condition photo the scope may see: any of the studio's to its own people; to a venue's staff,
 * one a finding they can see shows, or one they uploaded themselves.
 */
export async function findConditionPhoto(db: Db, scope: Scope, fileId: number) {
  let q = scoped
    .files(db, scope)
    .select(['files.id', 'files.sha256'])
    .where('files.id', '=', fileId);
  if (scope.venueId !== null) {
    const visibleFindings = scoped
      .conditionReports(db, scope)
      .innerJoin('condition_findings', 'condition_findings.report_id', 'condition_reports.id')
      .select('condition_findings.photo_file_id');
    const visibleResolutions = scoped
      .consignmentLines(db, scope)
      .select('consignment_lines.resolution_photo_id');
    q = q.where((eb) =>
      eb.or([
        eb('files.created_by', '=', scope.userId),
        eb('files.id', 'in', visibleFindings),
        eb('files.id', 'in', visibleResolutions),
      ]),
    );
  }
  return q.executeTakeFirst();
}
