import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { type ServerProcess, startServerProcess } from '@/scripts/lib/server-process';

import { gbp, salesFixture } from '../helpers/sales-fixture';
import { testDatabaseLocation } from '../helpers/test-database';

// PostgreSQL only (jest.config.js runs *.postgres.test.ts in `npm run test:pg` alone): several
// server processes writing to one database at once is what it is there for.

let dir: string;
let servers: ServerProcess[] = [];

beforeAll(() => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-two-processes-'));
});

afterAll(async () => {
  await Promise.all(servers.map((s) => s.stop()));
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('two server processes sharing one PostgreSQL database', () => {
  it('sell a piece once when 50 attempts are spread over both; the 49 others are refused', async () => {
    const dbFile = path.join(dir, 'saggar.db');
    const f = await salesFixture({ dbFile });
    const database = await testDatabaseLocation(dbFile);
    // The same secret as the test app's, so the session it signed in is good on both.
    const env = {
      SAGGAR_AUTH_SECRET: 'test-secret-that-is-long-enough-for-better-auth',
      SAGGAR_DB: path.join(dir, 'data', 'unused.db'),
      SAGGAR_FILES_DIR: path.join(dir, 'files'),
    };
    servers = await Promise.all([
      startServerProcess(database, env),
      startServerProcess(database, env),
    ]);
    const cookie = await f.cookie('gallery');
    const attempts = Array.from({ length: 50 }, (_, i) => {
      const { url } = servers[i % 2]!;
      return fetch(`${url}/api/consignment-lines/${f.lines.tallBottle}/sale`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', cookie, origin: url },
        // A different price per attempt, so the sale kept traces back to the one that won.
        body: JSON.stringify({ soldOn: f.today, salePrice: gbp(24_000 - 20 * (i + 1)) }),
      }).then(async (res) => ({ i, status: res.status, body: await res.json() }));
    });
    const answers = await Promise.all(attempts);

    const won = answers.filter((a) => a.status === 201);
    const refused = answers.filter((a) => a.status === 409);
    expect(won).toHaveLength(1);
    expect(refused).toHaveLength(49);
    for (const r of refused) {
      expect(r.body.error.message).toMatch(/^A-2 .+ is already sold: /);
    }
    const line = await f.db
      .selectFrom('consignment_lines')
      .select(['state', 'sale_price'])
      .where('id', '=', f.lines.tallBottle)
      .executeTakeFirstOrThrow();
    expect(line).toEqual({ state: 'sold', sale_price: 24_000 - 20 * (won[0]!.i + 1) });
    const audits = await f.db
      .selectFrom('audit_log')
      .select('entity_id')
      .where('action', '=', 'line.sold')
      .execute();
    expect(audits).toEqual([{ entity_id: String(f.lines.tallBottle) }]);
  }, 120_000);
});
