import { type Money } from '../schemas/money';
import { type SaleSplit, type Terms } from '../schemas/terms';
import { assertCurrency } from './amounts';
import {
  addDays,
  type IsoDate,
  type IsoMonth,
  monthEndOfIndex,
  monthIndex,
  parseIsoDate,
} from './calendar';
import { MoneyRuleError } from './errors';

/**
 * UK registration and deregistration thresholds in pence, newest first (HM Treasury policy paper,
 * 7 March 2024: £90,000 / £88,000 from 1 April 2024; £85,000 / £83,000 from 1 April 2017).
 */
export const ukVatThresholds = [
  { from: '2024-04-01', registration: 9_000_000, deregistration: 8_800_000 },
  { from: '2017-04-01', registration: 8_500_000, deregistration: 8_300_000 },
] as const;

/** The UK registration threshold in force on a date; null before the table held here. */
export function ukVatRegistrationThreshold(date: IsoDate): Money | null {
  parseIsoDate(date);
  const row = ukVatThresholds.find((threshold) => date >= threshold.from);
  return row === undefined ? null : { amount: row.registration, currency: 'GBP' };
}

/**
 * A sale's contribution to the maker's turnover (docs/money-rules.md; ICAEW on disclosed agents): through
 * an agent the whole sale price is the maker's supply; a venue buying on sale or return makes the
 * maker's turnover what it pays, the maker's share.
 */
export function saleTurnover(terms: Terms, salePrice: Money, split: SaleSplit): Money {
  assertCurrency(salePrice, terms.currency);
  return terms.venueRole === 'agent' ? salePrice : split.makerShare;
}

export interface TurnoverEntry {
  date: IsoDate;
  amount: Money;
}

export interface ThresholdMonth {
  month: IsoMonth;
  monthEnd: IsoDate;
  turnover: Money;
  /** The 12 months ending at this month end. */
  rolling12: Money;
  threshold: Money;
  over: boolean;
}

export interface ThresholdReport {
  months: ThresholdMonth[];
  /** The first month end in the range at which the rolling total is over the threshold. */
  firstMonthEndOver: IsoDate | null;
  /** 30 days after that month end. */
  registerBy: IsoDate | null;
}

/**
 * The VAT threshold monitor (HMRC registration guidance): at each month end, turnover over the
 * last 12 months against the registration threshold; past it, register within 30 days of that
 * month end. Without a threshold, GBP uses the UK threshold in force at each month end.
 */
export function vatThresholdMonitor(input: {
  entries: readonly TurnoverEntry[];
  fromMonth: IsoMonth;
  toMonth: IsoMonth;
  currency: string;
  threshold?: Money;
}): ThresholdReport {
  const { entries, currency, threshold } = input;
  const first = monthIndex(input.fromMonth);
  const last = monthIndex(input.toMonth);
  if (last < first) throw new MoneyRuleError('invalid-date', 'The months end before they start.');
  if (threshold !== undefined) assertCurrency(threshold, currency);

  const byMonth = new Map<number, number>();
  for (const entry of entries) {
    const { year, month } = parseIsoDate(entry.date);
    assertCurrency(entry.amount, currency);
    const index = year * 12 + month - 1;
    byMonth.set(index, (byMonth.get(index) ?? 0) + entry.amount.amount);
  }

  const months: ThresholdMonth[] = [];
  let firstMonthEndOver: IsoDate | null = null;
  let rolling = 0;
  for (let index = first - 11; index < first; index += 1) rolling += byMonth.get(index) ?? 0;
  for (let index = first; index <= last; index += 1) {
    rolling += byMonth.get(index) ?? 0;
    const monthEnd = monthEndOfIndex(index);
    const limit = threshold ?? ukThresholdOrThrow(monthEnd, currency);
    const over = rolling > limit.amount;
    if (over && firstMonthEndOver === null) firstMonthEndOver = monthEnd;
    months.push({
      month: monthEnd.slice(0, 7),
      monthEnd,
      turnover: { amount: byMonth.get(index) ?? 0, currency },
      rolling12: { amount: rolling, currency },
      threshold: limit,
      over,
    });
    rolling -= byMonth.get(index - 11) ?? 0;
  }
  return {
    months,
    firstMonthEndOver,
    registerBy: firstMonthEndOver === null ? null : addDays(firstMonthEndOver, 30),
  };
}

function ukThresholdOrThrow(monthEnd: IsoDate, currency: string): Money {
  const threshold = currency === 'GBP' ? ukVatRegistrationThreshold(monthEnd) : null;
  if (threshold === null) {
    throw new MoneyRuleError(
      'threshold-unknown',
      `Enter the registration threshold in ${currency} that applies on ${monthEnd}.`,
    );
  }
  return threshold;
}
