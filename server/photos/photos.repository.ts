import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { type CheckedImage } from './photo-store';

/** The studio's `files` row for this content, made on first upload: one per studio and hash. */
export async function fileIdFor(
  db: Db,
  scope: Scope,
  image: CheckedImage,
  originalName: string,
): Promise<number> {
  await db
    .insertInto('files')
    .values({
      studio_id: scope.studioId,
      sha256: image.sha256,
      mime_type: image.mimeType,
      byte_size: image.buffer.length,
      original_name: originalName,
      width_px: image.widthPx,
      height_px: image.heightPx,
      created_by: scope.userId,
    })
    .onConflict((oc) => oc.columns(['studio_id', 'sha256']).doNothing())
    .execute();
  const row = await scoped
    .files(db, scope)
    .select('files.id')
    .where('files.sha256', '=', image.sha256)
    .executeTakeFirstOrThrow();
  return row.id;
}

async function photoRowsOf(db: Db, scope: Scope, workId: number) {
  return scoped
    .workPhotos(db, scope)
    .select(['work_photos.id', 'work_photos.file_id', 'work_photos.position'])
    .where('works.id', '=', workId)
    .orderBy('work_photos.position')
    .execute();
}

/**
 * Sets the positions to the order given (0 is the cover). Positions are unique per work, so the
 * rows first step aside to negative ones.
 */
async function writePositions(db: Db, photoIds: readonly number[]): Promise<void> {
  for (const [index, id] of photoIds.entries()) {
    await db
      .updateTable('work_photos')
      .set({ position: -1 - index })
      .where('id', '=', id)
      .execute();
  }
  for (const [index, id] of photoIds.entries()) {
    await db.updateTable('work_photos').set({ position: index }).where('id', '=', id).execute();
  }
}

/** Adds photos after the existing ones; a picture the work already has is not added twice. */
export async function appendPhotos(
  db: Db,
  scope: Scope,
  workId: number,
  fileIds: readonly number[],
): Promise<void> {
  const existing = await photoRowsOf(db, scope, workId);
  const onWork = new Set(existing.map((p) => p.file_id));
  let position = existing.reduce((max, p) => Math.max(max, p.position + 1), 0);
  for (const fileId of fileIds) {
    if (onWork.has(fileId)) continue;
    onWork.add(fileId);
    await db
      .insertInto('work_photos')
      .values({ work_id: workId, file_id: fileId, position: position++ })
      .execute();
  }
}

/** The ids of the work's photos in their order. */
export async function photoIdsOf(db: Db, scope: Scope, workId: number): Promise<number[]> {
  return (await photoRowsOf(db, scope, workId)).map((p) => p.id);
}

export async function reorderPhotos(
  db: Db,
  scope: Scope,
  workId: number,
  photoIds: readonly number[],
): Promise<void> {
  const current = new Set(await photoIdsOf(db, scope, workId));
  if (photoIds.some((id) => !current.has(id))) throw new Error('photo of another work');
  await writePositions(db, photoIds);
}

/** Removes one photo and closes the gap, so the first one left is the cover. */
export async function removePhoto(
  db: Db,
  scope: Scope,
  workId: number,
  photoId: number,
): Promise<boolean> {
  const ids = await photoIdsOf(db, scope, workId);
  if (!ids.includes(photoId)) return false;
  await db.deleteFrom('work_photos').where('id', '=', photoId).execute();
  await writePositions(
    db,
    ids.filter((id) => id !== photoId),
  );
  return true;
}

/** The stored file behind a photo, if the scope may see the work it belongs to. */
export async function findPhotoFile(db: Db, scope: Scope, photoId: number) {
  return scoped
    .workPhotos(db, scope)
    .select(['files.sha256', 'files.mime_type'])
    .where('work_photos.id', '=', photoId)
    .executeTakeFirst();
}
