import { type Db } from '../db/database';

/**
 * Which studio a resource belongs to, looked up by its id alone. These are the only queries that
 * start outside a Scope, and they answer nothing but a studio's id: the route then takes the
 * viewer's membership in that studio as its Scope, and every query after that is scoped.
 */
export const studioOf = {
  async line(db: Db, lineId: number) {
    const row = await db
      .selectFrom('consignment_lines')
      .select('studio_id')
      .where('id', '=', lineId)
      .executeTakeFirst();
    return row?.studio_id;
  },

  async consignment(db: Db, consignmentId: number) {
    const row = await db
      .selectFrom('consignments')
      .select('studio_id')
      .where('id', '=', consignmentId)
      .executeTakeFirst();
    return row?.studio_id;
  },

  async workPhoto(db: Db, photoId: number) {
    const row = await db
      .selectFrom('work_photos')
      .innerJoin('works', 'works.id', 'work_photos.work_id')
      .select('works.studio_id')
      .where('work_photos.id', '=', photoId)
      .executeTakeFirst();
    return row?.studio_id;
  },

  async file(db: Db, fileId: number) {
    const row = await db
      .selectFrom('files')
      .select('studio_id')
      .where('id', '=', fileId)
      .executeTakeFirst();
    return row?.studio_id;
  },

  async statement(db: Db, statementId: number) {
    const row = await db
      .selectFrom('statements')
      .select('studio_id')
      .where('id', '=', statementId)
      .executeTakeFirst();
    return row?.studio_id;
  },
};
