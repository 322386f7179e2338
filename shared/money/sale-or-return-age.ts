import { addMonths, daysBetween, type IsoDate, parseIsoDate } from './calendar';
import { isOutOn } from './exposure';

export interface OutLine {
  id: number;
  dispatchDate: IsoDate | null;
  /** The day it stopped being out; null while it is out. */
  endDate: IsoDate | null;
}

export type SaleOrReturnStatus = 'in-time' | 'approaching' | 'past';

export interface SaleOrReturnAge {
  id: number;
  dispatchDate: IsoDate;
  /** 12 months after dispatch: the day the goods count as supplied for VAT. */
  deemedSupplyDate: IsoDate;
  daysOut: number;
  /** Days until the deemed supply; zero or less once it has passed. */
  daysLeft: number;
  status: SaleOrReturnStatus;
}

/** How long before the 12 months a line is flagged, by default. */
export const SALE_OR_RETURN_WARNING_DAYS = 60;

/**
 * The sale-or-return age check: goods on sale or return count as supplied 12 months after they
 * were sent if not sooner (VAT Act 1994 s.6(2)(c), HMRC VRS9150). Every line out on `asOf` with
 * its deemed supply date, flagged `approaching` within `warningDays` and `past` from that date;
 * the most urgent first.
 */
export function saleOrReturnAges(
  lines: readonly OutLine[],
  asOf: IsoDate,
  warningDays = SALE_OR_RETURN_WARNING_DAYS,
): SaleOrReturnAge[] {
  parseIsoDate(asOf);
  const ages: SaleOrReturnAge[] = [];
  for (const line of lines) {
    if (line.dispatchDate === null || !isOutOn(line, asOf)) continue;
    const deemedSupplyDate = addMonths(line.dispatchDate, 12);
    const daysLeft = daysBetween(asOf, deemedSupplyDate);
    ages.push({
      id: line.id,
      dispatchDate: line.dispatchDate,
      deemedSupplyDate,
      daysOut: daysBetween(line.dispatchDate, asOf),
      daysLeft,
      status: daysLeft <= 0 ? 'past' : daysLeft <= warningDays ? 'approaching' : 'in-time',
    });
  }
  return ages.sort((a, b) => a.daysLeft - b.daysLeft || a.id - b.id);
}
