import fs from 'node:fs';
import http from 'node:http';

import { type Db } from '../../server/db/database';
import { type SalesSeed } from './seed-sales';
import { ms, stats } from './stats';

export const CLIENTS = 100;
export const SECONDS = 10;
const RPS_TARGET = 500;
const P95_TARGET_MS = 100;

type Answer = { status: number; body: string };

/** One POST over a kept-alive connection; plain `http` so the load costs the machine little. */
function post(agent: http.Agent, url: URL, path: string, cookie: string, body: string) {
  return new Promise<Answer>((resolve, reject) => {
    const req = http.request(
      {
        agent,
        host: url.hostname,
        port: url.port,
        path,
        method: 'POST',
        headers: {
          cookie,
          origin: url.origin,
          'content-type': 'application/json',
          'content-length': Buffer.byteLength(body),
        },
      },
      (res) => {
        let text = '';
        res.setEncoding('utf8');
        res.on('data', (chunk: string) => (text += chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text }));
      },
    );
    req.on('error', reject);
    req.end(body);
  });
}

/** CPU time a process has used so far, in ms (Linux /proc; 100 clock ticks a second). */
export function cpuMs(pid: number): number {
  const fields = fs.readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  // utime and stime, fields 14 and 15 of the whole line.
  return (Number(fields[11]) + Number(fields[12])) * 10;
}

/** What the database holds after the run: the sold lines, and the audit entries of sales. */
async function countInDatabase(db: Db, studioId: number) {
  const sold = await db
    .selectFrom('consignment_lines')
    .select('id')
    .where('studio_id', '=', studioId)
    .where('state', '=', 'sold')
    .execute();
  const audits = db
    .selectFrom('audit_log')
    .where('studio_id', '=', studioId)
    .where('action', '=', 'line.sold');
  const audited = await audits
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .executeTakeFirstOrThrow();
  const twice = await audits
    .select('entity_id')
    .groupBy('entity_id')
    .having((eb) => eb.fn.countAll(), '>', 1)
    .execute();
  const mails = await db
    .selectFrom('outbox')
    .leftJoin('consignment_lines', 'consignment_lines.sale_mail_id', 'outbox.id')
    .select((eb) => [
      'outbox.id',
      eb.fn.count<number>('consignment_lines.id').as('sales'),
      eb.fn<number>('length', ['outbox.html_body']).as('html'),
    ])
    .where('outbox.studio_id', '=', studioId)
    .where('outbox.kind', '=', 'sale')
    .groupBy(['outbox.id', 'outbox.html_body'])
    .execute();
  return { sold: sold.map((row) => row.id), audited: audited.n, twice: twice.length, mails };
}

export type Sessions = { staff: string[]; owner: string; assistant: string };

/** A server process the clients send sales to. */
export type SalesServer = { url: string; pid: number };

/**
 * `CLIENTS` clients record sales for `seconds`, each back to back on the pieces of its own
 * consignment: at each venue eight clients are its staff and two the studio, taking sales by
 * phone (one session for each person). With several servers, the clients take turns between
 * them, as a load balancer would spread them.
 */
export async function runSales(
  servers: readonly SalesServer[],
  seed: SalesSeed,
  sessions: Sessions,
  today: string,
  seconds: number,
) {
  const agent = new http.Agent({ keepAlive: true, maxSockets: CLIENTS });
  const clients = seed.consignments.slice(0, CLIENTS).map(({ venue, position, lines }, n) => ({
    url: new URL(servers[n % servers.length]!.url),
    lines,
    cookie:
      position < 8 ? sessions.staff[venue]! : position % 2 ? sessions.assistant : sessions.owner,
  }));
  const run = {
    latencies: [] as number[],
    bySecond: Array.from({ length: seconds }, () => 0),
    statuses: new Map<number, number>(),
    sold: [] as number[],
    refusals: [] as string[],
    ranOut: 0,
    elapsed: 0,
    serverCpuMs: 0,
  };
  const serversCpuMs = () => servers.reduce((sum, server) => sum + cpuMs(server.pid), 0);
  const cpuBefore = serversCpuMs();
  const started = performance.now();
  const deadline = started + seconds * 1000;
  await Promise.all(
    clients.map(async (client) => {
      for (const [n, line] of client.lines.entries()) {
        if (performance.now() >= deadline) return;
        // One sale in ten at a discount, with its reason.
        const discounted = n % 10 === 9;
        const body = JSON.stringify({
          soldOn: today,
          salePrice: { amount: line.listPrice - (discounted ? 500 : 0), currency: 'GBP' },
          ...(discounted ? { discountReason: 'Two bought together' } : {}),
        });
        const t = performance.now();
        const path = `/api/consignment-lines/${line.id}/sale`;
        const answer = await post(agent, client.url, path, client.cookie, body);
        const done = performance.now();
        run.latencies.push(done - t);
        const second = Math.floor((done - started) / 1000);
        if (second < seconds) run.bySecond[second]! += 1;
        run.statuses.set(answer.status, (run.statuses.get(answer.status) ?? 0) + 1);
        if (answer.status === 201) run.sold.push(line.id);
        else if (run.refusals.length < 5) {
          run.refusals.push(`${answer.status} ${answer.body.slice(0, 200)}`);
        }
      }
      run.ranOut += 1;
    }),
  );
  run.elapsed = (performance.now() - started) / 1000;
  run.serverCpuMs = serversCpuMs() - cpuBefore;
  agent.destroy();
  return run;
}
export type SalesRun = Awaited<ReturnType<typeof runSales>>;

/**
 * The figures of a run, and the database (once the servers have stopped) counted against its
 * answers: a 201 for every sale the studio's lines hold and the other way round, each line sold
 * and audited once. Targets: at least 500 sales a second, p95 under 100 ms, none lost or
 * doubled. Answers the figures and whether each target was met.
 */
export async function reportSales(run: SalesRun, database: Db, seed: SalesSeed) {
  const s = stats(run.latencies);
  const rps = run.latencies.length / run.elapsed;
  const db = await countInDatabase(database, seed.studioId);
  const soldInDb = new Set(db.sold);
  const answered = new Set(run.sold);
  const lost = run.sold.filter((id) => !soldInDb.has(id)).length;
  const unanswered = db.sold.filter((id) => !answered.has(id)).length;
  const doubled = db.twice + (run.sold.length - answered.size);
  const others = [...run.statuses].filter(([status]) => status !== 201);

  console.log(
    `\nSales: ${CLIENTS} concurrent clients for ${run.bySecond.length} s, each selling the ` +
      `pieces of its own consignment (${seed.staff.length} venues' staff, the owner and the ` +
      'assistant, one session each)',
  );
  console.log(
    `  ${run.latencies.length} answers in ${run.elapsed.toFixed(1)} s: ${Math.round(rps)} req/s  ` +
      `median ${ms(s.median)}  p95 ${ms(s.p95)}  max ${ms(s.max)}`,
  );
  console.log(`  sales completed in each second: ${run.bySecond.join(', ')}`);
  // What the machine's other work cannot blur: the server's own CPU time for each sale.
  console.log(
    `  server CPU: ${(run.serverCpuMs / run.latencies.length).toFixed(1)} ms a sale, ` +
      `${Math.round(run.serverCpuMs / run.elapsed / 10)}% of one core over the run`,
  );
  console.log(
    `  statuses: 201 × ${run.statuses.get(201) ?? 0}` +
      others.map(([status, n]) => `, ${status} × ${n}`).join(''),
  );
  for (const refusal of run.refusals) console.log(`    e.g. ${refusal}`);
  if (run.ranOut > 0) console.log(`  ${run.ranOut} clients ran out of pieces before the end`);
  console.log(
    `  database: ${db.sold.length} lines sold, ${db.audited} 'line.sold' audit entries; ` +
      `${lost} sales answered 201 but not kept, ${unanswered} kept without a 201, ` +
      `${doubled} lines sold twice`,
  );
  console.log(
    `  the maker's sale e-mails: ${db.mails
      .map((m) => `${m.sales} sales in one message (${Math.round(m.html / 1024)} KB of HTML)`)
      .join('; ')}`,
  );
  const counted =
    lost === 0 &&
    unanswered === 0 &&
    doubled === 0 &&
    db.audited === run.sold.length &&
    others.length === 0 &&
    run.ranOut === 0;
  const met = rps >= RPS_TARGET && s.p95 < P95_TARGET_MS && counted;
  console.log(
    `  target: ≥ ${RPS_TARGET} req/s, p95 < ${P95_TARGET_MS} ms, none lost or doubled: ` +
      `${met ? 'met' : 'missed'} (throughput ${rps >= RPS_TARGET ? 'met' : 'missed'}, ` +
      `p95 ${s.p95 < P95_TARGET_MS ? 'met' : 'missed'}, counts ${counted ? 'agree' : 'DISAGREE'})`,
  );
  return { met, rps, p95: s.p95, counted, sold: run.sold.length, serverCpuMs: run.serverCpuMs };
}
