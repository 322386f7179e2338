import {
  endOfMonth,
  exposureOn,
  isoDateInTimeZone,
  saleOrReturnAges,
  saleTurnover,
  splitSale,
  vatThresholdMonitor,
} from '@/shared/money';
import { type Money } from '@/shared/schemas/money';
import { type Year, type YearCurrency } from '@/shared/schemas/year';

import { type Scope } from '../access/viewer';
import { termsOf } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { getStudio } from '../studio/studio.service';
import { listPaymentsBetween, listSalesBetween, listSentLines } from './year.repository';

type Sale = Awaited<ReturnType<typeof listSalesBetween>>[number];
type SentLine = Awaited<ReturnType<typeof listSentLines>>[number];

const months = (year: number) =>
  Array.from({ length: 12 }, (_, i) => `${year}-${String(i + 1).padStart(2, '0')}`);

/** A running total per key, in minor units. */
class Tally<K> {
  readonly sums = new Map<K, Record<string, number>>();
  add(key: K, parts: Record<string, number>) {
    const sum = this.sums.get(key) ?? {};
    for (const [part, amount] of Object.entries(parts)) sum[part] = (sum[part] ?? 0) + amount;
    this.sums.set(key, sum);
  }
  get(key: K, part: string) {
    return this.sums.get(key)?.[part] ?? 0;
  }
}

function splitOf(sale: Sale) {
  const terms = termsOf(sale);
  const price = { amount: sale.sale_price!, currency: sale.currency };
  const split = splitSale(terms, { amount: sale.list_price, currency: sale.currency }, price);
  return { terms, price, split };
}

/** The line's last day out, if it is no longer out. */
const endOf = (line: SentLine) => (line.state === 'sold' ? line.sold_on : line.resolved_on);

function currencyYear(
  currency: string,
  year: number,
  sales: readonly Sale[],
  payments: Awaited<ReturnType<typeof listPaymentsBetween>>,
  sent: readonly SentLine[],
  today: string,
): YearCurrency {
  const money = (amount: number): Money => ({ amount, currency });
  const byMonth = new Tally<string>();
  const byVenue = new Tally<number>();
  const bySeries = new Tally<string | null>();
  const venueNames = new Map<number, string>();
  for (const sale of sales) {
    const { price, split } = splitOf(sale);
    const parts = { count: 1, sales: price.amount, share: split.makerShare.amount };
    byMonth.add(sale.sold_on!.slice(0, 7), parts);
    byVenue.add(sale.venue_id, {
      ...parts,
      commission: split.commission.amount,
      vat: split.vatOnCommission.amount,
    });
    bySeries.add(sale.series, parts);
    venueNames.set(sale.venue_id, sale.venue_name);
  }
  for (const p of payments) byVenue.add(p.venue_id, { paid: p.amount });
  const exposureLines = sent
    .filter((l) => l.dispatch_date !== null)
    .map((l) => {
      venueNames.set(l.venue_id, l.venue_name);
      return {
        id: l.id,
        consignmentId: l.consignment_id,
        venueId: l.venue_id,
        insuranceValue: money(l.insurance_value),
        dispatchDate: l.dispatch_date,
        endDate: endOf(l),
      };
    });
  const exposure = months(year)
    .map((month) => endOfMonth(`${month}-01`))
    .filter((monthEnd) => monthEnd.slice(0, 7) <= today.slice(0, 7))
    .map((monthEnd) => {
      const asOf = monthEnd < today ? monthEnd : today;
      const e = exposureOn(exposureLines, asOf, currency);
      return {
        monthEnd: asOf,
        total: e.studio.value,
        byVenue: e.byVenue.map((v) => ({
          venueId: v.venueId,
          venueName: venueNames.get(v.venueId) ?? '',
          value: v.value,
        })),
      };
    });
  return {
    currency,
    byMonth: months(year).map((month) => ({
      month,
      count: byMonth.get(month, 'count'),
      sales: money(byMonth.get(month, 'sales')),
      makerShare: money(byMonth.get(month, 'share')),
    })),
    byVenue: [...byVenue.sums.keys()]
      .map((venueId) => ({
        venueId,
        venueName: venueNames.get(venueId) ?? '',
        count: byVenue.get(venueId, 'count'),
        sales: money(byVenue.get(venueId, 'sales')),
        commission: money(byVenue.get(venueId, 'commission')),
        vatOnCommission: money(byVenue.get(venueId, 'vat')),
        makerShare: money(byVenue.get(venueId, 'share')),
        paid: money(byVenue.get(venueId, 'paid')),
      }))
      .sort((a, b) => b.sales.amount - a.sales.amount),
    bySeries: [...bySeries.sums.keys()]
      .map((series) => ({
        series,
        count: bySeries.get(series, 'count'),
        sales: money(bySeries.get(series, 'sales')),
      }))
      .sort((a, b) => b.sales.amount - a.sales.amount),
    exposure,
    totals: {
      count: sales.length,
      sales: money(sales.reduce((sum, s) => sum + s.sale_price!, 0)),
      makerShare: money(sumParts(byMonth, 'share')),
    },
  };
}

const sumParts = <K>(tally: Tally<K>, part: string) =>
  [...tally.sums.values()].reduce((sum, parts) => sum + (parts[part] ?? 0), 0);

/**
 * The maker's year (owner only): sales by month, venue and series, what each venue paid, the
 * insured value out over the months, the VAT registration threshold against the rolling turnover,
 * and pieces on sale or return nearing the 12 months after which they count as supplied. Every
 * figure per currency, from the money engine.
 */
export async function getYear(db: Db, scope: Scope, year: number): Promise<Year> {
  const studio = await getStudio(db, scope);
  const today = isoDateInTimeZone(new Date(), studio.time_zone);
  const from = `${year}-01-01`;
  const to = `${year}-12-31`;
  const sales = await listSalesBetween(db, scope, from, to);
  const payments = await listPaymentsBetween(db, scope, from, to);
  const sent = await listSentLines(db, scope);
  const currencies = [
    ...new Set([...sales.map((s) => s.currency), ...sent.map((l) => l.currency)]),
  ].sort();

  // The rolling 12 months at January's end reach back into the year before.
  const turnoverSales = (await listSalesBetween(db, scope, `${year - 1}-02-01`, to)).filter(
    (s) => s.currency === 'GBP',
  );
  const lastMonth = [`${year}-12`, today.slice(0, 7)].sort()[0]!;
  const vatThreshold =
    turnoverSales.length === 0 || lastMonth < `${year}-01`
      ? null
      : vatThresholdMonitor({
          entries: turnoverSales.map((s) => {
            const { terms, price, split } = splitOf(s);
            return { date: s.sold_on!, amount: saleTurnover(terms, price, split) };
          }),
          fromMonth: `${year}-01`,
          toMonth: lastMonth,
          currency: 'GBP',
        });

  const onSaleOrReturn = sent.filter(
    (l) => l.state === 'consigned' && termsOf(l).venueRole === 'sale-or-return',
  );
  const byId = new Map(onSaleOrReturn.map((l) => [l.id, l]));
  const ages = saleOrReturnAges(
    onSaleOrReturn.map((l) => ({ id: l.id, dispatchDate: l.dispatch_date, endDate: null })),
    today,
  ).filter((a) => a.status !== 'in-time');

  return {
    year,
    currencies: currencies.map((currency) =>
      currencyYear(
        currency,
        year,
        sales.filter((s) => s.currency === currency),
        payments.filter((p) => p.currency === currency),
        sent.filter((l) => l.currency === currency),
        today,
      ),
    ),
    vatThreshold: vatThreshold && {
      months: vatThreshold.months.map((m) => ({
        month: m.month,
        turnover: m.turnover,
        rolling12: m.rolling12,
        threshold: m.threshold,
        over: m.over,
      })),
      firstMonthEndOver: vatThreshold.firstMonthEndOver,
      registerBy: vatThreshold.registerBy,
    },
    saleOrReturn: ages.map((a) => {
      const line = byId.get(a.id)!;
      return {
        lineId: a.id,
        consignmentId: line.consignment_id,
        reference: line.reference,
        stockNumber: line.stock_number,
        title: line.title,
        venueName: line.venue_name,
        dispatchDate: a.dispatchDate,
        deemedSupplyDate: a.deemedSupplyDate,
        daysLeft: a.daysLeft,
        status: a.status as 'approaching' | 'past',
      };
    }),
  };
}
