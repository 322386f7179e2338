// Recording sales under load: the real server on loopback over a temporary database, 100
// concurrent clients selling for 10 seconds, each the pieces of its own consignment (100 shows of
// 150 pieces at ten venues), then the database counted against the answers. Targets: ≥ 500 sales
// a second, p95 < 100 ms, none lost or doubled. The exit code says whether they were met.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { openDatabase } from '../server/db/database';
import { migrateToLatest } from '../server/db/migrate';
import { isoDateInTimeZone } from '../shared/money';
import { reportSales, runSales, SECONDS } from './bench/sales-load';
import { benchPassword, type SalesSeed, seedSales } from './bench/seed-sales';
import { signInCookie, startServerProcess } from './lib/server-process';

/** Before the run, the same sales in another studio, so its e-mail and figures stay apart. */
const WARM_UP_SECONDS = 3;

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-bench-sales-'));
  const dbFile = path.join(dir, 'bench.db');
  try {
    console.log('Seeding two studios: 15,000 pieces to sell, 5,000 to warm up on…');
    // The studios' time zone is the default, Europe/London: its today is the day of the sales.
    const today = isoDateInTimeZone(new Date(), 'Europe/London');
    const dispatchDate = isoDateInTimeZone(new Date(Date.now() - 30 * 86_400_000), 'Europe/London');
    const db = openDatabase(dbFile);
    await migrateToLatest(db);
    const warmUp = await seedSales(db, { name: 'Warm-up studio', dispatchDate, piecesEach: 50 });
    const bench = await seedSales(db, { name: 'Bench studio', dispatchDate, piecesEach: 150 });
    await db.destroy();

    const server = await startServerProcess(dbFile, {
      SAGGAR_FILES_DIR: path.join(dir, 'files'),
      SAGGAR_WEB_ROOT: path.join(dir, 'no-web-app'),
    });
    try {
      const sessions = async (seed: SalesSeed) => {
        const signIn = (email: string) => signInCookie(server.url, email, benchPassword);
        return {
          staff: await Promise.all(seed.staff.map(signIn)),
          owner: await signIn(seed.owner),
          assistant: await signIn(seed.assistant),
        };
      };
      const warm = await runSales([server], warmUp, await sessions(warmUp), today, WARM_UP_SECONDS);
      console.log(
        `Warmed up: ${warm.latencies.length} sales in another studio in ${WARM_UP_SECONDS} s.`,
      );
      const run = await runSales([server], bench, await sessions(bench), today, SECONDS);
      await server.stop();
      const counting = openDatabase(dbFile);
      const { met } = await reportSales(run, counting, bench).finally(() => counting.destroy());
      console.log(met ? '\nAll targets met.' : '\nSome targets missed.');
      if (!met) process.exitCode = 1;
    } finally {
      await server.stop();
    }
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
