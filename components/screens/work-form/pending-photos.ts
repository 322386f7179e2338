import { useState } from 'react';

import { type PhotoTile } from '@/components/ui/photo-strip';
import { type ChosenFile } from '@/hooks/chosen-file';

type Pending = { key: string; file: ChosenFile };

function moved<T>(items: readonly T[], from: number, to: number): T[] {
  const next = [...items];
  const [item] = next.splice(from, 1);
  if (item !== undefined) next.splice(to, 0, item);
  return next;
}

let counter = 0;

/** Photos chosen for a work that does not exist yet: kept in order here, sent once it is saved. */
export function usePendingPhotos() {
  const [pending, setPending] = useState<Pending[]>([]);
  const indexOf = (key: string) => pending.findIndex((p) => p.key === key);
  return {
    files: pending.map((p) => p.file),
    tiles: pending.map<PhotoTile>((p, i) => ({
      key: p.key,
      uri: p.file.uri,
      label: `Photo ${i + 1} to add: ${p.file.name}`,
    })),
    add: (files: ChosenFile[]) =>
      setPending((list) => [
        ...list,
        ...files.map((file) => ({ key: `p${(counter += 1)}`, file })),
      ]),
    move: (key: string, offset: -1 | 1) =>
      setPending((list) => {
        const from = list.findIndex((p) => p.key === key);
        return moved(list, from, Math.max(0, Math.min(list.length - 1, from + offset)));
      }),
    makeCover: (key: string) => setPending((list) => moved(list, indexOf(key), 0)),
    remove: (key: string) => setPending((list) => list.filter((p) => p.key !== key)),
  };
}

export { moved };
