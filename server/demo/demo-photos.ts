import os from 'node:os';

import { type CheckedImage, checkImage, photoStore } from '../photos/photo-store';
import { demoWorks } from './demo-studio';
import { type PictureView, renderVesselPicture, secondViewFor } from './pictures/vessel-picture';

export type DemoPhoto = { image: CheckedImage; name: string };

/** The dearer pieces get a second photograph, as a maker would take for a gallery. */
const secondPhotoFromPence = 40_000;

/**
 * Draws every demo work's photographs and stores them as uploads are stored (checked by sharp,
 * kept by content hash), before any row is written. Returns them in the order of `demoWorks`.
 */
export async function storeDemoPhotos(filesDir: string): Promise<DemoPhoto[][]> {
  const store = photoStore(filesDir);
  const shots = demoWorks.flatMap((work, index) => {
    const views: PictureView[] =
      work.pricePence >= secondPhotoFromPence ? ['front', secondViewFor(work)] : ['front'];
    return views.map((view) => ({ work, index, view }));
  });
  // Rendering is sharp's work on libuv's threads: one picture per core at a time.
  const photos = await mapLimited(shots, os.availableParallelism(), async ({ work, view }) => {
    const slug = work.title.toLowerCase().replace(/[^a-z0-9]+/g, '-');
    const name = `${slug}${view === 'front' ? '' : `-${view}`}.jpg`;
    const image = await checkImage(await renderVesselPicture(work, view), name);
    await store.save(image);
    return { image, name };
  });
  return demoWorks.map((_, index) => photos.filter((_, i) => shots[i]!.index === index));
}

/**
 * Runs `task` over the items, at most `limit` at once, keeping the results in order. After a
 * failure no new task starts, and it rejects only once those under way have finished.
 */
async function mapLimited<T, R>(
  items: readonly T[],
  limit: number,
  task: (item: T) => Promise<R>,
): Promise<R[]> {
  const results: R[] = [];
  let next = 0;
  let failed = false;
  const worker = async () => {
    while (next < items.length && !failed) {
      const i = next++;
      try {
        results[i] = await task(items[i]!);
      } catch (err) {
        failed = true;
        throw err;
      }
    }
  };
  const workers = Array.from({ length: Math.max(1, Math.min(limit, items.length)) }, worker);
  const outcomes = await Promise.allSettled(workers);
  const failure = outcomes.find((o) => o.status === 'rejected');
  if (failure) throw failure.reason;
  return results;
}
