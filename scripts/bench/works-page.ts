import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';

import SQLite from 'better-sqlite3';
import { type CompiledQuery, Kysely, SqliteDialect } from 'kysely';
import pino from 'pino';

import { createApp } from '../../server/app';
import { createContext } from '../../server/context';
import { migrateToLatest } from '../../server/db/migrate';
import { type Database } from '../../server/db/schema';
import { signInCookie } from '../lib/server-process';
import { benchOwner, seedWorks } from './seed-works';
import { ms, stats } from './stats';

export const WORKS_QUERY =
  '/api/works?status=on-consignment&sort=-price&search=bowl&page=2&pageSize=25';
const RATIO_TARGET = 2;
const RUNS = 300;

/**
 * The filtered, sorted works page through the real API (a listening server, session cookie,
 * JSON) against the very same SQL run directly on better-sqlite3. Seeds `dbFile` on the way, for
 * the parts that follow. Answers whether the target (at most 2×) was met.
 */
export async function benchWorksPage(dbFile: string): Promise<boolean> {
  const sqlite = new SQLite(dbFile);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  // Every statement the app runs is recorded while `recording` is on, to replay it directly.
  let recording = false;
  const recorded: CompiledQuery[] = [];
  const db = new Kysely<Database>({
    dialect: new SqliteDialect({ database: sqlite }),
    log: (event) => {
      if (recording && event.level === 'query') recorded.push(event.query);
    },
  });
  await migrateToLatest(db);
  await seedWorks(db);

  const app = createApp(
    createContext({
      db,
      logger: pino({ level: 'silent' }),
      secret: 'bench-secret-that-is-long-enough-for-better-auth',
      web: null,
      trustedOrigins: [],
      filesDir: path.join(path.dirname(dbFile), 'files'),
    }),
  );
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const cookie = await signInCookie(base, benchOwner.email, benchOwner.password);

  const callApi = async () => {
    const res = await fetch(base + WORKS_QUERY, { headers: { cookie } });
    if (!res.ok) throw new Error(`API answered ${res.status}`);
    return (await res.json()) as { items: unknown[]; total: number };
  };

  recording = true;
  const sample = await callApi();
  recording = false;
  // The works page's own statements: the page, the count and the photos (not the session's).
  const worksQueries = recorded
    .filter((q) => /from "works"|from "work_photos"|"work_photos"/.test(q.sql))
    .map((q) => ({ statement: sqlite.prepare(q.sql), parameters: q.parameters as unknown[] }));
  const callDirect = () => {
    for (const q of worksQueries) q.statement.all(...q.parameters);
  };

  for (let i = 0; i < 30; i++) {
    await callApi();
    callDirect();
  }
  const api: number[] = [];
  const direct: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    let t = performance.now();
    await callApi();
    api.push(performance.now() - t);
    t = performance.now();
    callDirect();
    direct.push(performance.now() - t);
  }
  await new Promise((resolve) => server.close(resolve));
  await db.destroy();
  fs.rmSync(path.join(path.dirname(dbFile), 'files'), { recursive: true, force: true });

  const a = stats(api);
  const d = stats(direct);
  const ratio = a.median / d.median;
  console.log(`\nThe works page: GET ${WORKS_QUERY}`);
  console.log(
    `  ${sample.total} matching works, ${sample.items.length} on the page; ${worksQueries.length} SQL statements`,
  );
  console.log(`  API     median ${ms(a.median)}  p95 ${ms(a.p95)}`);
  console.log(`  direct  median ${ms(d.median)}  p95 ${ms(d.p95)}`);
  console.log(
    `  ratio (median) ${ratio.toFixed(2)}× (target ≤ ${RATIO_TARGET}×), p95 ratio ${(a.p95 / d.p95).toFixed(2)}×`,
  );
  return ratio <= RATIO_TARGET;
}
