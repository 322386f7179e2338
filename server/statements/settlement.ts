import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { findConsignmentRow, updateConsignmentIn } from '../consignments/consignments.repository';
import { wrongState } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { listStatementStatesOf, listUnstatedSales } from './statements.repository';

/** A consignment a statement can be made for: one that has been sent. */
export async function findConsignmentForStatement(db: Db, scope: Scope, id: number) {
  const row = await findConsignmentRow(db, scope, id);
  if (!row) throw notFound('That consignment');
  if (!['dispatched', 'on-show', 'closed', 'settled'].includes(row.state)) {
    throw wrongState(row.reference, row.state, 'a statement covers work that has been sent.');
  }
  return row;
}

/**
 * A closed consignment is settled once every sale is on a statement and every statement of it is
 * settled (a show that sold nothing is settled when it closes).
 */
export async function settleConsignmentIfDone(trx: Db, scope: Scope, consignmentId: number) {
  const row = await findConsignmentRow(trx, scope, consignmentId);
  if (!row || row.state !== 'closed') return;
  const unstated = await listUnstatedSales(trx, scope, { consignmentId });
  const states = await listStatementStatesOf(trx, scope, consignmentId);
  if (unstated.length > 0 || states.some((s) => s !== 'settled')) return;
  const settledAt = new Date().toISOString();
  if (
    await updateConsignmentIn(trx, scope, consignmentId, ['closed'], {
      state: 'settled',
      settled_at: settledAt,
    })
  ) {
    await writeAudit(trx, scope, {
      action: 'consignment.settled',
      entity: 'consignment',
      entityId: consignmentId,
      before: { state: 'closed' },
      after: { state: 'settled', settledAt },
    });
  }
}
