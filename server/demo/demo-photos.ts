import os from 'node:os';

import pLimit from 'p-limit';

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
  // Rendering is sharp's work on libuv's threads: one picture per core at a time, and none
  // started after one has failed.
  const limit = pLimit(os.availableParallelism());
  const photos = await Promise.all(
    shots.map(({ work, view }) =>
      limit(async () => {
        const slug = work.title.toLowerCase().replace(/[^a-z0-9]+/g, '-');
        const name = `${slug}${view === 'front' ? '' : `-${view}`}.jpg`;
        try {
          const image = await checkImage(await renderVesselPicture(work, view), name);
          await store.keep([image], async () => undefined);
          return { image, name };
        } catch (err) {
          limit.clearQueue();
          throw err;
        }
      }),
    ),
  );
  return demoWorks.map((_, index) => photos.filter((_, i) => shots[i]!.index === index));
}
