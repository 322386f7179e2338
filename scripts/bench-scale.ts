// Recording sales past one machine: the same load as `npm run bench:sales` (100 concurrent clients
// for 10 seconds, each selling the pieces of its own consignment) through one server process on
// SQLite, one process on PostgreSQL, and two processes sharing one PostgreSQL database, the clients
// spread over both as a load balancer would. After each run the database is counted against the
// answers: no sale lost or doubled. PostgreSQL is a throwaway cluster on loopback, or the server
// SAGGAR_BENCH_POSTGRES_URL names (its databases saggar_bench_* are made and dropped).
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { sql } from 'kysely';

import { type Db, openDatabase } from '../server/db/database';
import { migrateToLatest } from '../server/db/migrate';
import { isoDateInTimeZone } from '../shared/money';
import { reportSales, runSales } from './bench/sales-load';
import { benchPassword, type SalesSeed, seedSales } from './bench/seed-sales';
import { ms } from './bench/stats';
import { startPostgresCluster } from './lib/postgres-cluster';
import { signInCookie, startServerProcess } from './lib/server-process';

const SECONDS = 10;
const WARM_UP_SECONDS = 3;

type Setup = { name: string; database: string; processes: number };
type Result = Setup & Awaited<ReturnType<typeof reportSales>>;

async function seed(database: string) {
  const db = openDatabase(database);
  try {
    await migrateToLatest(db);
    const today = isoDateInTimeZone(new Date(), 'Europe/London');
    const dispatchDate = isoDateInTimeZone(new Date(Date.now() - 30 * 86_400_000), 'Europe/London');
    const warmUp = await seedSales(db, { name: 'Warm-up studio', dispatchDate, piecesEach: 50 });
    const bench = await seedSales(db, { name: 'Bench studio', dispatchDate, piecesEach: 150 });
    return { today, warmUp, bench };
  } finally {
    await db.destroy();
  }
}

async function measure(setup: Setup, dir: string): Promise<Result> {
  console.log(`\n=== ${setup.name}: seeding…`);
  const { today, warmUp, bench } = await seed(setup.database);
  // Every process shares the secret that signs sessions, and the files folder.
  const env = {
    SAGGAR_AUTH_SECRET: 'bench-scale-secret-long-enough-for-every-process',
    SAGGAR_FILES_DIR: path.join(dir, 'files'),
    SAGGAR_WEB_ROOT: path.join(dir, 'no-web-app'),
  };
  const servers = await Promise.all(
    Array.from({ length: setup.processes }, () => startServerProcess(setup.database, env)),
  );
  let counting: Db | undefined;
  try {
    const sessions = async (s: SalesSeed) => {
      const signIn = (email: string) => signInCookie(servers[0]!.url, email, benchPassword);
      return {
        staff: await Promise.all(s.staff.map(signIn)),
        owner: await signIn(s.owner),
        assistant: await signIn(s.assistant),
      };
    };
    await runSales(servers, warmUp, await sessions(warmUp), today, WARM_UP_SECONDS);
    const run = await runSales(servers, bench, await sessions(bench), today, SECONDS);
    await Promise.all(servers.map((server) => server.stop()));
    counting = openDatabase(setup.database);
    return { ...setup, ...(await reportSales(run, counting, bench)) };
  } finally {
    await Promise.all(servers.map((server) => server.stop()));
    await counting?.destroy();
  }
}

/** A fresh, empty database of its own on the PostgreSQL server for each run. */
async function freshPostgresDatabase(serverUrl: string, name: string): Promise<string> {
  const admin = openDatabase(serverUrl);
  try {
    await sql`drop database if exists ${sql.id(name)}`.execute(admin);
    await sql`create database ${sql.id(name)}`.execute(admin);
  } finally {
    await admin.destroy();
  }
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

function table(results: readonly Result[]) {
  console.log('\n| setup | sales a second | p95 | server CPU a sale | counted |');
  console.log('| --- | --- | --- | --- | --- |');
  for (const r of results) {
    console.log(
      `| ${r.name} | ${Math.round(r.rps)} | ${ms(r.p95)} | ` +
        `${(r.serverCpuMs / Math.max(1, r.sold)).toFixed(1)} ms | ` +
        `${r.counted ? `${r.sold} sold, none lost or doubled` : 'DISAGREE'} |`,
    );
  }
  console.log(
    `\n${os.cpus().length} CPU cores on this machine, shared by the clients and every server.`,
  );
}

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-bench-scale-'));
  const cluster = process.env.SAGGAR_BENCH_POSTGRES_URL
    ? { url: process.env.SAGGAR_BENCH_POSTGRES_URL, stop: () => {} }
    : await startPostgresCluster({ durable: true });
  try {
    const setups: Setup[] = [
      { name: 'SQLite, 1 process', database: path.join(dir, 'bench.db'), processes: 1 },
      {
        name: 'PostgreSQL, 1 process',
        database: await freshPostgresDatabase(cluster.url, 'saggar_bench_one'),
        processes: 1,
      },
      {
        name: 'PostgreSQL, 2 processes',
        database: await freshPostgresDatabase(cluster.url, 'saggar_bench_two'),
        processes: 2,
      },
    ];
    const results: Result[] = [];
    for (const setup of setups) results.push(await measure(setup, dir));
    table(results);
    if (results.some((r) => !r.counted)) {
      console.log('\nThe database disagrees with the answers in at least one setup.');
      process.exitCode = 1;
    }
  } finally {
    cluster.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
