import { type WorkPhotos } from '@/shared/schemas/work';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { listPhotosOf } from '../works/works.repository';
import { type CheckedImage, checkImage, type PhotoStore } from './photo-store';
import {
  appendPhotos,
  fileIdFor,
  photoIdsOf,
  removePhoto,
  reorderPhotos,
} from './photos.repository';

async function assertWork(db: Db, scope: Scope, workId: number): Promise<void> {
  const work = await scoped
    .works(db, scope)
    .select('works.id')
    .where('works.id', '=', workId)
    .executeTakeFirst();
  if (!work) throw notFound('That work');
}

export async function listWorkPhotos(db: Db, scope: Scope, workId: number): Promise<WorkPhotos> {
  return (await listPhotosOf(db, scope, [workId])).get(workId) ?? [];
}

/**
 * Checks every file before storing any (one bad file refuses the upload), stores each picture
 * once by content hash, and adds them after the work's existing photos.
 */
export async function uploadPhotos(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  workId: number,
  files: readonly { buffer: Buffer; originalname: string }[],
): Promise<WorkPhotos> {
  await assertWork(db, scope, workId);
  if (files.length === 0) {
    throw new HttpError('invalid_request', 'Choose at least one photo to upload.');
  }
  const images: CheckedImage[] = [];
  for (const file of files) images.push(await checkImage(file.buffer, file.originalname));
  for (const image of images) await store.save(image);
  await db.transaction().execute(async (trx) => {
    const fileIds = [];
    for (const [i, image] of images.entries()) {
      fileIds.push(await fileIdFor(trx, scope, image, files[i]!.originalname));
    }
    await appendPhotos(trx, scope, workId, fileIds);
  });
  return listWorkPhotos(db, scope, workId);
}

/** The work's photos in a new order, cover first; the list must hold each of them once. */
export async function setPhotoOrder(
  db: Db,
  scope: Scope,
  workId: number,
  photoIds: readonly number[],
): Promise<WorkPhotos> {
  await db.transaction().execute(async (trx) => {
    await assertWork(trx, scope, workId);
    const current = await photoIdsOf(trx, scope, workId);
    const sameSet =
      photoIds.length === current.length &&
      new Set(photoIds).size === photoIds.length &&
      photoIds.every((id) => current.includes(id));
    if (!sameSet) {
      const message = 'List each of this work’s photos once, cover first.';
      throw new HttpError('invalid_request', message, [{ path: ['photoIds'], message }]);
    }
    await reorderPhotos(trx, scope, workId, photoIds);
  });
  return listWorkPhotos(db, scope, workId);
}

export async function deletePhoto(
  db: Db,
  scope: Scope,
  workId: number,
  photoId: number,
): Promise<WorkPhotos> {
  await db.transaction().execute(async (trx) => {
    await assertWork(trx, scope, workId);
    if (!(await removePhoto(trx, scope, workId, photoId))) throw notFound('That photo');
  });
  return listWorkPhotos(db, scope, workId);
}
