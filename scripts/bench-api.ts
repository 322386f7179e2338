// The API's benchmarks: the works page against its own SQL, what a signed-in request costs,
// the longest pause during a maximal import and a 10,000-work export, and memory while photos
// are uploaded. Each part prints its figures and target; the exit code says whether all were met.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { benchPauses } from './bench/pauses';
import { benchOwner } from './bench/seed-works';
import { benchThroughput } from './bench/throughput';
import { benchUploads } from './bench/uploads';
import { benchWorksPage } from './bench/works-page';
import { signInCookie, startServerProcess } from './lib/server-process';

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-bench-'));
  const dbFile = path.join(dir, 'bench.db');
  console.log('Seeding 10,000 works…');
  const results = [await benchWorksPage(dbFile)];

  const server = await startServerProcess(dbFile, {
    SAGGAR_FILES_DIR: path.join(dir, 'files'),
    SAGGAR_WEB_ROOT: path.join(dir, 'no-web-app'),
  });
  try {
    const cookie = await signInCookie(server.url, benchOwner.email, benchOwner.password);
    // Pauses first: the throughput run leaves slow pages queued behind it for a moment.
    results.push(await benchPauses(server, cookie));
    results.push(await benchThroughput(server, cookie));
    const work = (await (
      await fetch(`${server.url}/api/works?pageSize=1`, { headers: { cookie } })
    ).json()) as { items: { id: number }[] };
    results.push(await benchUploads(server, cookie, work.items[0]!.id));
  } finally {
    await server.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
  console.log(results.every(Boolean) ? '\nAll targets met.' : '\nSome targets missed.');
  if (!results.every(Boolean)) process.exitCode = 1;
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
