import { createHash, randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';

import sharp, { type Metadata } from 'sharp';

import { HttpError } from '../http/http-error';

/** Formats a photo may come in, as sharp reads them from the content (not the declared type). */
const mimeTypes: Record<string, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  gif: 'image/gif',
  tiff: 'image/tiff',
  avif: 'image/avif',
};

export const thumbnailSize = 480;
/** The longest side of the picture the app shows; originals are kept but never served. */
export const displaySize = 2048;
/** Both renditions are WebP, written by sharp without the original's metadata (EXIF, GPS). */
export const renditionMimeType = 'image/webp';

export type CheckedImage = {
  buffer: Buffer;
  sha256: string;
  mimeType: string;
  widthPx: number;
  heightPx: number;
  thumbnail: Buffer;
  display: Buffer;
};

const notAnImage = (name: string) =>
  new HttpError(
    'invalid_request',
    `“${name}” is not a photo we can read. Upload JPEG, PNG, WebP, GIF, AVIF or TIFF images.`,
  );

/**
 * Reads the upload with sharp: its real format from the content, and a decode of every pixel
 * (the thumbnail), so a renamed text file or a truncated picture is refused. SVG is refused too:
 * it can carry scripts.
 */
export async function checkImage(buffer: Buffer, name: string): Promise<CheckedImage> {
  let metadata: Metadata;
  let thumbnail: Buffer;
  let display: Buffer;
  try {
    metadata = await sharp(buffer).metadata();
    thumbnail = await sharp(buffer, { failOn: 'error' })
      .rotate()
      .resize(thumbnailSize, thumbnailSize, { fit: 'cover' })
      .webp({ quality: 80 })
      .toBuffer();
    display = await sharp(buffer, { failOn: 'error' })
      .rotate()
      .resize(displaySize, displaySize, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 85 })
      .toBuffer();
  } catch {
    throw notAnImage(name);
  }
  const format =
    metadata.format === 'heif' && metadata.compression === 'av1' ? 'avif' : metadata.format;
  const mimeType = mimeTypes[format];
  if (!mimeType || !metadata.width || !metadata.height) throw notAnImage(name);
  // EXIF orientations 5–8 turn the picture a quarter: report it as it is shown.
  const turned = (metadata.orientation ?? 1) >= 5;
  return {
    buffer,
    sha256: createHash('sha256').update(buffer).digest('hex'),
    mimeType,
    widthPx: turned ? metadata.height : metadata.width,
    heightPx: turned ? metadata.width : metadata.height,
    thumbnail,
    display,
  };
}

/** Writes through a temporary name, so a reader never sees half a file. */
async function writeOnce(file: string, data: Buffer): Promise<void> {
  try {
    await fs.access(file);
    return;
  } catch {
    // not there yet
  }
  await fs.mkdir(path.dirname(file), { recursive: true });
  const temporary = `${file}.${randomUUID()}.tmp`;
  await fs.writeFile(temporary, data);
  await fs.rename(temporary, file);
}

/**
 * Originals and their renditions on disk, named by the SHA-256 of the original's content, so the
 * same picture is stored once however often it is uploaded. Only the renditions are served: a
 * phone's original can carry where it was taken, and a venue's staff see these pictures too.
 */
export function photoStore(filesDir: string) {
  const root = path.resolve(filesDir);
  const shard = (sha256: string) => sha256.slice(0, 2);
  const originalPath = (sha256: string) => path.join(root, 'originals', shard(sha256), sha256);
  const thumbnailPath = (sha256: string) =>
    path.join(root, 'thumbnails', shard(sha256), `${sha256}-${thumbnailSize}.webp`);
  const displayPath = (sha256: string) =>
    path.join(root, 'display', shard(sha256), `${sha256}-${displaySize}.webp`);

  return {
    originalPath,
    thumbnailPath,
    displayPath,
    async save(image: CheckedImage): Promise<void> {
      await writeOnce(originalPath(image.sha256), image.buffer);
      await writeOnce(thumbnailPath(image.sha256), image.thumbnail);
      await writeOnce(displayPath(image.sha256), image.display);
    },
  };
}
export type PhotoStore = ReturnType<typeof photoStore>;
