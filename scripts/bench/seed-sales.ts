import { type Kysely } from 'kysely';

import { createUserWithPassword } from '../../server/auth/passwords';
import { type Database } from '../../server/db/schema';
import { addMembership } from '../../server/memberships/memberships.repository';
import { type Terms } from '../../shared/schemas/terms';

export const VENUES = 10;
export const CONSIGNMENTS_PER_VENUE = 10;
export const benchPassword = 'bench-password-2026';

/** The usual UK gallery terms: 40% commission with VAT added on it (docs/money-rules.md). */
const terms: Terms = {
  currency: 'GBP',
  commissionRateBp: 4000,
  vatRateBp: 2000,
  venueRole: 'agent',
  commissionVat: 'added',
  makerVatRegistered: false,
  discountRule: 'shared',
  insuranceBasis: 'maker-net',
  insuredBy: 'venue',
  insuredInTransitBy: 'maker',
  paymentTerms: { days: 30, from: 'month-end' },
};

export type SalesSeed = {
  studioId: number;
  owner: string;
  assistant: string;
  /** One member of staff for each venue. */
  staff: string[];
  /** Each consignment's venue, its place among the venue's, and its lines out with their prices. */
  consignments: { venue: number; position: number; lines: { id: number; listPrice: number }[] }[];
};

/**
 * A studio with its owner (who gets the sale e-mails) and assistant, ten venues each with one
 * member of staff, and ten consignments on show at each, of `piecesEach` pieces out and ready to
 * be sold.
 */
export async function seedSales(
  db: Kysely<Database>,
  { name, dispatchDate, piecesEach }: { name: string; dispatchDate: string; piecesEach: number },
): Promise<SalesSeed> {
  const { id: studioId } = await db
    .insertInto('studios')
    .values({ name })
    .returning('id')
    .executeTakeFirstOrThrow();
  const tag = `${name.toLowerCase().replace(/\W+/g, '-')}`;
  const person = async (
    who: string,
    role: 'owner' | 'assistant' | 'gallery',
    venueId: number | null = null,
  ) => {
    const email = `${tag}-${who}@example.test`;
    const userId = await createUserWithPassword(db, { name: who, email, password: benchPassword });
    await addMembership(db, { userId, studioId, role, venueId });
    return email;
  };
  const seed: SalesSeed = {
    studioId,
    owner: await person('owner', 'owner'),
    assistant: await person('assistant', 'assistant'),
    staff: [],
    consignments: [],
  };
  for (let v = 0; v < VENUES; v++) {
    const { id: venueId } = await db
      .insertInto('venues')
      .values({
        studio_id: studioId,
        name: `Venue ${v}`,
        kind: 'gallery',
        default_terms: JSON.stringify(terms),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    seed.staff.push(await person(`staff-${v}`, 'gallery', venueId));
    for (let c = 0; c < CONSIGNMENTS_PER_VENUE; c++) {
      const reference = `C-${v}-${c}`;
      const { id: consignmentId } = await db
        .insertInto('consignments')
        .values({
          studio_id: studioId,
          venue_id: venueId,
          reference,
          title: `Show ${v}.${c}`,
          state: 'on-show',
          terms: JSON.stringify(terms),
          dispatch_date: dispatchDate,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      const works = await db
        .insertInto('works')
        .values(
          Array.from({ length: piecesEach }, (_, k) => ({
            studio_id: studioId,
            stock_number: `${reference}-${String(k).padStart(3, '0')}`,
            title: `Bowl ${k}`,
            retail_price: 4_000 + (k % 50) * 500,
            cost_price: 900,
            currency: 'GBP',
          })),
        )
        .returning(['id', 'retail_price'])
        .execute();
      const lines = await db
        .insertInto('consignment_lines')
        .values(
          works.map((w) => ({
            studio_id: studioId,
            consignment_id: consignmentId,
            work_id: w.id,
            currency: 'GBP',
            list_price: w.retail_price,
            insurance_value: Math.round(w.retail_price * 0.6),
            holds_work: 1 as const,
          })),
        )
        .returning(['id', 'list_price'])
        .execute();
      seed.consignments.push({
        venue: v,
        position: c,
        lines: lines.map((l) => ({ id: l.id, listPrice: l.list_price })),
      });
    }
  }
  return seed;
}
