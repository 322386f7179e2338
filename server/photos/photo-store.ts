import { createHash, randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';

import pLimit from 'p-limit';
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

/** A phone's camera makes 12–50 megapixels; past 40 the decode alone needs over 160 MB. */
export const maxPhotoPixels = 40_000_000;

/**
 * Decoding is the memory-hungry part: at most two pictures are decoded at once in the process,
 * however many uploads arrive, so memory stays bounded (`npm run bench:api` measures it).
 */
const imageWork = pLimit(2);
sharp.cache(false);

export type CheckedImage = {
  /** The original as uploaded: a file on disk until the store keeps it, or its bytes. */
  original: string | Buffer;
  byteSize: number;
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

const tooManyPixels = (name: string, pixels: number) =>
  new HttpError(
    'invalid_request',
    `“${name}” is ${Math.round(pixels / 1_000_000)} megapixels; photos up to ` +
      `${maxPhotoPixels / 1_000_000} megapixels are accepted. Scale it down and upload it again.`,
  );

async function sha256Of(original: string | Buffer): Promise<string> {
  const hash = createHash('sha256');
  if (Buffer.isBuffer(original)) return hash.update(original).digest('hex');
  const handle = await fs.open(original);
  try {
    for await (const chunk of handle.createReadStream()) hash.update(chunk as Buffer);
  } finally {
    await handle.close();
  }
  return hash.digest('hex');
}

/**
 * Reads an uploaded file with sharp: its real format and size from the header first (a picture
 * over the pixel limit is refused before it is decoded), then a decode of every pixel for the
 * renditions, so a renamed text file or a truncated picture is refused. SVG is refused too: it
 * can carry scripts.
 */
export function checkImage(original: string | Buffer, name: string): Promise<CheckedImage> {
  return imageWork(async () => {
    let metadata: Metadata;
    try {
      metadata = await sharp(original, { limitInputPixels: false }).metadata();
    } catch {
      throw notAnImage(name);
    }
    const format =
      metadata.format === 'heif' && metadata.compression === 'av1' ? 'avif' : metadata.format;
    const mimeType = mimeTypes[format];
    if (!mimeType || !metadata.width || !metadata.height) throw notAnImage(name);
    const pixels = metadata.width * metadata.height;
    if (pixels > maxPhotoPixels) throw tooManyPixels(name, pixels);

    const decode = () =>
      sharp(original, { failOn: 'error', limitInputPixels: maxPhotoPixels }).rotate();
    let thumbnail: Buffer;
    let display: Buffer;
    try {
      thumbnail = await decode()
        .resize(thumbnailSize, thumbnailSize, { fit: 'cover' })
        .webp({ quality: 80 })
        .toBuffer();
      display = await decode()
        .resize(displaySize, displaySize, { fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 85 })
        .toBuffer();
    } catch {
      throw notAnImage(name);
    }
    // EXIF orientations 5–8 turn the picture a quarter: report it as it is shown.
    const turned = (metadata.orientation ?? 1) >= 5;
    return {
      original,
      byteSize: Buffer.isBuffer(original) ? original.length : (await fs.stat(original)).size,
      sha256: await sha256Of(original),
      mimeType,
      widthPx: turned ? metadata.height : metadata.width,
      heightPx: turned ? metadata.width : metadata.height,
      thumbnail,
      display,
    };
  });
}

async function exists(file: string): Promise<boolean> {
  try {
    await fs.access(file);
    return true;
  } catch {
    return false;
  }
}

/** Writes through a temporary name, so a reader never sees half a file. */
async function writeOnce(file: string, data: string | Buffer): Promise<void> {
  if (await exists(file)) return;
  await fs.mkdir(path.dirname(file), { recursive: true });
  const temporary = `${file}.${randomUUID()}.tmp`;
  if (Buffer.isBuffer(data)) await fs.writeFile(temporary, data);
  else await fs.copyFile(data, temporary);
  await fs.rename(temporary, file);
}

/**
 * Work on one content hash at a time: storing a picture and removing it when nothing refers to it
 * any more never interleave in this process.
 */
const contentLocks = new Map<string, Promise<unknown>>();
function withContentLock<T>(sha256: string, work: () => Promise<T>): Promise<T> {
  const previous = contentLocks.get(sha256) ?? Promise.resolve();
  const next = previous.then(work, work);
  const settled = next.catch(() => undefined);
  contentLocks.set(sha256, settled);
  void settled.then(() => {
    if (contentLocks.get(sha256) === settled) contentLocks.delete(sha256);
  });
  return next;
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
    /**
     * Keeps the pictures' files, then runs `record` (which writes the rows that refer to them)
     * under the pictures' content locks, so a removal of the same picture cannot come in between.
     * Locks are taken in hash order, so two uploads never wait on each other in a circle.
     */
    async keep<T>(images: readonly CheckedImage[], record: () => Promise<T>): Promise<T> {
      const byHash = new Map(images.map((image) => [image.sha256, image]));
      const hashes = [...byHash.keys()].sort();
      const locked = (index: number): Promise<T> => {
        if (index === hashes.length) return record();
        const image = byHash.get(hashes[index]!)!;
        return withContentLock(image.sha256, async () => {
          await writeOnce(originalPath(image.sha256), image.original);
          await writeOnce(thumbnailPath(image.sha256), image.thumbnail);
          await writeOnce(displayPath(image.sha256), image.display);
          return locked(index + 1);
        });
      };
      return locked(0);
    },
    /** Deletes a picture's files unless `stillUsed`, asked under its content lock, says otherwise. */
    async removeUnless(sha256: string, stillUsed: () => Promise<boolean>): Promise<void> {
      await withContentLock(sha256, async () => {
        if (await stillUsed()) return;
        for (const file of [originalPath(sha256), thumbnailPath(sha256), displayPath(sha256)]) {
          await fs.rm(file, { force: true });
        }
      });
    },
  };
}
export type PhotoStore = ReturnType<typeof photoStore>;
