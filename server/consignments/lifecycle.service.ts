import { isoDateInTimeZone } from '@/shared/money';
import { type Acknowledge, type Consignment } from '@/shared/schemas/consignment';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { latestChecksByLine, recordCheck } from '../condition/condition.service';
import { type Db } from '../db/database';
import { HttpError } from '../http/http-error';
import { inviteVenueStaff } from '../invitations/invitations.service';
import { settleConsignmentIfDone } from '../statements/settlement';
import { getStudio } from '../studio/studio.service';
import { listLineRows, updateConsignmentIn, withdrawOpenLines } from './consignments.repository';
import { consignmentRow, getConsignment, termsOf, wrongState } from './consignments.service';
import { queueDispatchMail } from './dispatch-mail';

/** Freezes the terms: from now the venue sees the consignment, and nothing of it changes. */
export async function agreeConsignment(db: Db, scope: Scope, id: number): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, id);
    if (row.state !== 'draft')
      throw wrongState(row.reference, row.state, 'only a draft is agreed.');
    const lines = await listLineRows(trx, scope, id);
    if (lines.length === 0) {
      throw new HttpError(
        'conflict',
        `Add the pieces to ${row.reference} before agreeing its terms.`,
      );
    }
    const agreedAt = new Date().toISOString();
    if (
      !(await updateConsignmentIn(trx, scope, id, ['draft'], {
        state: 'agreed',
        agreed_at: agreedAt,
      }))
    ) {
      throw wrongState(row.reference, 'agreed', 'only a draft is agreed.');
    }
    await writeAudit(trx, scope, {
      action: 'consignment.agreed',
      entity: 'consignment',
      entityId: id,
      before: { state: 'draft' },
      after: { state: 'agreed', agreedAt, terms: termsOf(row) },
    });
  });
  return getConsignment(db, scope, id);
}

/**
 * Sends the batch: every piece must have its dispatch check (the refusal lists those without).
 * The venue's contact is e-mailed the consignment sheet, the condition report and the labels,
 * with an invitation to sign in, in the same transaction as the change.
 */
export async function dispatchConsignment(
  db: Db,
  scope: Scope,
  id: number,
  { appUrl }: { appUrl: string },
): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, id);
    if (row.state === 'draft') {
      throw wrongState(row.reference, row.state, 'agree its terms before sending it.');
    }
    if (row.state !== 'agreed') throw wrongState(row.reference, row.state, 'it is sent once.');
    const lines = (await listLineRows(trx, scope, id)).filter((l) => l.state === 'consigned');
    const checks = await latestChecksByLine(
      trx,
      scope,
      lines.map((l) => l.id),
    );
    const unchecked = lines.filter((l) => !checks.get(l.id)?.dispatch);
    if (unchecked.length > 0) {
      const names = unchecked.map((l) => `${l.stock_number} ${l.title}`).join('; ');
      throw new HttpError(
        'conflict',
        `Check the condition of every piece before sending ${row.reference}. Not yet checked: ${names}.`,
        unchecked.map((l) => ({
          path: ['lines', l.id],
          message: `${l.stock_number} has no dispatch check.`,
        })),
      );
    }
    const studio = await getStudio(trx, scope);
    // The day it actually goes, in the studio's time zone: the planned date gives way to it, as
    // sales count from it.
    const dispatchDate = isoDateInTimeZone(new Date(), studio.time_zone);
    const dispatchedAt = new Date().toISOString();
    const changed = await updateConsignmentIn(trx, scope, id, ['agreed'], {
      state: 'dispatched',
      dispatch_date: dispatchDate,
      dispatched_at: dispatchedAt,
    });
    if (!changed) throw wrongState(row.reference, 'dispatched', 'it is sent once.');
    const invitation = await inviteVenueStaff(trx, scope, {
      id: row.venue_id,
      email: row.venue_email,
    });
    const mailId = row.venue_email
      ? await queueDispatchMail(trx, scope, {
          row: { ...row, venue_email: row.venue_email },
          studio,
          lines,
          dispatchDate,
          invitationToken: invitation?.token ?? null,
          appUrl,
        })
      : null;
    await writeAudit(trx, scope, {
      action: 'consignment.dispatched',
      entity: 'consignment',
      entityId: id,
      before: { state: 'agreed', dispatchDate: row.dispatch_date },
      after: {
        state: 'dispatched',
        dispatchDate,
        dispatchedAt,
        mailedTo: row.venue_email,
        mailId,
        invited: invitation !== null,
      },
    });
  });
  return getConsignment(db, scope, id);
}

/** Calls off a consignment not yet sent: its pieces are withdrawn and free again. */
export async function cancelConsignment(db: Db, scope: Scope, id: number): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, id);
    if (row.state !== 'draft' && row.state !== 'agreed') {
      throw wrongState(row.reference, row.state, 'only a consignment not yet sent is cancelled.');
    }
    const cancelledAt = new Date().toISOString();
    const changed = await updateConsignmentIn(trx, scope, id, ['draft', 'agreed'], {
      state: 'cancelled',
      cancelled_at: cancelledAt,
    });
    if (!changed)
      throw wrongState(
        row.reference,
        'dispatched',
        'only a consignment not yet sent is cancelled.',
      );
    await withdrawOpenLines(trx, scope, id);
    await writeAudit(trx, scope, {
      action: 'consignment.cancelled',
      entity: 'consignment',
      entityId: id,
      before: { state: row.state },
      after: { state: 'cancelled', cancelledAt },
    });
  });
  return getConsignment(db, scope, id);
}

/**
 * The venue acknowledges what arrived: an arrival check for every piece sent (starting from its
 * dispatch check), after which the consignment is on show.
 */
export async function acknowledgeConsignment(
  db: Db,
  scope: Scope,
  id: number,
  input: Acknowledge,
): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, id);
    if (row.state === 'on-show') {
      throw new HttpError(
        'conflict',
        `${row.reference} was acknowledged on ${row.acknowledged_at?.slice(0, 10)}${
          row.acknowledged_by_name ? ` by ${row.acknowledged_by_name}` : ''
        }.`,
      );
    }
    if (row.state !== 'dispatched') {
      throw wrongState(row.reference, row.state, 'arrival is acknowledged once it has been sent.');
    }
    const lines = (await listLineRows(trx, scope, id)).filter((l) => l.state === 'consigned');
    const expected = new Set(lines.map((l) => l.id));
    const issues = input.reports.flatMap((report, i) =>
      expected.has(report.lineId)
        ? []
        : [
            {
              path: ['reports', i, 'lineId'],
              message: 'That piece is not out on this consignment.',
            },
          ],
    );
    const given = new Set(input.reports.map((r) => r.lineId));
    if (given.size !== input.reports.length) {
      issues.push({ path: ['reports'], message: 'Send one check for each piece.' });
    }
    for (const line of lines.filter((l) => !given.has(l.id))) {
      issues.push({ path: ['reports'], message: `Check ${line.stock_number} ${line.title} too.` });
    }
    if (issues.length > 0)
      throw new HttpError('invalid_request', 'Some fields need attention.', issues);

    for (const report of input.reports) {
      await recordCheck(trx, scope, report.lineId, 'arrival', report);
    }
    const acknowledgedAt = new Date().toISOString();
    const changed = await updateConsignmentIn(trx, scope, id, ['dispatched'], {
      state: 'on-show',
      acknowledged_at: acknowledgedAt,
      acknowledged_by: scope.userId,
    });
    if (!changed) throw wrongState(row.reference, 'on-show', 'arrival is acknowledged once.');
    await writeAudit(trx, scope, {
      action: 'consignment.acknowledged',
      entity: 'consignment',
      entityId: id,
      before: { state: 'dispatched' },
      after: { state: 'on-show', acknowledgedAt, pieces: input.reports.length },
    });
  });
  return getConsignment(db, scope, id);
}

/**
 * Closes a show once every piece is accounted for: sold, returned, damaged, lost or withdrawn. The
 * refusal lists the pieces still out. A show that sold nothing is settled at once.
 */
export async function closeConsignment(db: Db, scope: Scope, id: number): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, id);
    if (row.state !== 'dispatched' && row.state !== 'on-show') {
      throw wrongState(row.reference, row.state, 'only a show that has been sent is closed.');
    }
    const out = (await listLineRows(trx, scope, id)).filter((l) => l.state === 'consigned');
    if (out.length > 0) {
      throw new HttpError(
        'conflict',
        `Account for every piece before closing ${row.reference}. Still out: ${out
          .map((l) => `${l.stock_number} ${l.title}`)
          .join('; ')}.`,
        out.map((l) => ({
          path: ['lines', l.id],
          message: `${l.stock_number} is still out: mark it sold, returned, damaged or lost.`,
        })),
      );
    }
    const closedAt = new Date().toISOString();
    if (
      !(await updateConsignmentIn(trx, scope, id, ['dispatched', 'on-show'], {
        state: 'closed',
        closed_at: closedAt,
      }))
    ) {
      throw wrongState(row.reference, 'closed', 'it is closed once.');
    }
    await writeAudit(trx, scope, {
      action: 'consignment.closed',
      entity: 'consignment',
      entityId: id,
      before: { state: row.state },
      after: { state: 'closed', closedAt },
    });
    await settleConsignmentIfDone(trx, scope, id);
  });
  return getConsignment(db, scope, id);
}
