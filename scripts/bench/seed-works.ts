import { type Kysely } from 'kysely';

import { createUserWithPassword } from '../../server/auth/passwords';
import { type Database } from '../../server/db/schema';
import { addMembership } from '../../server/memberships/memberships.repository';

export const WORKS = 10_000;
export const benchOwner = { email: 'bench@example.test', password: 'bench-password-2026' };

const series = ['Saltmarsh', 'Tideline', 'Estuary', 'Shingle', 'Heron'];
const forms = ['bowl', 'jug', 'vase', 'moon jar', 'tea bowl', 'plate', 'bottle'];
const lineStates = ['consigned', 'sold', 'returned', 'consigned', 'withdrawn'] as const;

/** An owner and 10,000 works over 40 consignments, about six in ten of them out at some time. */
export async function seedWorks(db: Kysely<Database>) {
  const { id: studioId } = await db
    .insertInto('studios')
    .values({ name: 'Bench studio' })
    .returning('id')
    .executeTakeFirstOrThrow();
  const userId = await createUserWithPassword(db, { name: 'Bench', ...benchOwner });
  await addMembership(db, { userId, studioId, role: 'owner', venueId: null });
  const terms = JSON.stringify({ currency: 'GBP' });
  await db.transaction().execute(async (trx) => {
    const venueIds: number[] = [];
    for (let v = 0; v < 8; v++) {
      const { id } = await trx
        .insertInto('venues')
        .values({ studio_id: studioId, name: `Venue ${v}`, kind: 'gallery', default_terms: terms })
        .returning('id')
        .executeTakeFirstOrThrow();
      venueIds.push(id);
    }
    const consignmentIds: number[] = [];
    for (let c = 0; c < 40; c++) {
      const { id } = await trx
        .insertInto('consignments')
        .values({
          studio_id: studioId,
          venue_id: venueIds[c % venueIds.length]!,
          reference: `C-${c}`,
          title: `Show ${c}`,
          state: 'on-show',
          terms,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      consignmentIds.push(id);
    }
    for (let start = 0; start < WORKS; start += 500) {
      const rows = Array.from({ length: 500 }, (_, k) => {
        const i = start + k;
        return {
          studio_id: studioId,
          stock_number: `${2020 + (i % 7)}-${String(i).padStart(5, '0')}`,
          title: `${forms[i % forms.length]} no. ${i}`,
          year: 2020 + (i % 7),
          series: series[i % series.length]!,
          category: forms[i % forms.length]!,
          clay_body: i % 2 ? 'Porcelain' : 'Stoneware',
          glaze: i % 3 ? 'Celadon' : 'Tenmoku',
          retail_price: 2_000 + ((i * 7919) % 200_000),
          cost_price: 500,
          currency: 'GBP',
        };
      });
      const ids = await trx.insertInto('works').values(rows).returning('id').execute();
      // About six works in ten have been out: some twice, so the latest line decides.
      const lines = ids.flatMap(({ id }, k) => {
        const i = start + k;
        if (i % 10 >= 6) return [];
        const first = {
          studio_id: studioId,
          consignment_id: consignmentIds[i % 20]!,
          work_id: id,
          currency: 'GBP',
          list_price: 10_000,
          insurance_value: 6_000,
          state: i % 3 === 0 ? ('returned' as const) : lineStates[i % lineStates.length]!,
        };
        const sold = (l: typeof first) =>
          l.state === 'sold' ? { ...l, sold_on: '2026-05-01', sale_price: 10_000 } : l;
        if (i % 3 !== 0) return [sold(first)];
        return [
          first,
          sold({
            ...first,
            consignment_id: consignmentIds[20 + (i % 20)]!,
            state: lineStates[i % 4]!,
          }),
        ];
      });
      if (lines.length) await trx.insertInto('consignment_lines').values(lines).execute();
    }
  });
}
