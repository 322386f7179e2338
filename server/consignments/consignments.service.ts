import { conditionDifferences } from '@/shared/condition/differences';
import {
  exposureOn,
  insuranceValue,
  isoDateInTimeZone,
  splitSale,
  sumMoney,
  trySplitSale,
} from '@/shared/money';
import { type ConditionCheck } from '@/shared/schemas/condition';
import {
  type Consignment,
  type ConsignmentCreateParsed,
  consignmentDateIssues,
  type ConsignmentLine,
  type ConsignmentList,
  type ConsignmentListQuery,
  type ConsignmentState,
  type ConsignmentUpdateParsed,
} from '@/shared/schemas/consignment';
import { type Money } from '@/shared/schemas/money';
import { type Terms, termsSchema } from '@/shared/schemas/terms';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { conditionPhotoUrl } from '../condition/condition.mapper';
import { latestChecksByLine } from '../condition/condition.service';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { listStatementLocks } from '../sales/sales.repository';
import { getStudio } from '../studio/studio.service';
import { toVenue } from '../venues/venues.mapper';
import { findVenueRow } from '../venues/venues.repository';
import {
  type ConsignmentDetailRow,
  findConsignmentRow,
  insertConsignment,
  listConsignmentSummaries,
  listLineRows,
  listOutLines,
  listReferencesLike,
  updateConsignmentIn,
  updateLine,
} from './consignments.repository';
import { nextReference } from './references';

export const termsOf = (row: { terms: string | null }): Terms =>
  termsSchema.parse(JSON.parse(row.terms ?? 'null'));

/**
 * The money engine's exposure of the lines still out (docs/money-rules.md), one per currency:
 * per consignment, per venue and in all.
 */
export async function exposureByCurrency(
  db: Db,
  scope: Scope,
  asOf: string,
  consignmentId?: number,
) {
  const lines = await listOutLines(db, scope, consignmentId);
  const venueNames = new Map(lines.map((l) => [l.venue_id, l.venue_name]));
  return [...new Set(lines.map((l) => l.currency))].sort().map((currency) => ({
    currency,
    venueNames,
    exposure: exposureOn(
      lines
        .filter((l) => l.currency === currency)
        .map((l) => ({
          id: l.id,
          consignmentId: l.consignment_id,
          venueId: l.venue_id,
          insuranceValue: { amount: l.insurance_value, currency },
          // A line still out counts from its dispatch, whatever day that was.
          dispatchDate: l.dispatch_date && l.dispatch_date <= asOf ? l.dispatch_date : asOf,
          endDate: null,
        })),
      asOf,
      currency,
    ),
  }));
}

/** The insurance value still out, per consignment. */
async function insuredOutBy(db: Db, scope: Scope, asOf: string, consignmentId?: number) {
  const byConsignment = new Map<number, Money>();
  for (const { exposure } of await exposureByCurrency(db, scope, asOf, consignmentId)) {
    for (const c of exposure.byConsignment) byConsignment.set(c.consignmentId, c.value);
  }
  return byConsignment;
}

export async function today(db: Db, scope: Scope): Promise<string> {
  const studio = await getStudio(db, scope);
  return isoDateInTimeZone(new Date(), studio.time_zone);
}

export async function listConsignments(
  db: Db,
  scope: Scope,
  query: { state?: ConsignmentState; venueId?: number },
): Promise<ConsignmentList> {
  const summaries = await listConsignmentSummaries(db, scope, {
    states: query.state ? [query.state] : undefined,
    venueId: query.venueId,
  });
  const insured = await insuredOutBy(db, scope, await today(db, scope));
  const items = summaries.map((s) => {
    const out = insured.get(s.id) ?? null;
    return { ...s, insuredOut: out, currency: out?.currency ?? null };
  });
  return { items, total: items.length };
}
export type { ConsignmentListQuery };

/**
 * What the return check found that the dispatch check did not. Damage already there on arrival
 * happened on the way out, insured by whoever insures in transit; otherwise at the venue (or on
 * the way back), insured by whoever insures on the premises (docs/condition.md).
 */
function newDamageOf(
  terms: Terms,
  dispatch: ConditionCheck | null,
  arrival: ConditionCheck | null,
  back: ConditionCheck | null,
  insuranceValue: Money,
): ConsignmentLine['newDamage'] {
  if (!dispatch || !back) return null;
  const differences = conditionDifferences(dispatch.findings, back.findings).filter(
    (d) => d.change !== 'missing',
  );
  if (differences.length === 0) return null;
  const seenOnArrival =
    arrival !== null &&
    conditionDifferences(dispatch.findings, arrival.findings).some((d) => d.change !== 'missing');
  return {
    differences,
    where: seenOnArrival ? 'in-transit' : 'at-venue',
    insuredBy: seenOnArrival ? terms.insuredInTransitBy : terms.insuredBy,
    insuranceValue,
  };
}

function toLine(
  terms: Terms,
  row: Awaited<ReturnType<typeof listLineRows>>[number],
  checks: Awaited<ReturnType<typeof latestChecksByLine>>,
  locks: ReadonlyMap<number, string>,
): ConsignmentLine {
  const listPrice = { amount: row.list_price, currency: row.currency };
  const lineChecks = checks.get(row.id) ?? {};
  const dispatchCheck = lineChecks.dispatch ?? null;
  const arrivalCheck = lineChecks.arrival ?? null;
  const returnCheck = lineChecks.return ?? null;
  const insuranceValue = { amount: row.insurance_value, currency: row.currency };
  return {
    id: row.id,
    workId: row.work_id,
    stockNumber: row.stock_number,
    title: row.title,
    thumbnailUrl:
      row.cover_photo_id === null ? null : `/api/photos/${row.cover_photo_id}/thumbnail`,
    listPrice,
    insuranceValue,
    state: row.state,
    split: row.currency === terms.currency ? trySplitSale(terms, listPrice, listPrice) : null,
    dispatchCheck,
    arrivalCheck,
    differences:
      dispatchCheck && arrivalCheck
        ? conditionDifferences(dispatchCheck.findings, arrivalCheck.findings)
        : [],
    returnCheck,
    newDamage: newDamageOf(terms, dispatchCheck, arrivalCheck, returnCheck, insuranceValue),
    weightG: row.weight_g,
    sale:
      row.state === 'sold' && row.sold_on !== null && row.sale_price !== null
        ? {
            soldOn: row.sold_on,
            price: { amount: row.sale_price, currency: row.currency },
            split: splitSale(terms, listPrice, { amount: row.sale_price, currency: row.currency }),
            discount:
              row.sale_price < row.list_price
                ? { amount: row.list_price - row.sale_price, currency: row.currency }
                : null,
            discountReason: row.discount_reason,
            enteredBy: row.sale_entered_by ?? 'studio',
            recordedBy: row.seller_name,
            recordedAt: row.sale_recorded_at,
            lockedBy: locks.get(row.id) ?? null,
          }
        : null,
    resolution:
      row.state !== 'sold' && row.state !== 'consigned' && row.resolved_on !== null
        ? {
            on: row.resolved_on,
            note: row.resolution_note,
            photo:
              row.resolution_photo_id === null
                ? null
                : {
                    fileId: row.resolution_photo_id,
                    url: conditionPhotoUrl(row.resolution_photo_id),
                  },
            enteredBy: row.resolution_entered_by ?? 'studio',
            recordedBy: row.resolver_name,
          }
        : null,
  };
}

function totalsOf(terms: Terms, lines: readonly ConsignmentLine[]) {
  const counted = lines.filter((l) => l.state !== 'withdrawn' && l.split !== null);
  if (counted.length === 0) return null;
  const sum = (pick: (l: ConsignmentLine) => Money) => sumMoney(counted.map(pick), terms.currency);
  return {
    listPrice: sum((l) => l.listPrice),
    commission: sum((l) => l.split!.commission),
    vatOnCommission: sum((l) => l.split!.vatOnCommission),
    makerShare: sum((l) => l.split!.makerShare),
    insuranceValue: sum((l) => l.insuranceValue),
  };
}

function toConsignment(
  scope: Scope,
  row: ConsignmentDetailRow,
  lines: ConsignmentLine[],
  insuredOut: Money,
  asOf: string,
): Consignment {
  const terms = termsOf(row);
  return {
    id: row.id,
    reference: row.reference,
    title: row.title,
    state: row.state,
    venue: {
      id: row.venue_id,
      name: row.venue_name,
      email: row.venue_email,
      contactName: row.venue_contact_name,
    },
    dispatchDate: row.dispatch_date,
    openingDate: row.opening_date,
    closingDate: row.closing_date,
    returnDueDate: row.return_due_date,
    terms,
    // The maker's own notes stay in the studio.
    notes: scope.venueId === null ? row.notes : null,
    agreedAt: row.agreed_at,
    dispatchedAt: row.dispatched_at,
    acknowledgedAt: row.acknowledged_at,
    acknowledgedBy: row.acknowledged_by_name,
    lines,
    totals: totalsOf(terms, lines),
    insuredOut,
    createdAt: row.created_at,
    today: asOf,
  };
}

/** One consignment with its lines, each line's split and checks, totals and what is out. */
export async function getConsignment(db: Db, scope: Scope, id: number): Promise<Consignment> {
  const row = await findConsignmentRow(db, scope, id);
  if (!row) throw notFound('That consignment');
  const terms = termsOf(row);
  const lineRows = await listLineRows(db, scope, id);
  const checks = await latestChecksByLine(
    db,
    scope,
    lineRows.map((l) => l.id),
  );
  const locks = await listStatementLocks(
    db,
    scope,
    lineRows.filter((l) => l.state === 'sold').map((l) => l.id),
  );
  const lines = lineRows.map((l) => toLine(terms, l, checks, locks));
  const asOf = await today(db, scope);
  const insured = await insuredOutBy(db, scope, asOf, id);
  return toConsignment(
    scope,
    row,
    lines,
    insured.get(id) ?? { amount: 0, currency: terms.currency },
    asOf,
  );
}

/** One line of a consignment as its page shows it, without working out the rest. */
export async function getConsignmentLine(
  db: Db,
  scope: Scope,
  consignmentId: number,
  lineId: number,
): Promise<ConsignmentLine> {
  const row = await findConsignmentRow(db, scope, consignmentId);
  const [lineRow] = row ? await listLineRows(db, scope, consignmentId, lineId) : [];
  if (!row || !lineRow) throw notFound('That piece');
  const checks = await latestChecksByLine(db, scope, [lineId]);
  const locks = await listStatementLocks(db, scope, lineRow.state === 'sold' ? [lineId] : []);
  return toLine(termsOf(row), lineRow, checks, locks);
}

/** The consignment as it stands, or 404; inside a transaction when given one. */
export async function consignmentRow(db: Db, scope: Scope, id: number) {
  const row = await findConsignmentRow(db, scope, id);
  if (!row) throw notFound('That consignment');
  return row;
}

const stateWords: Record<ConsignmentState, string> = {
  draft: 'is being put together',
  agreed: 'has its terms agreed',
  dispatched: 'has been sent',
  'on-show': 'is on show',
  closed: 'is closed',
  settled: 'is settled',
  cancelled: 'was cancelled',
};

/** The refusal when a consignment is not in a state that allows a change. */
export function wrongState(reference: string, state: ConsignmentState, needed: string) {
  return new HttpError('conflict', `${reference} ${stateWords[state]}: ${needed}`);
}

/** A new draft for a venue; its terms start from the venue's own and can be changed while draft. */
export async function createConsignment(
  db: Db,
  scope: Scope,
  input: ConsignmentCreateParsed,
): Promise<Consignment> {
  const id = await db.transaction().execute(async (trx) => {
    const venueRow = await findVenueRow(trx, scope, input.venueId);
    if (!venueRow) throw notFound('That venue');
    const venue = toVenue(venueRow);
    if (venue.archivedAt !== null) {
      throw new HttpError('conflict', `${venue.name} is archived: restore it to send work there.`);
    }
    const terms = input.terms ?? venue.defaultTerms;
    const year = (await today(trx, scope)).slice(0, 4);
    const prefix = `C-${year}-`;
    for (let attempt = 0; attempt < 5; attempt += 1) {
      const reference = nextReference(prefix, await listReferencesLike(trx, scope, prefix));
      const inserted = await insertConsignment(trx, {
        studio_id: scope.studioId,
        venue_id: venue.id,
        reference,
        title: input.title,
        state: 'draft',
        dispatch_date: input.dispatchDate ?? null,
        opening_date: input.openingDate ?? null,
        closing_date: input.closingDate ?? null,
        return_due_date: input.returnDueDate ?? null,
        terms: JSON.stringify(terms),
      });
      if (inserted !== undefined) {
        await writeAudit(trx, scope, {
          action: 'consignment.created',
          entity: 'consignment',
          entityId: inserted,
          before: null,
          after: { reference, venueId: venue.id, title: input.title, terms },
        });
        return inserted;
      }
    }
    throw new HttpError('conflict', 'Another consignment took the same reference. Try again.');
  });
  return getConsignment(db, scope, id);
}

/**
 * Changes a draft's title, dates, notes or terms. New terms bring every line's insurance value
 * up to date; their currency must be the lines'.
 */
export async function updateConsignment(
  db: Db,
  scope: Scope,
  id: number,
  input: ConsignmentUpdateParsed,
): Promise<Consignment> {
  await db.transaction().execute(async (trx) => {
    const row = await consignmentRow(trx, scope, id);
    if (row.state !== 'draft') {
      throw wrongState(row.reference, row.state, 'only a draft can be changed.');
    }
    const lines = await listLineRows(trx, scope, id);
    const merged = {
      title: input.title ?? row.title,
      dispatch_date: input.dispatchDate === undefined ? row.dispatch_date : input.dispatchDate,
      opening_date: input.openingDate === undefined ? row.opening_date : input.openingDate,
      closing_date: input.closingDate === undefined ? row.closing_date : input.closingDate,
      return_due_date:
        input.returnDueDate === undefined ? row.return_due_date : input.returnDueDate,
    };
    const dateIssues = consignmentDateIssues({
      dispatchDate: merged.dispatch_date,
      openingDate: merged.opening_date,
      closingDate: merged.closing_date,
      returnDueDate: merged.return_due_date,
    });
    if (dateIssues.length > 0) {
      throw new HttpError('invalid_request', 'Some fields need attention.', dateIssues);
    }
    const terms = input.terms;
    if (terms && lines.some((l) => l.currency !== terms.currency)) {
      throw new HttpError('invalid_request', 'Some fields need attention.', [
        {
          path: ['terms', 'currency'],
          message: `The pieces are priced in ${lines[0]!.currency}: keep the terms in ${lines[0]!.currency}.`,
        },
      ]);
    }
    const changed = await updateConsignmentIn(trx, scope, id, ['draft'], {
      ...merged,
      ...(input.notes !== undefined ? { notes: input.notes } : {}),
      ...(terms ? { terms: JSON.stringify(terms) } : {}),
    });
    if (!changed) throw wrongState(row.reference, 'agreed', 'only a draft can be changed.');
    if (terms) {
      for (const line of lines) {
        const value = insuranceValue(terms, { amount: line.list_price, currency: line.currency });
        await updateLine(trx, scope, line.id, { insurance_value: value.amount });
      }
    }
    await writeAudit(trx, scope, {
      action: 'consignment.changed',
      entity: 'consignment',
      entityId: id,
      before: { title: row.title, terms: termsOf(row) },
      after: { ...merged, ...(terms ? { terms } : {}) },
    });
  });
  return getConsignment(db, scope, id);
}
