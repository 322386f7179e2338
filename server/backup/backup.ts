import fs from 'node:fs/promises';
import path from 'node:path';

import { photoStore } from '../photos/photo-store';
import { copySqliteDatabase, integrityOf, referencedPictures } from './sqlite-copy';

/** What a backup folder holds, written last: a folder without it is an unfinished backup. */
export type BackupManifest = {
  createdAt: string;
  database: string;
  files: string;
  integrity: string;
  pictures: number;
  /** Pictures the copy refers to whose files were gone by the time they were copied. */
  missingPictures: string[];
};

export const manifestName = 'manifest.json';
const databaseName = 'saggar.db';
const filesName = 'files';

/**
 * A consistent copy of the database and, beside it, the uploaded files. The database is copied
 * first, then the files: a picture is written before any row refers to it, so every picture the
 * copy refers to is on disk unless it was deleted in between, and those are listed.
 */
export async function makeBackup(options: {
  dbFile: string;
  filesDir: string;
  into: string;
  now?: Date;
}): Promise<BackupManifest> {
  const into = path.resolve(options.into);
  await fs.mkdir(into, { recursive: true });
  if ((await fs.readdir(into)).length > 0) {
    throw new Error(`${into} is not empty; give a new folder for the backup.`);
  }
  const database = path.join(into, databaseName);
  await copySqliteDatabase(options.dbFile, database);
  const files = path.join(into, filesName);
  await fs.cp(options.filesDir, files, { recursive: true, force: false }).catch((err: unknown) => {
    // A studio that never uploaded a picture has no files folder yet.
    if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err;
  });
  const hashes = referencedPictures(database);
  const store = photoStore(files);
  const missingPictures: string[] = [];
  for (const sha256 of hashes) {
    const present = await fs.stat(store.displayPath(sha256)).then(
      () => true,
      () => false,
    );
    if (!present) missingPictures.push(sha256);
  }
  const manifest: BackupManifest = {
    createdAt: (options.now ?? new Date()).toISOString(),
    database: databaseName,
    files: filesName,
    integrity: integrityOf(database),
    pictures: hashes.length,
    missingPictures,
  };
  await fs.writeFile(path.join(into, manifestName), `${JSON.stringify(manifest, null, 2)}\n`);
  return manifest;
}
