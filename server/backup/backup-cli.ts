import path from 'node:path';

import { readConfig } from '../config';
import { makeBackup } from './backup';
import { refuseOnPostgres } from './postgres-note';

/** `npm run backup [-- <folder>]`: a copy of the live database and files, safe while serving. */
async function main() {
  const { database, dbFile, dataDir, filesDir } = readConfig();
  refuseOnPostgres(database, 'backup');
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  const into = process.argv[2] ?? path.join(dataDir, 'backups', stamp);
  const manifest = await makeBackup({ dbFile, filesDir, into });
  console.log(`Backed up ${dbFile} and ${filesDir} into ${path.resolve(into)}`);
  console.log(`  integrity check: ${manifest.integrity}; pictures: ${manifest.pictures}`);
  if (manifest.missingPictures.length > 0) {
    console.log(
      `  ${manifest.missingPictures.length} picture(s) were deleted while the backup ran; ` +
        'they are listed in its manifest.json.',
    );
  }
  console.log(`Put it back with: npm run restore -- ${path.resolve(into)}`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
