import fs from 'node:fs/promises';
import path from 'node:path';

import { type BackupManifest, manifestName } from './backup';
import { copySqliteDatabase, integrityOf } from './sqlite-copy';

const exists = (file: string) =>
  fs.stat(file).then(
    () => true,
    () => false,
  );

async function readManifest(from: string): Promise<BackupManifest> {
  const file = path.join(from, manifestName);
  if (!(await exists(file))) {
    throw new Error(`${from} holds no ${manifestName}: it is not a finished Saggar backup.`);
  }
  return JSON.parse(await fs.readFile(file, 'utf8')) as BackupManifest;
}

/**
 * Puts a backup back as the database file and files folder the server is configured with. The
 * backup is checked first; what was there before is never overwritten but moved aside beside it,
 * so a restore over the wrong folder loses nothing. The server must be stopped meanwhile.
 */
export async function restoreBackup(options: {
  from: string;
  dbFile: string;
  filesDir: string;
  now?: Date;
}): Promise<{ movedAside: string[] }> {
  const from = path.resolve(options.from);
  const manifest = await readManifest(from);
  const database = path.join(from, manifest.database);
  const integrity = integrityOf(database);
  if (integrity !== 'ok') {
    throw new Error(`The backup's database fails SQLite's integrity check:\n${integrity}`);
  }

  const stamp = (options.now ?? new Date()).toISOString().replace(/[:.]/g, '-');
  const movedAside: string[] = [];
  const moveAside = async (file: string) => {
    if (!(await exists(file))) return;
    const aside = `${file}.before-restore-${stamp}`;
    await fs.rename(file, aside);
    movedAside.push(aside);
  };
  const dbFile = path.resolve(options.dbFile);
  for (const file of [dbFile, `${dbFile}-wal`, `${dbFile}-shm`]) await moveAside(file);
  await moveAside(path.resolve(options.filesDir));

  await fs.mkdir(path.dirname(dbFile), { recursive: true });
  await copySqliteDatabase(database, dbFile);
  const files = path.join(from, manifest.files);
  if (await exists(files)) await fs.cp(files, options.filesDir, { recursive: true });
  return { movedAside };
}
