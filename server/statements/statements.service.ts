import { buildStatement, formatMoney, isoDateInTimeZone } from '@/shared/money';
import { type Money } from '@/shared/schemas/money';
import {
  type AdjustmentCreate,
  type PaymentCreate,
  type PaymentMethod,
  type Statement,
  type StatementList,
} from '@/shared/schemas/statement';
import { type Terms, termsSchema } from '@/shared/schemas/terms';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { nextReference } from '../consignments/references';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { getStudio } from '../studio/studio.service';
import { findVenueRow } from '../venues/venues.repository';
import { findConsignmentForStatement, settleConsignmentIfDone } from './settlement';
import { queueStatementMail } from './statement-mail';
import {
  findDraftFor,
  findStatementRow,
  insertAdjustment,
  insertPayment,
  insertStatement,
  insertStatementLines,
  listAdjustments,
  listFrozenLines,
  listPayments,
  listStatementReferencesLike,
  listStatementRows,
  listUnstatedSales,
  lockStatement,
  type SaleRow,
  type StatementRow,
  updateStatementIn,
} from './statements.repository';

const parseTerms = (json: string | null): Terms => termsSchema.parse(JSON.parse(json ?? 'null'));

/** What a statement's sales come to, by the money engine (docs/money-rules.md, "A statement"). */
function figuresOf(terms: Terms, sales: readonly SaleRow[], period: { from: string; to: string }) {
  const closingDate = sales.find((s) => s.closing_date)?.closing_date ?? null;
  return buildStatement({
    terms,
    period,
    closingDate,
    payments: [],
    lines: sales.map((s) => ({
      id: s.id,
      listPrice: { amount: s.list_price, currency: s.currency },
      sale: { date: s.sold_on!, price: { amount: s.sale_price!, currency: s.currency } },
      terms: parseTerms(s.terms),
    })),
  });
}

function periodOf(row: StatementRow) {
  return { from: row.period_start, to: row.period_end };
}

/** A draft's sales: those of its consignment or venue and period that no issued statement covers. */
const draftSales = (db: Db, scope: Scope, row: StatementRow) =>
  listUnstatedSales(
    db,
    { ...scope, venueId: null },
    row.consignment_id === null
      ? { venueId: row.venue_id, from: row.period_start, to: row.period_end }
      : { consignmentId: row.consignment_id },
  );

/** A statement as it stands: a draft follows the sales; an issued one is as it was issued. */
export async function getStatement(db: Db, scope: Scope, id: number): Promise<Statement> {
  const row = await findStatementRow(db, scope, id);
  if (!row) throw notFound('That statement');
  const terms = parseTerms(row.terms ?? row.consignment_terms);
  const currency = row.currency;
  const money = (amount: number): Money => ({ amount, currency });
  let lines: Statement['lines'];
  let totals: Statement['totals'];
  let dueDate: string | null;
  if (row.state === 'draft') {
    const sales = await draftSales(db, scope, row);
    const figures = figuresOf(terms, sales, periodOf(row));
    const byId = new Map(sales.map((s) => [s.id, s]));
    lines = figures.lines.map((l) => {
      const sale = byId.get(l.id)!;
      return {
        lineId: l.id,
        consignmentId: sale.consignment_id,
        consignmentReference: sale.consignment_reference,
        stockNumber: sale.stock_number,
        title: sale.title,
        soldOn: l.saleDate,
        salePrice: l.salePrice,
        commission: l.split.commission,
        vatOnCommission: l.split.vatOnCommission,
        makerShare: l.split.makerShare,
      };
    });
    totals = figures.totals;
    dueDate = figures.dueDate;
  } else {
    const frozen = await listFrozenLines(db, scope, id);
    lines = frozen.map((l) => ({
      lineId: l.id,
      consignmentId: l.consignment_id,
      consignmentReference: l.consignment_reference,
      stockNumber: l.stock_number,
      title: l.title,
      soldOn: l.sold_on!,
      salePrice: money(l.frozen_price),
      commission: money(l.commission),
      vatOnCommission: money(l.vat_on_commission),
      makerShare: money(l.maker_share),
    }));
    totals = {
      sales: money(row.sales_total ?? 0),
      commission: money(row.commission_total ?? 0),
      vatOnCommission: money(row.vat_on_commission_total ?? 0),
      makerShare: money(row.maker_net_total ?? 0),
      makerOutputVat: money(row.output_vat_total ?? 0),
      makerReclaimableVat: money(row.reclaimable_vat_total ?? 0),
    };
    dueDate = row.due_date;
  }
  const payments = await listPayments(db, scope, id);
  const adjustments = await listAdjustments(db, scope, id);
  const paid = payments.reduce((sum, p) => sum + p.amount, 0);
  const adjusted = adjustments.reduce((sum, a) => sum + a.amount, 0);
  return {
    id: row.id,
    reference: row.reference,
    state: row.state,
    currency,
    venue: { id: row.venue_id, name: row.venue_name },
    consignment:
      row.consignment_id === null
        ? null
        : {
            id: row.consignment_id,
            reference: row.consignment_reference!,
            title: row.consignment_title!,
          },
    periodStart: row.period_start,
    periodEnd: row.period_end,
    issuedAt: row.issued_at,
    dueDate,
    terms,
    lines,
    totals,
    payments: payments.map((p) => ({
      id: p.id,
      amount: money(p.amount),
      receivedOn: p.received_on,
      method: p.method,
      reference: p.reference,
    })),
    adjustments: adjustments.map((a) => ({
      id: a.id,
      kind: a.kind,
      amount: money(a.amount),
      note: a.note,
    })),
    paid: money(paid),
    balance: money(totals.makerShare.amount - paid - adjusted),
  };
}

/**
 * Every statement the person may see, with what is owed and what is left: each worked out as its
 * page shows it (a draft from its sales), so the list and the page never disagree.
 */
export async function listStatements(db: Db, scope: Scope): Promise<StatementList> {
  const rows = await listStatementRows(db, scope);
  const items: StatementList['items'] = [];
  for (const row of rows) {
    const s = await getStatement(db, scope, row.id);
    items.push({
      id: s.id,
      reference: s.reference,
      state: s.state,
      currency: s.currency,
      venue: s.venue,
      consignment: s.consignment,
      periodStart: s.periodStart,
      periodEnd: s.periodEnd,
      issuedAt: s.issuedAt,
      dueDate: s.dueDate,
      owed: s.totals.makerShare,
      balance: s.balance,
    });
  }
  return { items };
}

/**
 * A new draft statement, for a consignment that has been sent, or for a venue and a period. It
 * covers the sales no issued statement covers yet, and refuses when there are none.
 */
export async function createStatement(
  db: Db,
  scope: Scope,
  input: { consignmentId: number } | { venueId: number; periodStart: string; periodEnd: string },
): Promise<Statement> {
  const id = await db.transaction().execute(async (trx) => {
    const studio = await getStudio(trx, scope);
    const today = isoDateInTimeZone(new Date(), studio.time_zone);
    let base: { venueId: number; consignmentId: number | null; from: string; to: string };
    let sales: SaleRow[];
    if ('consignmentId' in input) {
      const consignment = await findConsignmentForStatement(trx, scope, input.consignmentId);
      const draft = await findDraftFor(trx, scope, input.consignmentId);
      if (draft) {
        throw new HttpError(
          'conflict',
          `${consignment.reference} already has a draft statement, ${draft.reference}: issue or change that one.`,
        );
      }
      sales = await listUnstatedSales(trx, scope, { consignmentId: input.consignmentId });
      base = {
        venueId: consignment.venue_id,
        consignmentId: consignment.id,
        from: consignment.dispatch_date ?? today,
        to: [consignment.closing_date ?? today, ...sales.map((s) => s.sold_on!)].sort().at(-1)!,
      };
    } else {
      const venue = await findVenueRow(trx, scope, input.venueId);
      if (!venue) throw notFound('That venue');
      sales = await listUnstatedSales(trx, scope, {
        venueId: input.venueId,
        from: input.periodStart,
        to: input.periodEnd,
      });
      base = {
        venueId: venue.id,
        consignmentId: null,
        from: input.periodStart,
        to: input.periodEnd,
      };
    }
    if (sales.length === 0) {
      throw new HttpError(
        'conflict',
        'There are no sales to put on a statement: every sale is on an issued statement already.',
      );
    }
    const currencies = [...new Set(sales.map((s) => s.currency))];
    if (currencies.length > 1) {
      throw new HttpError(
        'conflict',
        `These sales are in ${currencies.join(' and ')}: make one statement per currency, by consignment.`,
      );
    }
    const terms = parseTerms(sales[0]!.terms);
    const prefix = `S-${today.slice(0, 4)}-`;
    for (let attempt = 0; attempt < 5; attempt += 1) {
      const reference = nextReference(
        prefix,
        await listStatementReferencesLike(trx, scope, prefix),
      );
      const inserted = await insertStatement(trx, {
        studio_id: scope.studioId,
        venue_id: base.venueId,
        consignment_id: base.consignmentId,
        reference,
        period_start: base.from,
        period_end: base.to,
        currency: currencies[0]!,
        terms: JSON.stringify(terms),
      });
      if (inserted !== undefined) {
        await writeAudit(trx, scope, {
          action: 'statement.created',
          entity: 'statement',
          entityId: inserted,
          before: null,
          after: { reference, ...base, sales: sales.length },
        });
        return inserted;
      }
    }
    throw new HttpError('conflict', 'Another statement took the same reference. Try again.');
  });
  return getStatement(db, scope, id);
}

/**
 * Issues a draft: its figures are frozen from now on (a correction is a new statement) and the
 * sales it covers are locked.
 */
export async function issueStatement(
  db: Db,
  scope: Scope,
  id: number,
  { appUrl }: { appUrl: string },
): Promise<Statement> {
  await db.transaction().execute(async (trx) => {
    await lockStatement(trx, scope, id);
    const draft = await getStatement(trx, scope, id);
    if (draft.state !== 'draft') {
      throw new HttpError('conflict', `${draft.reference} is already ${draft.state}.`);
    }
    if (draft.lines.length === 0) {
      throw new HttpError(
        'conflict',
        `${draft.reference} has no sales left to cover: another statement covers them.`,
      );
    }
    const { totals } = draft;
    const issuedAt = new Date().toISOString();
    const changed = await updateStatementIn(trx, scope, id, ['draft'], {
      state: 'issued',
      issued_at: issuedAt,
      due_date: draft.dueDate,
      sales_total: totals.sales.amount,
      commission_total: totals.commission.amount,
      vat_on_commission_total: totals.vatOnCommission.amount,
      maker_net_total: totals.makerShare.amount,
      output_vat_total: totals.makerOutputVat.amount,
      reclaimable_vat_total: totals.makerReclaimableVat.amount,
    });
    if (!changed) throw new HttpError('conflict', `${draft.reference} has just been issued.`);
    await insertStatementLines(
      trx,
      draft.lines.map((l) => ({
        statement_id: id,
        consignment_line_id: l.lineId,
        sale_price: l.salePrice.amount,
        commission: l.commission.amount,
        vat_on_commission: l.vatOnCommission.amount,
        maker_share: l.makerShare.amount,
      })),
    );
    const mailId = await queueStatementMail(trx, scope, draft, { appUrl });
    await writeAudit(trx, scope, {
      action: 'statement.issued',
      entity: 'statement',
      entityId: id,
      before: { state: 'draft' },
      after: {
        state: 'issued',
        issuedAt,
        totals,
        lines: draft.lines.map((l) => l.lineId),
        mailId,
      },
    });
  });
  return getStatement(db, scope, id);
}

/** Settles an issued statement whose balance is nil, and its consignment when that is done too. */
async function settleIfPaid(trx: Db, scope: Scope, statement: Statement) {
  if (statement.state !== 'issued' || statement.balance.amount !== 0) return;
  if (
    await updateStatementIn(trx, scope, statement.id, ['issued'], {
      state: 'settled',
      settled_at: new Date().toISOString(),
    })
  ) {
    await writeAudit(trx, scope, {
      action: 'statement.settled',
      entity: 'statement',
      entityId: statement.id,
      before: { state: 'issued' },
      after: { state: 'settled', paid: statement.paid },
    });
    for (const consignmentId of new Set(statement.lines.map((l) => l.consignmentId))) {
      await settleConsignmentIfDone(trx, scope, consignmentId);
    }
  }
}

async function issuedStatement(trx: Db, scope: Scope, id: number, doing: string) {
  const statement = await getStatement(trx, scope, id);
  if (statement.state !== 'issued') {
    const why = statement.state === 'draft' ? 'issue it first' : `it is ${statement.state} already`;
    throw new HttpError('conflict', `${doing} ${statement.reference}: ${why}.`);
  }
  return statement;
}

/**
 * Records a payment against a statement, audited, and settles the statement (and its
 * consignment) when the balance comes to nil: the one path for a remittance recorded by hand and
 * a payment taken online. Undefined when the provider's payment is recorded already, and then
 * nothing is written.
 */
async function takePayment(
  trx: Db,
  scope: Scope,
  statement: Statement,
  payment: {
    amount: number;
    method: PaymentMethod;
    receivedOn: string;
    reference: string | null;
    providerPaymentId?: string;
  },
): Promise<number | undefined> {
  const paymentId = await insertPayment(trx, scope, {
    venueId: statement.venue.id,
    statementId: statement.id,
    amount: payment.amount,
    currency: statement.currency,
    method: payment.method,
    receivedOn: payment.receivedOn,
    reference: payment.reference,
    providerPaymentId: payment.providerPaymentId,
  });
  if (paymentId === undefined) return undefined;
  await writeAudit(trx, scope, {
    action: 'payment.recorded',
    entity: 'statement',
    entityId: statement.id,
    before: { balance: statement.balance },
    after: {
      paymentId,
      amount: { amount: payment.amount, currency: statement.currency },
      method: payment.method,
      on: payment.receivedOn,
      ...(payment.providerPaymentId ? { providerPaymentId: payment.providerPaymentId } : {}),
    },
  });
  await settleIfPaid(trx, scope, await getStatement(trx, scope, statement.id));
  return paymentId;
}

/** A remittance received by hand; the statement is settled when the balance comes to nil. */
export async function recordPayment(
  db: Db,
  scope: Scope,
  id: number,
  input: PaymentCreate & { reference?: string | null },
): Promise<Statement> {
  await db.transaction().execute(async (trx) => {
    await lockStatement(trx, scope, id);
    const statement = await issuedStatement(trx, scope, id, 'No payment can be recorded against');
    if (input.amount.currency !== statement.currency) {
      throw new HttpError('invalid_request', 'Some fields need attention.', [
        {
          path: ['amount', 'currency'],
          message: `${statement.reference} is in ${statement.currency}: record the payment in ${statement.currency}.`,
        },
      ]);
    }
    await takePayment(trx, scope, statement, {
      amount: input.amount.amount,
      method: input.method,
      receivedOn: input.receivedOn,
      reference: input.reference ?? null,
    });
  });
  return getStatement(db, scope, id);
}

export type OnlinePaymentOutcome =
  | { outcome: 'recorded'; statement: Statement }
  | { outcome: 'duplicate' }
  | { outcome: 'refused'; reason: string };

/**
 * A payment the provider reports taken online, recorded once however often it is reported: its
 * id is unique, and a second report inserts nothing. Money already taken is recorded even
 * against a statement settled meanwhile, whose balance then shows what to give back.
 */
export async function recordOnlinePayment(
  db: Db,
  scope: Scope,
  id: number,
  payment: { amount: Money; receivedOn: string; providerPaymentId: string },
): Promise<OnlinePaymentOutcome> {
  return db.transaction().execute(async (trx): Promise<OnlinePaymentOutcome> => {
    await lockStatement(trx, scope, id);
    const statement = await getStatement(trx, scope, id);
    if (statement.state !== 'issued' && statement.state !== 'settled') {
      return { outcome: 'refused', reason: `${statement.reference} is ${statement.state}` };
    }
    if (payment.amount.currency !== statement.currency) {
      return {
        outcome: 'refused',
        reason: `${statement.reference} is in ${statement.currency}, the payment in ${payment.amount.currency}`,
      };
    }
    const paymentId = await takePayment(trx, scope, statement, {
      amount: payment.amount.amount,
      method: 'online',
      receivedOn: payment.receivedOn,
      reference: payment.providerPaymentId,
      providerPaymentId: payment.providerPaymentId,
    });
    if (paymentId === undefined) return { outcome: 'duplicate' };
    return { outcome: 'recorded', statement: await getStatement(trx, scope, id) };
  });
}

/** Part of a difference between the balance and what was paid, explained by the maker. */
export async function explainDifference(
  db: Db,
  scope: Scope,
  id: number,
  input: AdjustmentCreate & { note?: string | null },
): Promise<Statement> {
  await db.transaction().execute(async (trx) => {
    await lockStatement(trx, scope, id);
    const statement = await issuedStatement(trx, scope, id, 'No difference can be explained on');
    if (input.amount.currency !== statement.currency) {
      throw new HttpError('invalid_request', 'Some fields need attention.', [
        {
          path: ['amount', 'currency'],
          message: `${statement.reference} is in ${statement.currency}: give the amount in ${statement.currency}.`,
        },
      ]);
    }
    const adjustmentId = await insertAdjustment(trx, scope, {
      statementId: id,
      kind: input.kind,
      amount: input.amount.amount,
      currency: statement.currency,
      note: input.note ?? null,
    });
    await writeAudit(trx, scope, {
      action: 'statement.difference-explained',
      entity: 'statement',
      entityId: id,
      before: { balance: statement.balance },
      after: {
        adjustmentId,
        kind: input.kind,
        amount: input.amount,
        note: input.note ?? null,
        balanceAfter: formatMoney({
          amount: statement.balance.amount - input.amount.amount,
          currency: statement.currency,
        }),
      },
    });
    await settleIfPaid(trx, scope, await getStatement(trx, scope, id));
  });
  return getStatement(db, scope, id);
}
