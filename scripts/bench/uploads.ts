import sharp from 'sharp';

import { type ServerProcess } from '../lib/server-process';

const CLIENTS = 3;
const PHOTOS_EACH = 10;
/** The bound the README states for the server's resident memory while photos are checked. */
export const UPLOAD_MEMORY_BOUND_MB = 512;

/** A camera-sized photograph stand-in: 24 megapixels of grain, as a JPEG of a few MB. */
function largePhoto(seed: number): Promise<Buffer> {
  const noise = { type: 'gaussian', mean: 110 + seed, sigma: 30 } as const;
  return sharp({ create: { width: 6000, height: 4000, channels: 3, background: '#000', noise } })
    .jpeg({ quality: 80 })
    .toBuffer();
}

/**
 * Three people each sending ten large photos at once: the server checks at most two pictures at
 * a time and keeps uploads on disk, so its memory stays under a stated bound.
 */
export async function benchUploads(
  server: ServerProcess,
  cookie: string,
  workId: number,
): Promise<boolean> {
  const photos = await Promise.all(
    Array.from({ length: CLIENTS * PHOTOS_EACH }, (_, i) => largePhoto(i)),
  );
  const before = await server.memory();
  let peak = before.rssMb;
  let sampling = true;
  const sampler = (async () => {
    while (sampling) {
      peak = Math.max(peak, (await server.memory()).rssMb);
      await new Promise((r) => setTimeout(r, 20));
    }
  })();
  const started = performance.now();
  const statuses = await Promise.all(
    Array.from({ length: CLIENTS }, async (_, client) => {
      const form = new FormData();
      for (let i = 0; i < PHOTOS_EACH; i++) {
        const photo = photos[client * PHOTOS_EACH + i]!;
        form.append(
          'photos',
          new Blob([new Uint8Array(photo)], { type: 'image/jpeg' }),
          `photo-${client}-${i}.jpg`,
        );
      }
      const res = await fetch(`${server.url}/api/works/${workId}/photos`, {
        method: 'POST',
        headers: { cookie, origin: server.url },
        body: form,
      });
      return res.status;
    }),
  );
  const took = performance.now() - started;
  sampling = false;
  await sampler;
  const after = await server.memory();
  const sizes = photos.map((p) => p.length / 1024 / 1024);
  console.log(
    `\nUploads: ${CLIENTS} clients × ${PHOTOS_EACH} photos of 24 megapixels (${Math.min(...sizes).toFixed(1)}–${Math.max(...sizes).toFixed(1)} MB each), at once`,
  );
  console.log(`  answers ${statuses.join(', ')} in ${(took / 1000).toFixed(1)} s`);
  console.log(
    `  server memory: ${before.rssMb.toFixed(0)} MB before, peak ${Math.max(peak, after.peakMb).toFixed(0)} MB (bound ${UPLOAD_MEMORY_BOUND_MB} MB)`,
  );
  return statuses.every((s) => s === 201) && Math.max(peak, after.peakMb) < UPLOAD_MEMORY_BOUND_MB;
}
