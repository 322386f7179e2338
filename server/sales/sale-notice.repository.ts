import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** Where the maker's sale e-mail goes: the studio's first owner. */
export async function findOwnerAddress(db: Db, scope: Scope): Promise<string | undefined> {
  const row = await scoped
    .memberships(db, { ...scope, venueId: null })
    .innerJoin('users', 'users.id', 'memberships.user_id')
    .select('users.email')
    .where('memberships.role', '=', 'owner')
    .orderBy('memberships.id')
    .executeTakeFirst();
  return row?.email;
}

/** Sold lines named by id or waiting in the held e-mail `mailId`, as the e-mail shows them. */
export async function listNoticeLines(
  db: Db,
  scope: Scope,
  select: { lineIds: readonly number[]; mailId: number | null },
) {
  return scoped
    .consignmentLines(db, { ...scope, venueId: null })
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .leftJoin('users as seller', 'seller.id', 'consignment_lines.sale_recorded_by')
    .leftJoin('work_photos as cover', (join) =>
      join.onRef('cover.work_id', '=', 'works.id').on('cover.position', '=', 0),
    )
    .select([
      'consignment_lines.id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.sale_price',
      'consignment_lines.sold_on',
      'consignment_lines.discount_reason',
      'consignment_lines.sale_entered_by',
      'consignments.reference',
      'consignments.terms',
      'venues.name as venue_name',
      'works.stock_number',
      'works.title',
      'seller.name as seller_name',
      'cover.id as cover_photo_id',
    ])
    .where('consignment_lines.state', '=', 'sold')
    .where((eb) => {
      const byId =
        select.lineIds.length > 0 ? [eb('consignment_lines.id', 'in', select.lineIds)] : [];
      const byMail =
        select.mailId === null ? [] : [eb('consignment_lines.sale_mail_id', '=', select.mailId)];
      return eb.or([...byId, ...byMail]);
    })
    .orderBy('consignment_lines.sale_recorded_at')
    .orderBy('consignment_lines.id')
    .execute();
}
export type NoticeLineRow = Awaited<ReturnType<typeof listNoticeLines>>[number];

/** Notes which held e-mail tells the maker of these sales. */
export async function setSaleMail(
  db: Db,
  scope: Scope,
  lineIds: readonly number[],
  mailId: number,
) {
  if (lineIds.length === 0) return;
  await db
    .updateTable('consignment_lines')
    .set({ sale_mail_id: mailId })
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.id', 'in', lineIds)
    .execute();
}
