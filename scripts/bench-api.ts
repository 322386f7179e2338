// Works-list benchmark: the filtered, sorted works page through the real API (a listening
// server, session cookie, JSON) against the very same SQL run directly on better-sqlite3, over
// 10,000 works with consignment lines. Target: the API takes at most 2× the direct query.
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';

import SQLite from 'better-sqlite3';
import { type CompiledQuery, Kysely, SqliteDialect } from 'kysely';
import pino from 'pino';

import { createApp } from '../server/app';
import { createUserWithPassword } from '../server/auth/passwords';
import { createContext } from '../server/context';
import { migrateToLatest } from '../server/db/migrate';
import { type Database } from '../server/db/schema';
import { addMembership } from '../server/memberships/memberships.repository';

const RATIO_TARGET = 2;
const WORKS = 10_000;
const RUNS = 300;
const QUERY = '/api/works?status=on-consignment&sort=-price&search=bowl&page=2&pageSize=25';

const series = ['Saltmarsh', 'Tideline', 'Estuary', 'Shingle', 'Heron'];
const forms = ['bowl', 'jug', 'vase', 'moon jar', 'tea bowl', 'plate', 'bottle'];
const lineStates = ['consigned', 'sold', 'returned', 'consigned', 'withdrawn'] as const;

async function seed(db: Kysely<Database>) {
  const { id: studioId } = await db
    .insertInto('studios')
    .values({ name: 'Bench studio' })
    .returning('id')
    .executeTakeFirstOrThrow();
  const userId = await createUserWithPassword(db, {
    name: 'Bench',
    email: 'bench@example.test',
    password: 'bench-password-2026',
  });
  await addMembership(db, { userId, studioId, role: 'owner', venueId: null });
  const terms = JSON.stringify({ currency: 'GBP' });
  await db.transaction().execute(async (trx) => {
    const venueIds: number[] = [];
    for (let v = 0; v < 8; v++) {
      const { id } = await trx
        .insertInto('venues')
        .values({ studio_id: studioId, name: `Venue ${v}`, kind: 'gallery', default_terms: terms })
        .returning('id')
        .executeTakeFirstOrThrow();
      venueIds.push(id);
    }
    const consignmentIds: number[] = [];
    for (let c = 0; c < 40; c++) {
      const { id } = await trx
        .insertInto('consignments')
        .values({
          studio_id: studioId,
          venue_id: venueIds[c % venueIds.length]!,
          reference: `C-${c}`,
          title: `Show ${c}`,
          state: 'on-show',
          terms,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      consignmentIds.push(id);
    }
    for (let start = 0; start < WORKS; start += 500) {
      const rows = Array.from({ length: 500 }, (_, k) => {
        const i = start + k;
        return {
          studio_id: studioId,
          stock_number: `${2020 + (i % 7)}-${String(i).padStart(5, '0')}`,
          title: `${forms[i % forms.length]} no. ${i}`,
          year: 2020 + (i % 7),
          series: series[i % series.length]!,
          category: forms[i % forms.length]!,
          clay_body: i % 2 ? 'Porcelain' : 'Stoneware',
          glaze: i % 3 ? 'Celadon' : 'Tenmoku',
          retail_price: 2_000 + ((i * 7919) % 200_000),
          cost_price: 500,
          currency: 'GBP',
        };
      });
      const ids = await trx.insertInto('works').values(rows).returning('id').execute();
      // About six works in ten have been out: some twice, so the latest line decides.
      const lines = ids.flatMap(({ id }, k) => {
        const i = start + k;
        if (i % 10 >= 6) return [];
        const first = {
          studio_id: studioId,
          consignment_id: consignmentIds[i % 20]!,
          work_id: id,
          currency: 'GBP',
          list_price: 10_000,
          insurance_value: 6_000,
          state: i % 3 === 0 ? ('returned' as const) : lineStates[i % lineStates.length]!,
        };
        const sold = (l: typeof first) =>
          l.state === 'sold' ? { ...l, sold_on: '2026-05-01', sale_price: 10_000 } : l;
        if (i % 3 !== 0) return [sold(first)];
        return [
          first,
          sold({
            ...first,
            consignment_id: consignmentIds[20 + (i % 20)]!,
            state: lineStates[i % 4]!,
          }),
        ];
      });
      if (lines.length) await trx.insertInto('consignment_lines').values(lines).execute();
    }
  });
}

function stats(samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
  return { median: at(0.5), p95: at(0.95) };
}

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-bench-'));
  const sqlite = new SQLite(path.join(dir, 'bench.db'));
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
  console.log(`Seeding ${WORKS} works…`);
  await seed(db);

  const app = createApp(
    createContext({
      db,
      logger: pino({ level: 'silent' }),
      secret: 'bench-secret-that-is-long-enough-for-better-auth',
      web: null,
      trustedOrigins: [],
      filesDir: path.join(dir, 'files'),
    }),
  );
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'bench@example.test', password: 'bench-password-2026' }),
  });
  if (!signIn.ok) throw new Error(`sign-in answered ${signIn.status}: ${await signIn.text()}`);
  const cookie = signIn.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');

  const callApi = async () => {
    const res = await fetch(base + QUERY, { headers: { cookie } });
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
  server.close();
  await db.destroy();
  fs.rmSync(dir, { recursive: true, force: true });

  const a = stats(api);
  const d = stats(direct);
  const ratio = a.median / d.median;
  const ms = (n: number) => `${n.toFixed(2)} ms`;
  console.log(`GET ${QUERY}`);
  console.log(
    `  ${sample.total} matching works, ${sample.items.length} on the page; ${worksQueries.length} SQL statements`,
  );
  console.log(`  API     median ${ms(a.median)}  p95 ${ms(a.p95)}`);
  console.log(`  direct  median ${ms(d.median)}  p95 ${ms(d.p95)}`);
  console.log(
    `  ratio (median) ${ratio.toFixed(2)}× (target ≤ ${RATIO_TARGET}×), p95 ratio ${(a.p95 / d.p95).toFixed(2)}×`,
  );
  if (ratio > RATIO_TARGET) {
    console.log('  target missed');
    process.exitCode = 1;
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
