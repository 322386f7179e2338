import { sql } from 'kysely';

import { insuranceValue } from '@/shared/money';
import { type Terms } from '@/shared/schemas/terms';

import { type Scope } from '../access/viewer';
import { createUserWithPassword } from '../auth/passwords';
import { type Db } from '../db/database';
import { type Database } from '../db/schema';
import { appendPhotos, fileIdFor } from '../photos/photos.repository';
import { type DemoPhoto, storeDemoPhotos } from './demo-photos';
import { demoConsignments, demoSignIns, demoStudio, demoVenues, demoWorks } from './demo-studio';

/** Children before parents, so deleting in this order never trips a foreign key. */
const tablesInDeleteOrder: (keyof Database)[] = [
  'audit_log',
  'outbox',
  'payments',
  'statement_lines',
  'statements',
  'condition_findings',
  'condition_reports',
  'consignment_lines',
  'consignments',
  'work_photos',
  'works',
  'files',
  'invitations',
  'sessions',
  'memberships',
  'venues',
  'studios',
  'verifications',
  'accounts',
  'users',
];

export async function isEmpty(db: Db): Promise<boolean> {
  const row = await sql<{ n: number }>`select
    (select count(*) from studios) + (select count(*) from users) as n`.execute(db);
  return Number(row.rows[0]?.n ?? 0) === 0;
}

/** Deletes every row of every table; used by `npm run seed -- --reset` only. */
export async function clearAllData(db: Db): Promise<void> {
  await db.transaction().execute(async (trx) => {
    for (const table of tablesInDeleteOrder) await trx.deleteFrom(table).execute();
  });
}

export type SeedOptions = {
  /** Where photographs are stored: the same folder the app serves uploads from. */
  filesDir: string;
};

/** Seeds the demo scenario, but only into an empty database. Returns whether it did. */
export async function seedDemoIfEmpty(db: Db, options: SeedOptions): Promise<boolean> {
  if (!(await isEmpty(db))) return false;
  // The photographs go to disk first; a file left there by a failed seed is harmless, being
  // named by its content, and the next seed finds it in place.
  const photos = await storeDemoPhotos(options.filesDir);
  await seedDemo(db, photos);
  return true;
}

async function seedDemo(db: Db, photos: DemoPhoto[][]): Promise<void> {
  const [makerPerson, assistantPerson, galleryPerson] = demoSignIns.people;
  const password = demoSignIns.password;
  // One transaction: a seed that fails halfway leaves the database empty, so it can run again.
  await db.transaction().execute(async (trx) => {
    const maker = await createUserWithPassword(trx, { ...makerPerson, password });
    const assistant = await createUserWithPassword(trx, { ...assistantPerson, password });
    const gallery = await createUserWithPassword(trx, { ...galleryPerson, password });

    const { id: studioId } = await trx
      .insertInto('studios')
      .values({
        name: demoStudio.name,
        country: demoStudio.country,
        currency: demoStudio.currency,
        stock_number_pattern: demoStudio.stockNumberPattern,
        price_step: demoStudio.priceStep,
        default_terms: JSON.stringify(demoVenues[1].terms),
      })
      .returning('id')
      .executeTakeFirstOrThrow();

    const venueIds = new Map<string, number>();
    for (const v of demoVenues) {
      const { id } = await trx
        .insertInto('venues')
        .values({
          studio_id: studioId,
          name: v.name,
          kind: v.kind,
          town: v.town,
          postcode: v.postcode,
          country: 'GB',
          contact_name: v.contactName,
          email: v.email,
          vat_number: v.vatNumber,
          default_terms: JSON.stringify(v.terms),
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      venueIds.set(v.key, id);
    }

    await trx
      .insertInto('memberships')
      .values([
        { user_id: maker, studio_id: studioId, role: 'owner', venue_id: null },
        { user_id: assistant, studio_id: studioId, role: 'assistant', venue_id: null },
        {
          user_id: gallery,
          studio_id: studioId,
          role: 'gallery',
          venue_id: venueIds.get('lanthorn')!,
        },
      ])
      .execute();

    const scope: Scope = { studioId, venueId: null, userId: maker, role: 'owner' };
    const workIds: number[] = [];
    for (const [i, w] of demoWorks.entries()) {
      const { id } = await trx
        .insertInto('works')
        .values({
          studio_id: studioId,
          stock_number: `${i < 8 ? 2025 : 2026}-${String(i + 1).padStart(3, '0')}`,
          title: w.title,
          year: i < 8 ? 2025 : 2026,
          series: w.series,
          category: w.category,
          clay_body: w.clayBody,
          glaze: w.glaze,
          firing_temp_c: w.firingTempC,
          atmosphere: w.atmosphere,
          kiln: w.kiln,
          height_mm: w.size[0],
          width_mm: w.size[1],
          depth_mm: w.size[2],
          weight_g: w.weightG,
          retail_price: w.pricePence,
          currency: 'GBP',
          cost_price: w.costPence ?? null,
          food_use: w.foodUse,
          care_notes: w.careNotes ?? null,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      workIds.push(id);
      const fileIds: number[] = [];
      for (const photo of photos[i]!) {
        fileIds.push(await fileIdFor(trx, scope, photo.image, photo.name));
      }
      await appendPhotos(trx, scope, id, fileIds);
    }

    for (const c of demoConsignments) {
      const venue = demoVenues.find((v) => v.key === c.venue)!;
      const terms: Terms = { ...venue.terms };
      const { id: consignmentId } = await trx
        .insertInto('consignments')
        .values({
          studio_id: studioId,
          venue_id: venueIds.get(c.venue)!,
          reference: c.reference,
          title: c.title,
          state: c.state,
          dispatch_date: c.dispatchDate,
          opening_date: c.openingDate,
          closing_date: c.closingDate,
          return_due_date: c.returnDueDate,
          terms: JSON.stringify(terms),
          agreed_at: `${c.agreedOn}T10:00:00.000Z`,
          dispatched_at: `${c.dispatchDate}T09:00:00.000Z`,
          acknowledged_at: `${c.arrival.on}T11:00:00.000Z`,
          acknowledged_by: c.venue === 'lanthorn' ? gallery : assistant,
        })
        .returning('id')
        .executeTakeFirstOrThrow();

      for (const line of c.lines) {
        const work = demoWorks[line.work]!;
        const listPrice = { amount: work.pricePence, currency: 'GBP' };
        const sold = 'sold' in line ? line.sold : null;
        const recorder = c.venue === 'lanthorn' ? gallery : assistant;
        const { id: lineId } = await trx
          .insertInto('consignment_lines')
          .values({
            studio_id: studioId,
            consignment_id: consignmentId,
            work_id: workIds[line.work]!,
            currency: 'GBP',
            list_price: work.pricePence,
            insurance_value: insuranceValue(terms, listPrice).amount,
            state: sold ? 'sold' : 'consigned',
            sold_on: sold?.on ?? null,
            sale_price: sold?.price ?? null,
            discount: sold && sold.price < work.pricePence ? work.pricePence - sold.price : null,
            discount_reason:
              sold && sold.price < work.pricePence && 'reason' in sold ? sold.reason : null,
            sale_recorded_by: sold ? recorder : null,
            // The Lanthorn's staff record their own sales; the quayside shop phones them in.
            sale_entered_by: sold ? (c.venue === 'lanthorn' ? 'venue' : 'studio') : null,
            sale_recorded_at: sold ? `${sold.on}T16:30:00.000Z` : null,
            holds_work: sold ? null : 1,
          })
          .returning('id')
          .executeTakeFirstOrThrow();
        const found = 'finding' in line ? [line.finding] : [];
        for (const [stage, on, examiner, by] of [
          ['dispatch', c.dispatchDate, demoSignIns.people[1].name, assistant],
          [
            'arrival',
            c.arrival.on,
            c.arrival.examiner,
            c.venue === 'lanthorn' ? gallery : assistant,
          ],
        ] as const) {
          const { id: reportId } = await trx
            .insertInto('condition_reports')
            .values({
              studio_id: studioId,
              work_id: workIds[line.work]!,
              consignment_line_id: lineId,
              stage,
              examiner_name: examiner,
              examined_by: by,
              examined_on: on,
            })
            .returning('id')
            .executeTakeFirstOrThrow();
          for (const finding of found) {
            await trx
              .insertInto('condition_findings')
              .values({ report_id: reportId, ...finding, size_mm: null, photo_file_id: null })
              .execute();
          }
        }
      }
    }
  });
}
