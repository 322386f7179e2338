import { readConfig } from '../config';
import { refuseOnPostgres } from './postgres-note';
import { restoreBackup } from './restore';

/** `npm run restore -- <folder>`: the backup back in place; stop the server first. */
async function main() {
  const from = process.argv[2];
  if (!from) {
    console.error('Say which backup to restore: npm run restore -- <backup folder>');
    process.exit(2);
  }
  const { database, dbFile, filesDir } = readConfig();
  refuseOnPostgres(database, 'restore');
  const { movedAside } = await restoreBackup({ from, dbFile, filesDir });
  console.log(`Restored ${from} into ${dbFile} and ${filesDir}.`);
  for (const file of movedAside) console.log(`  what was there before is kept as ${file}`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
