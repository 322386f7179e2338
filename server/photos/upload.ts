import { type RequestHandler } from 'express';
import multer from 'multer';

import { HttpError } from '../http/http-error';

export const maxPhotoBytes = 15 * 1024 * 1024;
export const maxPhotosPerUpload = 10;

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: maxPhotoBytes, files: maxPhotosPerUpload, fields: 5 },
}).array('photos', maxPhotosPerUpload);

/** multer's refusals in the API's error shape. */
function toUploadError(err: unknown): unknown {
  if (!(err instanceof multer.MulterError)) return err;
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new HttpError('payload_too_large', 'Each photo must be 15 MB or smaller.');
    case 'LIMIT_FILE_COUNT':
    case 'LIMIT_UNEXPECTED_FILE':
      return err.field && err.field !== 'photos'
        ? new HttpError('invalid_request', 'Send the photos in the “photos” field.')
        : new HttpError(
            'invalid_request',
            `Upload at most ${maxPhotosPerUpload} photos at a time.`,
          );
    default:
      return new HttpError('invalid_request', 'The upload could not be read. Try again.');
  }
}

/**
 * Reads a multipart upload of photos (field `photos`) into memory. multer checks only sizes and
 * counts here; whether each file really is an image is sharp's job (photo-store.ts).
 */
export const receivePhotos: RequestHandler = (req, res, next) => {
  upload(req, res, (err?: unknown) => next(err ? toUploadError(err) : undefined));
};

export function uploadedFiles(req: Parameters<RequestHandler>[0]): Express.Multer.File[] {
  return Array.isArray(req.files) ? req.files : [];
}
