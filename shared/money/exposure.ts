import { type Money } from '../schemas/money';
import { assertCurrency } from './amounts';
import { type IsoDate, parseIsoDate } from './calendar';
import { MoneyRuleError } from './errors';

/** A consignment line as exposure needs it: its insured value and the days it was out. */
export interface ExposureLine {
  id: number;
  consignmentId: number;
  venueId: number;
  /** The insurance value recorded at dispatch. */
  insuranceValue: Money;
  /** Null until the piece leaves the studio. */
  dispatchDate: IsoDate | null;
  /** The day it stopped being out (sold, returned, lost or withdrawn); null while it is out. */
  endDate: IsoDate | null;
}

export interface ExposureTotal {
  value: Money;
  lineCount: number;
}

export interface Exposure {
  asOf: IsoDate;
  studio: ExposureTotal;
  byVenue: (ExposureTotal & { venueId: number })[];
  byConsignment: (ExposureTotal & { consignmentId: number; venueId: number })[];
}

/** Whether a line is out on a date: dispatched by then and not yet sold or returned (docs/money-rules.md). */
export function isOutOn(line: Pick<ExposureLine, 'dispatchDate' | 'endDate'>, date: IsoDate) {
  return (
    line.dispatchDate !== null &&
    line.dispatchDate <= date &&
    (line.endDate === null || line.endDate > date)
  );
}

/**
 * Exposure: the sum of the insurance values of every line still out on a date, per consignment,
 * per venue and for the studio (docs/money-rules.md, "Insurance and exposure").
 */
export function exposureOn(
  lines: readonly ExposureLine[],
  asOf: IsoDate,
  currency: string,
): Exposure {
  parseIsoDate(asOf);
  const byVenue = new Map<number, ExposureTotal & { venueId: number }>();
  const byConsignment = new Map<
    number,
    ExposureTotal & { consignmentId: number; venueId: number }
  >();
  let total = 0;
  let count = 0;
  for (const line of lines) {
    checkDates(line);
    if (!isOutOn(line, asOf)) continue;
    assertCurrency(line.insuranceValue, currency);
    const amount = line.insuranceValue.amount;
    total += amount;
    count += 1;
    const venue = byVenue.get(line.venueId) ?? {
      venueId: line.venueId,
      value: { amount: 0, currency },
      lineCount: 0,
    };
    venue.value.amount += amount;
    venue.lineCount += 1;
    byVenue.set(line.venueId, venue);
    const consignment = byConsignment.get(line.consignmentId) ?? {
      consignmentId: line.consignmentId,
      venueId: line.venueId,
      value: { amount: 0, currency },
      lineCount: 0,
    };
    consignment.value.amount += amount;
    consignment.lineCount += 1;
    byConsignment.set(line.consignmentId, consignment);
  }
  if (!Number.isSafeInteger(total)) {
    throw new MoneyRuleError(
      'invalid-amount',
      'That total is too large for the product to handle.',
    );
  }
  return {
    asOf,
    studio: { value: { amount: total, currency }, lineCount: count },
    byVenue: [...byVenue.values()].sort((a, b) => a.venueId - b.venueId),
    byConsignment: [...byConsignment.values()].sort((a, b) => a.consignmentId - b.consignmentId),
  };
}

function checkDates(line: ExposureLine): void {
  if (line.dispatchDate !== null) parseIsoDate(line.dispatchDate);
  if (line.endDate !== null) parseIsoDate(line.endDate);
  if (line.dispatchDate !== null && line.endDate !== null && line.endDate < line.dispatchDate) {
    throw new MoneyRuleError(
      'invalid-date',
      `Line ${line.id} ends (${line.endDate}) before it was dispatched (${line.dispatchDate}).`,
    );
  }
}
