import { type AccountsTable } from './accounts';
import { type AuditLogTable } from './audit-log';
import { type CalendarFeedsTable } from './calendar-feeds';
import { type ConditionFindingsTable, type ConditionReportsTable } from './condition-reports';
import { type ConsignmentLinesTable, type ConsignmentsTable } from './consignments';
import { type FilesTable } from './files';
import { type InvitationsTable } from './invitations';
import { type MembershipsTable } from './memberships';
import { type OutboxTable } from './outbox';
import { type PaymentsTable } from './payments';
import { type SessionsTable } from './sessions';
import { type SignInLimitsTable } from './sign-in-limits';
import {
  type StatementAdjustmentsTable,
  type StatementLinesTable,
  type StatementsTable,
} from './statements';
import { type StudiosTable } from './studios';
import { type UsersTable } from './users';
import { type VenuesTable } from './venues';
import { type VerificationsTable } from './verifications';
import { type WorkPhotosTable, type WorksTable } from './works';

export interface Database {
  users: UsersTable;
  sessions: SessionsTable;
  accounts: AccountsTable;
  verifications: VerificationsTable;
  studios: StudiosTable;
  memberships: MembershipsTable;
  invitations: InvitationsTable;
  venues: VenuesTable;
  files: FilesTable;
  works: WorksTable;
  work_photos: WorkPhotosTable;
  consignments: ConsignmentsTable;
  consignment_lines: ConsignmentLinesTable;
  condition_reports: ConditionReportsTable;
  condition_findings: ConditionFindingsTable;
  statements: StatementsTable;
  statement_lines: StatementLinesTable;
  statement_adjustments: StatementAdjustmentsTable;
  payments: PaymentsTable;
  outbox: OutboxTable;
  audit_log: AuditLogTable;
  sign_in_limits: SignInLimitsTable;
  calendar_feeds: CalendarFeedsTable;
}
