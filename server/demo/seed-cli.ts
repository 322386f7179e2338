import { readConfig } from '../config';
import { isPostgresUrl, openDatabase } from '../db/database';
import { migrateToLatest } from '../db/migrate';
import { clearAllData, seedDemoIfEmpty } from './seed';

/** `npm run seed` seeds an empty database; `npm run seed -- --reset` empties it first. */
async function main() {
  const reset = process.argv.includes('--reset');
  const { database, filesDir } = readConfig();
  const db = openDatabase(database);
  // A URL may carry a password: it is not printed.
  const where = isPostgresUrl(database) ? 'the PostgreSQL database' : database;
  try {
    await migrateToLatest(db);
    if (reset) await clearAllData(db);
    const seeded = await seedDemoIfEmpty(db, { filesDir });
    console.log(
      seeded
        ? `Demo data seeded into ${where}, its photographs into ${filesDir}.`
        : `${where} already holds data; nothing seeded. Use --reset to replace it with the demo.`,
    );
  } finally {
    await db.destroy();
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
