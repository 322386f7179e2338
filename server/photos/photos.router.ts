import express, { type Response } from 'express';

import {
  idParamsSchema,
  photoFileParamsSchema,
  photoOrderSchema,
  photoParamsSchema,
} from '@/shared/schemas/work';

import { requireRole, scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { notFound } from '../http/http-error';
import { validate } from '../http/validate';
import { photoStore } from './photo-store';
import { findPhotoFile } from './photos.repository';
import { deletePhoto, setPhotoOrder, uploadPhotos } from './photos.service';
import { sendRendition } from './send-rendition';
import { receivePhotos, uploadedFiles } from './upload';

const upload = validate({ params: idParamsSchema });
const order = validate({ params: idParamsSchema, body: photoOrderSchema });
const remove = validate({ params: photoParamsSchema });
const file = validate({ params: photoFileParamsSchema });

/** `/api/works/:id/photos`: a work's photos, for the studio side. */
export function workPhotosRouter({ db, filesDir }: AppContext) {
  const store = photoStore(filesDir);
  return express
    .Router({ mergeParams: true })
    .use(requireRole('owner', 'assistant'))
    .post('/', upload, receivePhotos, async (req, res) => {
      const { id } = upload.input(res).params;
      res.status(201).json(await uploadPhotos(db, store, scopeOf(res), id, uploadedFiles(req)));
    })
    .put('/order', order, async (_req, res) => {
      const { params, body } = order.input(res);
      res.json(await setPhotoOrder(db, scopeOf(res), params.id, body.photoIds));
    })
    .delete('/:photoId', remove, async (_req, res) => {
      const { id, photoId } = remove.input(res).params;
      res.json(await deletePhoto(db, store, scopeOf(res), id, photoId));
    });
}

/**
 * `/api/photos/:photoId` and `…/thumbnail`: the picture as shown, to any member whose scope can see
 * the work (a venue's staff see the works it holds).
 */
export function photoFilesRouter({ db, filesDir }: AppContext) {
  const store = photoStore(filesDir);
  const send = async (res: Response, variant: 'display' | 'thumbnail') => {
    const photo = await findPhotoFile(db, scopeOf(res), file.input(res).params.photoId);
    if (!photo) throw notFound('That photo');
    await sendRendition(res, store, photo.sha256, variant);
  };
  const roles = ['owner', 'assistant', 'gallery'] as const;
  // The photo's own studio: a venue's counter list shows pieces of all the makers it works for.
  const photoScope = requireScopeOf(
    db,
    'That photo',
    (d, res) => studioOf.workPhoto(d, file.input(res).params.photoId),
    ...roles,
  );
  return express
    .Router()
    .use(requireAnyRole(...roles))
    .get('/:photoId', file, photoScope, async (_req, res) => send(res, 'display'))
    .get('/:photoId/thumbnail', file, photoScope, async (_req, res) => send(res, 'thumbnail'));
}
