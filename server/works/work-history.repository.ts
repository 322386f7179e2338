import { type ConditionGrade, overallGrade } from '@/shared/schemas/condition';
import { type WorkHistory } from '@/shared/schemas/work-history';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** Every consignment the work has been on and every condition report on it, newest first. */
export async function getWorkHistory(db: Db, scope: Scope, workId: number): Promise<WorkHistory> {
  const lines = await scoped
    .consignmentLines(db, scope)
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .where('consignment_lines.work_id', '=', workId)
    .select([
      'consignment_lines.id as line_id',
      'consignments.id as consignment_id',
      'consignments.reference',
      'consignments.title',
      'consignments.state as consignment_state',
      'venues.name as venue_name',
      'consignment_lines.state as line_state',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.sale_price',
      'consignment_lines.sold_on',
      'consignments.dispatch_date',
    ])
    .orderBy('consignment_lines.id', 'desc')
    .execute();

  const reports = await scoped
    .conditionReports(db, scope)
    .where('condition_reports.work_id', '=', workId)
    .select([
      'condition_reports.id',
      'condition_reports.stage',
      'condition_reports.examined_on',
      'condition_reports.examiner_name',
    ])
    .orderBy('condition_reports.examined_on', 'desc')
    .orderBy('condition_reports.id', 'desc')
    .execute();
  const findings =
    reports.length === 0
      ? []
      : await db
          .selectFrom('condition_findings')
          .select(['condition_findings.report_id', 'condition_findings.grade'])
          .where(
            'condition_findings.report_id',
            'in',
            reports.map((r) => r.id),
          )
          .execute();
  const gradesByReport = new Map<number, ConditionGrade[]>();
  for (const f of findings) {
    gradesByReport.set(f.report_id, [...(gradesByReport.get(f.report_id) ?? []), f.grade]);
  }

  return {
    consignments: lines.map((l) => ({
      lineId: l.line_id,
      consignmentId: l.consignment_id,
      reference: l.reference,
      title: l.title,
      consignmentState: l.consignment_state,
      venueName: l.venue_name,
      lineState: l.line_state,
      listPrice: { amount: l.list_price, currency: l.currency },
      salePrice: l.sale_price === null ? null : { amount: l.sale_price, currency: l.currency },
      soldOn: l.sold_on,
      dispatchDate: l.dispatch_date,
    })),
    conditionReports: reports.map((r) => {
      const grades = gradesByReport.get(r.id) ?? [];
      return {
        id: r.id,
        stage: r.stage,
        grade: overallGrade(grades),
        examinedOn: r.examined_on,
        examinerName: r.examiner_name,
        findingCount: grades.length,
      };
    }),
  };
}
