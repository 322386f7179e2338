import { insuranceValue } from '@/shared/money';
import { type Consignment, type LineCreate, type LineUpdate } from '@/shared/schemas/consignment';
import { type Money } from '@/shared/schemas/money';
import { type Terms } from '@/shared/schemas/terms';
import { type WorkStatus } from '@/shared/schemas/work';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { findWorkRow } from '../works/works.repository';
import {
  deleteLine,
  findHolder,
  findLineOf,
  insertHoldingLine,
  updateLine,
} from './consignments.repository';
import { consignmentRow, getConsignment, termsOf, wrongState } from './consignments.service';

const onlyDraft = 'pieces are added, priced and removed while it is being put together.';

function fieldError(path: (string | number)[], message: string) {
  return new HttpError('invalid_request', 'Some fields need attention.', [{ path, message }]);
}

function checkCurrency(terms: Terms, price: Money) {
  if (price.currency !== terms.currency) {
    throw fieldError(
      ['listPrice', 'currency'],
      `This consignment's terms are in ${terms.currency}: price the piece in ${terms.currency}.`,
    );
  }
}

const unavailable: Partial<Record<WorkStatus, string>> = {
  sold: 'has been sold',
  damaged: 'came back damaged: mark it returned to the studio first',
  lost: 'was lost',
};

/** Why a work cannot go on this consignment: where it is held, or what became of it. */
async function refusal(
  trx: Db,
  scope: Scope,
  consignmentId: number,
  workId: number,
  stock: string,
) {
  const holder = await findHolder(trx, scope, workId);
  if (!holder) return new HttpError('conflict', `${stock} cannot be added now. Try again.`);
  const message =
    holder.id === consignmentId
      ? `${stock} is already on this consignment.`
      : `${stock} is on ${holder.reference} “${holder.title}” (${
          holder.state === 'draft' || holder.state === 'agreed'
            ? 'reserved, not yet sent'
            : 'out at the venue'
        }): a work goes on one open consignment at a time.`;
  return new HttpError('conflict', message, [{ path: ['workId'], message }]);
}

/**
 * Adds a work in the studio to a draft, at its retail price unless another is given, insured by
 * the consignment's terms. The database's hold on the work refuses a second open consignment,
 * also when two requests race; the refusal names the consignment that holds it.
 */
export async function addLine(
  db: Db,
  scope: Scope,
  consignmentId: number,
  input: LineCreate,
): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, consignmentId);
    if (row.state !== 'draft') throw wrongState(row.reference, row.state, onlyDraft);
    const work = await findWorkRow(trx, scope, input.workId);
    if (!work) throw fieldError(['workId'], 'That work was not found.');
    if (work.archived_at !== null) {
      throw fieldError(['workId'], `${work.stock_number} is archived: restore it first.`);
    }
    const why = unavailable[work.status];
    if (why)
      throw new HttpError('conflict', `${work.stock_number} ${why}.`, [
        { path: ['workId'], message: `${work.stock_number} ${why}.` },
      ]);
    const terms = termsOf(row);
    const price = input.listPrice ?? { amount: work.retail_price, currency: work.currency };
    checkCurrency(terms, price);
    const lineId = await insertHoldingLine(trx, scope, {
      consignmentId,
      workId: work.id,
      currency: price.currency,
      listPrice: price.amount,
      insuranceValue: insuranceValue(terms, price).amount,
    });
    if (lineId === undefined) {
      throw await refusal(trx, scope, consignmentId, work.id, work.stock_number);
    }
    await writeAudit(trx, scope, {
      action: 'consignment.line-added',
      entity: 'consignment',
      entityId: consignmentId,
      before: null,
      after: { lineId, workId: work.id, stockNumber: work.stock_number, listPrice: price },
    });
  });
  return getConsignment(db, scope, consignmentId);
}

/** A new list price for a piece of a draft; its insurance value follows. */
export async function updateLinePrice(
  db: Db,
  scope: Scope,
  consignmentId: number,
  lineId: number,
  input: LineUpdate,
): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, consignmentId);
    const line = await findLineOf(trx, scope, consignmentId, lineId);
    if (!line) throw notFound('That piece on this consignment');
    if (row.state !== 'draft') throw wrongState(row.reference, row.state, onlyDraft);
    const terms = termsOf(row);
    checkCurrency(terms, input.listPrice);
    await updateLine(trx, scope, lineId, {
      list_price: input.listPrice.amount,
      insurance_value: insuranceValue(terms, input.listPrice).amount,
    });
    await writeAudit(trx, scope, {
      action: 'consignment.line-price-changed',
      entity: 'consignment',
      entityId: consignmentId,
      before: {
        lineId,
        stockNumber: line.stock_number,
        listPrice: { amount: line.list_price, currency: line.currency },
      },
      after: { lineId, listPrice: input.listPrice },
    });
  });
  return getConsignment(db, scope, consignmentId);
}

/** Takes a piece off a draft; its work is free for another consignment. */
export async function removeLine(
  db: Db,
  scope: Scope,
  consignmentId: number,
  lineId: number,
): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, consignmentId);
    const line = await findLineOf(trx, scope, consignmentId, lineId);
    if (!line) throw notFound('That piece on this consignment');
    if (row.state !== 'draft') throw wrongState(row.reference, row.state, onlyDraft);
    await deleteLine(trx, scope, lineId);
    await writeAudit(trx, scope, {
      action: 'consignment.line-removed',
      entity: 'consignment',
      entityId: consignmentId,
      before: { lineId, stockNumber: line.stock_number },
      after: null,
    });
  });
  return getConsignment(db, scope, consignmentId);
}
