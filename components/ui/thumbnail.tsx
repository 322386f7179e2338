import { type Photo } from '@/shared/schemas/work';

import { SquareImage } from './square-image';

/** The cover photo, square; a quiet blank square with a word when there is none. */
export function Thumbnail({
  photos,
  size,
  label,
}: {
  photos: readonly Photo[];
  size: number;
  label: string;
}) {
  const cover = [...photos].sort((a, b) => a.position - b.position)[0];
  return <SquareImage uri={cover?.thumbnailUrl ?? null} size={size} label={label} />;
}
