import { maxImportRows } from '../../shared/schemas/work-import';
import { type ServerProcess } from '../lib/server-process';
import { ms } from './stats';

const TARGET_MS = 250;

/**
 * The longest the server keeps others waiting while `work` runs: the health check is asked
 * every 10 ms meanwhile, and the slowest answer is the longest pause.
 */
async function longestPause(url: string, work: () => Promise<void>) {
  let done = false;
  let longest = 0;
  let asked = 0;
  const poll = (async () => {
    while (!done) {
      const started = performance.now();
      await fetch(`${url}/api/health`);
      longest = Math.max(longest, performance.now() - started);
      asked += 1;
      await new Promise((r) => setTimeout(r, 10));
    }
  })();
  const started = performance.now();
  await work();
  const took = performance.now() - started;
  done = true;
  await poll;
  return { longest, asked, took };
}

/**
 * A maximal import (5,000 rows, committed) and an export of the catalogue's works (10,000 and
 * more) may not stall the server: the health check answers within 250 ms throughout.
 */
export async function benchPauses(server: ServerProcess, cookie: string): Promise<boolean> {
  const rows = Array.from(
    { length: maxImportRows },
    (_, i) => `Import bench jug ${i},24.50,Stoneware,Ash,1280,180,120,120,950`,
  );
  const csv = [
    'Title,Price,Clay body,Glaze,Firing temperature,Height,Width,Depth,Weight',
    ...rows,
  ].join('\n');
  const importing = await longestPause(server.url, async () => {
    const res = await fetch(`${server.url}/api/works/import`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json', origin: server.url },
      body: JSON.stringify({ mode: 'commit', csv }),
    });
    const body = (await res.json()) as { imported?: number };
    if (body.imported !== maxImportRows) throw new Error(`import: ${JSON.stringify(body)}`);
  });
  let lines = 0;
  const exporting = await longestPause(server.url, async () => {
    const res = await fetch(`${server.url}/api/works/export.csv`, { headers: { cookie } });
    lines = (await res.text()).split('\r\n').filter(Boolean).length - 1;
  });
  console.log(`\nLongest pause of the server (health asked every 10 ms; target < ${TARGET_MS} ms)`);
  console.log(
    `  committing a ${maxImportRows}-row import: ${ms(importing.longest)} (took ${ms(importing.took)}, ${importing.asked} health answers meanwhile)`,
  );
  console.log(
    `  exporting ${lines} works as CSV:        ${ms(exporting.longest)} (took ${ms(exporting.took)}, ${exporting.asked} health answers meanwhile)`,
  );
  return importing.longest < TARGET_MS && exporting.longest < TARGET_MS;
}
