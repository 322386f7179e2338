import { z } from 'zod';

import { isoDateSchema } from './dates';
import { moneySchema } from './money';

/** `GET /api/year?year=2026` */
export const yearQuerySchema = z.strictObject({
  year: z.coerce
    .number<number | string>({ error: 'Give the year as four digits.' })
    .int()
    .min(2000, { error: 'Choose a year from 2000.' })
    .max(2100, { error: 'Choose a year before 2100.' }),
});

const venueRef = { venueId: z.number().int(), venueName: z.string() };

/** One currency's year: amounts in different currencies are never added together. */
export const yearCurrencySchema = z.object({
  currency: z.string(),
  /** Twelve months, January first: the sales and what they left the maker. */
  byMonth: z.array(
    z.object({
      month: z.string(),
      sales: moneySchema,
      makerShare: moneySchema,
      count: z.number().int(),
    }),
  ),
  /** What each venue sold and really paid the maker after commission. */
  byVenue: z.array(
    z.object({
      ...venueRef,
      count: z.number().int(),
      sales: moneySchema,
      commission: moneySchema,
      vatOnCommission: moneySchema,
      makerShare: moneySchema,
      paid: moneySchema,
    }),
  ),
  /** The series that sell, best first; works in no series together. */
  bySeries: z.array(
    z.object({ series: z.string().nullable(), count: z.number().int(), sales: moneySchema }),
  ),
  /** The insured value out at each month end, per venue and in all. */
  exposure: z.array(
    z.object({
      monthEnd: isoDateSchema,
      total: moneySchema,
      byVenue: z.array(z.object({ ...venueRef, value: moneySchema })),
    }),
  ),
  totals: z.object({ count: z.number().int(), sales: moneySchema, makerShare: moneySchema }),
});
export type YearCurrency = z.infer<typeof yearCurrencySchema>;

export const yearSchema = z.object({
  year: z.number().int(),
  currencies: z.array(yearCurrencySchema),
  /**
   * The UK VAT registration threshold against the maker's rolling 12-month turnover (pounds only),
   * month by month to the year's end or today.
   */
  vatThreshold: z
    .object({
      months: z.array(
        z.object({
          month: z.string(),
          turnover: moneySchema,
          rolling12: moneySchema,
          threshold: moneySchema,
          over: z.boolean(),
        }),
      ),
      firstMonthEndOver: isoDateSchema.nullable(),
      registerBy: isoDateSchema.nullable(),
    })
    .nullable(),
  /** Pieces on sale or return nearing 12 months out, when they count as supplied for VAT. */
  saleOrReturn: z.array(
    z.object({
      lineId: z.number().int(),
      consignmentId: z.number().int(),
      reference: z.string(),
      stockNumber: z.string(),
      title: z.string(),
      venueName: z.string(),
      dispatchDate: isoDateSchema,
      deemedSupplyDate: isoDateSchema,
      daysLeft: z.number().int(),
      status: z.enum(['approaching', 'past']),
    }),
  ),
});
export type Year = z.infer<typeof yearSchema>;
