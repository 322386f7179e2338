import autocannon from 'autocannon';

import { type ServerProcess } from '../lib/server-process';

const CONNECTIONS = 50;
const SECONDS = 8;
const TARGET = 2;

async function load(url: string, cookie?: string) {
  const result = await autocannon({
    url,
    connections: CONNECTIONS,
    duration: SECONDS,
    headers: cookie ? { cookie } : {},
  });
  if (result.non2xx > 0 || result.errors > 0) {
    throw new Error(`${url}: ${result.non2xx} non-2xx answers, ${result.errors} errors`);
  }
  return { rps: result.requests.average, median: result.latency.p50, p95: result.latency.p97_5 };
}

/**
 * What a signed-in request pays for its sign-in: requests a second at 50 concurrent clients for
 * the health check (no session), the signed-in person, and a page of works. Target: an
 * authenticated read within 2× of the health check.
 */
export async function benchThroughput(server: ServerProcess, cookie: string): Promise<boolean> {
  const rows = [
    ['GET /api/health (no session)', await load(`${server.url}/api/health`)],
    ['GET /api/me (signed in)', await load(`${server.url}/api/me`, cookie)],
    [
      'GET /api/works, 25 a page (signed in)',
      await load(`${server.url}/api/works?pageSize=25`, cookie),
    ],
  ] as const;
  console.log(`\nThroughput at ${CONNECTIONS} concurrent clients, ${SECONDS} s each`);
  for (const [what, r] of rows) {
    console.log(
      `  ${what.padEnd(38)} ${Math.round(r.rps).toString().padStart(6)} req/s  median ${r.median} ms  p97.5 ${r.p95} ms`,
    );
  }
  const ratio = rows[0][1].rps / rows[1][1].rps;
  console.log(`  health ÷ signed-in /api/me: ${ratio.toFixed(2)}× (target ≤ ${TARGET}×)`);
  return ratio <= TARGET;
}
