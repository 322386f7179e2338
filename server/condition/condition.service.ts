import {
  type ConditionCheck,
  type ConditionReportCreateParsed,
  type ConditionStage,
} from '@/shared/schemas/condition';
import { type ConsignmentState, type LineState } from '@/shared/schemas/consignment';
import { type Role } from '@/shared/schemas/membership';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { toConditionCheck } from './condition.mapper';
import {
  findLineForCheck,
  insertReport,
  listReportsOfLines,
  studioFileIds,
} from './condition.repository';

type StageRule = {
  roles: readonly Role[];
  consignmentStates: readonly ConsignmentState[];
  lineStates: readonly LineState[];
  when: string;
};

/** Who checks a piece at each stage, and when (docs/condition.md). */
const stageRules: Record<ConditionStage, StageRule> = {
  dispatch: {
    roles: ['owner', 'assistant'],
    consignmentStates: ['draft', 'agreed'],
    lineStates: ['consigned'],
    when: 'before the consignment is sent',
  },
  arrival: {
    roles: ['gallery', 'owner', 'assistant'],
    consignmentStates: ['dispatched', 'on-show'],
    lineStates: ['consigned'],
    when: 'once the consignment has been sent',
  },
  return: {
    roles: ['owner', 'assistant'],
    consignmentStates: ['dispatched', 'on-show', 'closed', 'settled'],
    lineStates: ['consigned', 'returned', 'damaged'],
    when: 'once the piece has been sent',
  },
  claim: {
    roles: ['owner', 'assistant'],
    consignmentStates: ['dispatched', 'on-show', 'closed', 'settled'],
    lineStates: ['returned', 'damaged', 'lost'],
    when: 'once the piece has come back damaged or been lost',
  },
};

const stageWords: Record<ConditionStage, string> = {
  dispatch: 'Dispatch',
  arrival: 'Arrival',
  return: 'Return',
  claim: 'Claim',
};

export type ReportInput = Omit<ConditionReportCreateParsed, 'stage'>;

/**
 * Records one piece's condition at a stage, inside the caller's transaction. The photos it names
 * must be the studio's; the stage must be one this role records, at this point of the show.
 */
export async function recordCheck(
  trx: Db,
  scope: Scope,
  lineId: number,
  stage: ConditionStage,
  input: ReportInput,
): Promise<number> {
  const line = await findLineForCheck(trx, scope, lineId);
  if (!line) throw notFound('That piece on a consignment');
  const rule = stageRules[stage];
  if (!rule.roles.includes(scope.role)) {
    throw new HttpError(
      'forbidden',
      `Your role does not record ${stageWords[stage].toLowerCase()} checks.`,
    );
  }
  if (
    !rule.consignmentStates.includes(line.consignment_state) ||
    !rule.lineStates.includes(line.state)
  ) {
    throw new HttpError('conflict', `${stageWords[stage]} checks are recorded ${rule.when}.`);
  }
  const photoIds = input.findings.map((f) => f.photoFileId).filter((id): id is number => !!id);
  const known = await studioFileIds(trx, scope, photoIds);
  const issues = input.findings.flatMap((f, i) =>
    f.photoFileId && !known.has(f.photoFileId)
      ? [
          {
            path: ['findings', i, 'photoFileId'],
            message: 'That photo was not found; add it again.',
          },
        ]
      : [],
  );
  if (issues.length > 0)
    throw new HttpError('invalid_request', 'Some fields need attention.', issues);
  return insertReport(trx, scope, {
    lineId,
    workId: line.work_id,
    stage,
    examinerName: input.examinerName,
    examinedOn: input.examinedOn,
    notes: input.notes ?? null,
    findings: input.findings.map((f) => ({
      kind: f.kind,
      grade: f.grade,
      location: f.location ?? null,
      sizeMm: f.sizeMm ?? null,
      photoFileId: f.photoFileId ?? null,
      notes: f.notes ?? null,
    })),
  });
}

/** One report as the API answers it, after it has been written. */
export async function getCheck(db: Db, scope: Scope, lineId: number, reportId: number) {
  const reports = await listReportsOfLines(db, scope, [lineId]);
  const report = reports.find((r) => r.id === reportId);
  if (!report) throw notFound('That condition report');
  return { ...toConditionCheck(report), lineId };
}

/** The latest check of each stage for each line: what a consignment page shows beside a piece. */
export async function latestChecksByLine(db: Db, scope: Scope, lineIds: readonly number[]) {
  const byLine = new Map<number, Partial<Record<ConditionStage, ConditionCheck>>>();
  for (const report of await listReportsOfLines(db, scope, lineIds)) {
    const lineId = report.consignment_line_id!;
    const checks = byLine.get(lineId) ?? {};
    checks[report.stage] = toConditionCheck(report);
    byLine.set(lineId, checks);
  }
  return byLine;
}
