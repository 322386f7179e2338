import { formatDate } from '@/shared/format/dates';
import { formatMoney, isoDateInTimeZone, MoneyRuleError, splitSale } from '@/shared/money';
import {
  type LineResolveParsed,
  type LineResult,
  type SaleBatchParsed,
  type SaleBatchResult,
  type SaleInputParsed,
  type SaleResult,
} from '@/shared/schemas/sale';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { findConditionPhoto } from '../condition/condition.repository';
import {
  consignmentRow,
  getConsignment,
  getConsignmentLine,
  termsOf,
} from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { getStudio } from '../studio/studio.service';
import { noteSalesForMaker } from './sale-notice';
import {
  findIssuedStatementOf,
  findLineForSale,
  markLineResolved,
  markLineSold,
  type SaleLineRow,
  unmarkLineSold,
} from './sales.repository';

type Options = { appUrl: string };
/** How the studio writes a date and a time: for messages that say when something happened. */
type Place = { locale: string; timeZone: string };
const placeOf = (studio: { locale: string; time_zone: string }): Place => ({
  locale: studio.locale,
  timeZone: studio.time_zone,
});
type Issue = { path: (string | number)[]; message: string };

const enteredBy = (scope: Scope) => (scope.venueId === null ? 'studio' : 'venue');
const pieceName = (line: SaleLineRow) => `${line.stock_number} ${line.title}`;

/** Pieces are sold, returned or lost while the show is running: from dispatch until it closes. */
const openForSales = ['dispatched', 'on-show'] as const;

async function lineOrNotFound(db: Db, scope: Scope, lineId: number) {
  const line = await findLineForSale(db, scope, lineId);
  if (!line) throw notFound('That piece');
  return line;
}

function checkShowRunning(line: SaleLineRow) {
  if (!(openForSales as readonly string[]).includes(line.consignment_state)) {
    const why =
      line.consignment_state === 'agreed'
        ? 'it has not been sent yet'
        : `${line.reference} is ${line.consignment_state === 'on-show' ? 'on show' : line.consignment_state}`;
    throw new HttpError('conflict', `${pieceName(line)} cannot change now: ${why}.`);
  }
}

/** The refusal for a piece that is no longer out, saying who recorded what, and when. */
function notOut(line: SaleLineRow, { locale, timeZone }: Place): HttpError {
  if (line.state === 'sold') {
    const by = line.sold_by_name
      ? `${line.sold_by_name}${line.sale_entered_by === 'studio' ? ' (the studio)' : ` at ${line.venue_name}`}`
      : line.sale_entered_by === 'studio'
        ? 'the studio'
        : line.venue_name;
    const when = line.sale_recorded_at
      ? ` at ${new Intl.DateTimeFormat(locale, { hour: '2-digit', minute: '2-digit', timeZone }).format(new Date(line.sale_recorded_at))}`
      : '';
    return new HttpError(
      'conflict',
      `${pieceName(line)} is already sold: ${by} recorded the sale on ${formatDate(
        line.sold_on!,
        locale,
      )}${when}.`,
    );
  }
  const by = line.resolved_by_name ? ` by ${line.resolved_by_name}` : '';
  const on = line.resolved_on ? ` on ${formatDate(line.resolved_on, locale)}` : '';
  return new HttpError(
    'conflict',
    `${pieceName(line)} is no longer out: it was marked ${line.state}${by}${on}.`,
  );
}

/** The day rules shared by sales and returns: not before the piece was sent, nor after today. */
function dateIssues(line: SaleLineRow, date: string, today: string, path: Issue['path']) {
  const issues: Issue[] = [];
  if (line.dispatch_date && date < line.dispatch_date) {
    issues.push({
      path,
      message: `The date cannot come before the piece was sent, on ${line.dispatch_date}.`,
    });
  }
  if (date > today) issues.push({ path, message: `The date cannot be after today, ${today}.` });
  return issues;
}

/** Checks one sale against its line and works out its figures, or lists what is wrong. */
function checkSale(line: SaleLineRow, sale: SaleInputParsed, today: string, at: Issue['path']) {
  const listPrice = { amount: line.list_price, currency: line.currency };
  const issues = dateIssues(line, sale.soldOn, today, [...at, 'soldOn']);
  if (sale.salePrice.currency !== line.currency) {
    issues.push({
      path: [...at, 'salePrice', 'currency'],
      message: `${pieceName(line)} is priced in ${line.currency}: record the sale in ${line.currency}.`,
    });
  } else if (sale.salePrice.amount > line.list_price) {
    issues.push({
      path: [...at, 'salePrice'],
      message: `The price paid cannot be above the list price, ${formatMoney(listPrice)}.`,
    });
  }
  if (issues.length > 0) return { issues } as const;
  let split;
  try {
    split = splitSale(termsOf(line), listPrice, sale.salePrice);
  } catch (err) {
    // A discount the terms cannot carry (the maker left less than nothing) is the price's fault.
    if (!(err instanceof MoneyRuleError)) throw err;
    const issue: Issue = { path: [...at, 'salePrice'], message: err.message };
    return { issues: [issue] } as const;
  }
  const discount = line.list_price - sale.salePrice.amount;
  return {
    issues,
    split,
    discount: discount > 0 ? discount : null,
    discountReason: discount > 0 ? (sale.discountReason ?? null) : null,
  } as const;
}

/** Records the sales inside `trx`, all or none, and tells the maker. Answers their splits. */
async function recordSalesIn(
  trx: Db,
  scope: Scope,
  sales: readonly (SaleInputParsed & { lineId: number; path: Issue['path'] })[],
  options: Options & { consignmentId?: number },
) {
  const studio = await getStudio(trx, scope);
  const today = isoDateInTimeZone(new Date(), studio.time_zone);
  const checked = [];
  const issues: Issue[] = [];
  for (const sale of sales) {
    const line = await findLineForSale(trx, scope, sale.lineId);
    if (!line || (options.consignmentId && line.consignment_id !== options.consignmentId)) {
      if (sale.path.length === 0) throw notFound('That piece');
      issues.push({
        path: [...sale.path, 'lineId'],
        message: 'That piece is not on this consignment.',
      });
      continue;
    }
    checkShowRunning(line);
    if (line.state !== 'consigned') throw notOut(line, placeOf(studio));
    const result = checkSale(line, sale, today, sale.path);
    if (!result.split) issues.push(...result.issues);
    else checked.push({ line, sale, ...result, split: result.split });
  }
  if (issues.length > 0)
    throw new HttpError('invalid_request', 'Some fields need attention.', issues);

  const at = new Date().toISOString();
  // In the order of the lines, whatever the receipt's: two receipts sharing pieces then wait for
  // each other on PostgreSQL instead of each holding a piece the other needs.
  const inLineOrder = [...checked].sort((a, b) => a.line.id - b.line.id);
  for (const { line, sale, discount, discountReason, split } of inLineOrder) {
    const sold = await markLineSold(trx, scope, line.id, {
      soldOn: sale.soldOn,
      salePrice: sale.salePrice.amount,
      discount,
      discountReason,
      enteredBy: enteredBy(scope),
      at,
    });
    // Another request sold it between the read and this write: say who.
    if (!sold) throw notOut((await findLineForSale(trx, scope, line.id))!, placeOf(studio));
    await writeAudit(trx, scope, {
      action: 'line.sold',
      entity: 'consignment_line',
      entityId: line.id,
      before: { state: 'consigned' },
      after: {
        state: 'sold',
        soldOn: sale.soldOn,
        salePrice: sale.salePrice,
        discountReason,
        enteredBy: enteredBy(scope),
        split,
      },
    });
  }
  await noteSalesForMaker(
    trx,
    scope,
    checked.map((c) => c.line.id),
    options,
  );
  return checked.map(({ line, split }) => ({
    consignmentId: line.consignment_id,
    lineId: line.id,
    split,
  }));
}

/** One piece sold, at a price up to its list price, from the day it was sent. */
export async function recordSale(
  db: Db,
  scope: Scope,
  lineId: number,
  sale: SaleInputParsed,
  options: Options,
): Promise<SaleResult> {
  const [recorded] = await db
    .transaction()
    .execute((trx) => recordSalesIn(trx, scope, [{ ...sale, lineId, path: [] }], options));
  return {
    line: await getConsignmentLine(db, scope, recorded!.consignmentId, lineId),
    split: recorded!.split,
  };
}

/** A till receipt: several pieces of one consignment sold together, all recorded or none. */
export async function recordSales(
  db: Db,
  scope: Scope,
  consignmentId: number,
  input: SaleBatchParsed,
  options: Options,
): Promise<SaleBatchResult> {
  const recorded = await db.transaction().execute(async (trx) => {
    // A consignment the scope cannot see (another venue's) is not found, whatever its lines.
    await consignmentRow(trx, scope, consignmentId);
    return recordSalesIn(
      trx,
      scope,
      input.sales.map((sale, i) => ({ ...sale, path: ['sales', i] })),
      { ...options, consignmentId },
    );
  });
  const consignment = await getConsignment(db, scope, consignmentId);
  const lines = new Map(consignment.lines.map((l) => [l.id, l]));
  return { sales: recorded.map((r) => ({ line: lines.get(r.lineId)!, split: r.split })) };
}

/**
 * Undoes a sale: the piece is out again. A venue's staff undo only the venue's own entries; no
 * one undoes a sale on an issued statement (a correction is a new statement).
 */
export async function undoSale(db: Db, scope: Scope, lineId: number): Promise<LineResult> {
  const consignmentId = await db.transaction().execute(async (trx) => {
    const line = await lineOrNotFound(trx, scope, lineId);
    if (line.state !== 'sold') {
      throw new HttpError('conflict', `${pieceName(line)} is not sold: there is no sale to undo.`);
    }
    const statement = await findIssuedStatementOf(trx, scope, lineId);
    if (statement) {
      throw new HttpError(
        'conflict',
        `The sale of ${pieceName(line)} is on statement ${statement.reference}, issued${
          statement.issued_at ? ` on ${statement.issued_at.slice(0, 10)}` : ''
        }: it is locked. A correction goes on a new statement.`,
      );
    }
    checkShowRunning(line);
    if (scope.venueId !== null && line.sale_entered_by === 'studio') {
      throw new HttpError(
        'forbidden',
        `The studio entered the sale of ${pieceName(line)}: ask the maker to undo it.`,
      );
    }
    if (!(await unmarkLineSold(trx, scope, lineId, new Date().toISOString()))) {
      throw new HttpError('conflict', `${pieceName(line)} is not sold: there is no sale to undo.`);
    }
    await writeAudit(trx, scope, {
      action: 'line.sale-undone',
      entity: 'consignment_line',
      entityId: lineId,
      before: {
        state: 'sold',
        soldOn: line.sold_on,
        salePrice: { amount: line.sale_price, currency: line.currency },
        enteredBy: line.sale_entered_by,
      },
      after: { state: 'consigned' },
    });
    return line.consignment_id;
  });
  return { line: await getConsignmentLine(db, scope, consignmentId, lineId) };
}

/**
 * A piece out that leaves the consignment another way: returned to the maker, damaged or lost
 * at the venue (a note, a photo of the damage), or withdrawn by the maker (studio roles only).
 */
export async function resolveLine(
  db: Db,
  scope: Scope,
  lineId: number,
  input: LineResolveParsed,
): Promise<LineResult> {
  const consignmentId = await db.transaction().execute(async (trx) => {
    if (input.state === 'withdrawn' && scope.venueId !== null) {
      throw new HttpError('forbidden', 'Only the studio withdraws a piece.');
    }
    const line = await lineOrNotFound(trx, scope, lineId);
    checkShowRunning(line);
    const studio = await getStudio(trx, scope);
    if (line.state !== 'consigned') throw notOut(line, placeOf(studio));
    const today = isoDateInTimeZone(new Date(), studio.time_zone);
    const issues = dateIssues(line, input.on, today, ['on']);
    const photoFileId = input.photoFileId ?? null;
    if (photoFileId !== null && !(await findConditionPhoto(trx, scope, photoFileId))) {
      issues.push({ path: ['photoFileId'], message: 'That photo was not found: send it again.' });
    }
    if (issues.length > 0) {
      throw new HttpError('invalid_request', 'Some fields need attention.', issues);
    }
    const at = new Date().toISOString();
    const resolved = await markLineResolved(trx, scope, lineId, {
      state: input.state,
      on: input.on,
      note: input.note ?? null,
      photoFileId,
      enteredBy: enteredBy(scope),
      at,
    });
    if (!resolved) throw notOut((await findLineForSale(trx, scope, lineId))!, placeOf(studio));
    await writeAudit(trx, scope, {
      action: `line.${input.state}`,
      entity: 'consignment_line',
      entityId: lineId,
      before: { state: 'consigned' },
      after: {
        state: input.state,
        on: input.on,
        note: input.note ?? null,
        photoFileId,
        enteredBy: enteredBy(scope),
      },
    });
    return line.consignment_id;
  });
  return { line: await getConsignmentLine(db, scope, consignmentId, lineId) };
}
